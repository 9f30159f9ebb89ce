import type { Response } from 'express';
import type { RunEventName, RunProgressEvent, RunStatus } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import type { Logger } from '../logger';
import { loadRunRow, queryRows } from './run-row';
import { toRunView } from './run-view';

export interface RunEventOptions {
  /** How often the run is read from the database (the worker may be another process). */
  pollMs?: number;
  /** A comment line this often keeps proxies from closing a quiet stream. */
  keepAliveMs?: number;
}

const FINAL: ReadonlySet<RunStatus> = new Set(['done', 'failed', 'cancelled']);

let streams = 0;
/** How many event streams this process is serving now (each polls the database while open). */
export const openEventStreams = () => streams;

/**
 * GET /api/v1/runs/:id/events as server-sent events. The run is read from the database on a short
 * interval, since the worker computing it may be another process: a `status` event when it changes
 * while unfinished, a `progress` event for each new progress report, then the final event with the
 * whole run, and the stream ends. Stops polling as soon as the client goes away.
 */
export async function streamRunEvents(source: DataSource, runId: string, res: Response, publicUrl: string, logger: Logger, options: RunEventOptions = {}): Promise<void> {
  const pollMs = options.pollMs ?? 300;
  const keepAliveMs = options.keepAliveMs ?? 15_000;
  res.status(200);
  res.set({ 'Content-Type': 'text/event-stream; charset=utf-8', 'Cache-Control': 'no-cache, no-transform', Connection: 'keep-alive', 'X-Accel-Buffering': 'no' });
  res.flushHeaders();
  res.write('retry: 2000\n\n');
  let open = true;
  let wake: (() => void) | undefined;
  res.on('close', () => {
    open = false;
    wake?.();
  });
  const send = (event: RunEventName, data: unknown) => res.write(`event: ${event}\ndata: ${JSON.stringify(data)}\n\n`);
  const pause = (ms: number) =>
    new Promise<void>((resolve) => {
      const timer = setTimeout(resolve, ms);
      wake = () => {
        clearTimeout(timer);
        resolve();
      };
    });
  streams++;
  let lastStatus: RunStatus | undefined;
  let lastProgress = '';
  let lastWrite = Date.now();
  try {
    while (open) {
      const [now] = await queryRows<{ status: RunStatus; progress: Record<string, unknown> | null }>(source, `SELECT status, progress FROM runs WHERE id = $1`, [runId]);
      if (!open) break;
      if (!now) {
        send('deleted', { id: runId });
        break;
      }
      if (FINAL.has(now.status)) {
        const row = await loadRunRow(source, runId);
        if (row) send(row.status as RunEventName, toRunView(row, publicUrl));
        else send('deleted', { id: runId });
        break;
      }
      if (now.status !== lastStatus) {
        send('status', { status: now.status });
        lastStatus = now.status;
        lastWrite = Date.now();
      }
      const progress = now.progress ? JSON.stringify(now.progress) : '';
      if (progress !== lastProgress && now.progress) {
        const event: RunProgressEvent = { ...(now.progress as Omit<RunProgressEvent, 'status'>), status: now.status };
        send('progress', event);
        lastProgress = progress;
        lastWrite = Date.now();
      }
      if (Date.now() - lastWrite >= keepAliveMs) {
        res.write(': still here\n\n');
        lastWrite = Date.now();
      }
      await pause(pollMs);
    }
  } catch (err) {
    // The client reconnects (the retry line above); a broken database must not leave a stream hanging.
    logger.warn({ err, run: runId }, 'run event stream stopped');
  } finally {
    streams--;
    res.end();
  }
}
