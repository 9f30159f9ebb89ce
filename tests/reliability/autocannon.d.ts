// The part of autocannon 8's programmatic API that load.test.ts uses (the package ships no types).
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  export interface Histogram {
    average: number;
    mean: number;
    stddev: number;
    min: number;
    max: number;
    total: number;
    p2_5: number;
    p50: number;
    p90: number;
    p97_5: number;
    p99: number;
    p99_9: number;
  }

  export interface Request {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
    /** Called before each request is sent; returns the (changed) request. */
    setupRequest?: (request: Request, context: Record<string, unknown>) => Request | null | undefined | false;
    onResponse?: (status: number, body: string, context: Record<string, unknown>, headers: Record<string, string>) => void;
  }

  export interface Options {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    timeout?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: Request[];
    title?: string;
  }

  export interface Result {
    title?: string;
    duration: number;
    start: Date;
    finish: Date;
    errors: number;
    timeouts: number;
    mismatches: number;
    non2xx: number;
    resets: number;
    '1xx': number;
    '2xx': number;
    '3xx': number;
    '4xx': number;
    '5xx': number;
    statusCodeStats: Record<string, { count: number }>;
    latency: Histogram & { totalCount: number };
    requests: Histogram & { sent: number };
    throughput: Histogram;
  }

  export interface Instance extends EventEmitter {
    stop(): void;
  }

  function autocannon(options: Options, callback: (err: Error | null, result: Result) => void): Instance;
  export default autocannon;
}
