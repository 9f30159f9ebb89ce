import Benchmark from 'benchmark';
import { median } from './machine';

/** One measured case, as written to bench/results/. */
export interface CaseFigures {
  name: string;
  opsPerSecond: number;
  meanMs: number;
  medianMs: number;
  /** The target for this case, when it has one, and whether the median meets it. */
  targetMs?: number;
  meetsTarget?: boolean;
  relativeMarginOfError: number;
  samples: number;
}

/** A case: the function to time, or the function with a target median in milliseconds. */
export type BenchCase = (() => void) | { run: () => void; targetMs: number };


/** Runs benchmark.js cases one after another; maxTime keeps a whole suite to seconds, not minutes. */
export function runCases(cases: Record<string, BenchCase>, maxTime: number): CaseFigures[] {
  const suite = new Benchmark.Suite();
  const targets = new Map<string, number>();
  for (const [name, c] of Object.entries(cases)) {
    if (typeof c === 'function') suite.add(name, c, { maxTime });
    else {
      suite.add(name, c.run, { maxTime });
      targets.set(name, c.targetMs);
    }
  }
  const figures: CaseFigures[] = [];
  suite.on('cycle', (event: Benchmark.Event) => {
    const b = event.target;
    const name = b.name ?? '';
    const medianMs = median(b.stats?.sample ?? [0]) * 1000;
    const targetMs = targets.get(name);
    figures.push({
      name,
      opsPerSecond: b.hz ?? 0,
      meanMs: (b.stats?.mean ?? 0) * 1000,
      medianMs,
      ...(targetMs === undefined ? {} : { targetMs, meetsTarget: medianMs <= targetMs }),
      relativeMarginOfError: b.stats?.rme ?? 0,
      samples: b.stats?.sample.length ?? 0,
    });
    const verdict = targetMs === undefined ? '' : `  median ${medianMs.toFixed(1)} ms, target <= ${targetMs} ms: ${medianMs <= targetMs ? 'met' : 'NOT met'}`;
    process.stdout.write(`${String(b)}${verdict}\n`);
  });
  suite.run({ async: false });
  return figures;
}
