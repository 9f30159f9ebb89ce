import Benchmark from 'benchmark';

/** One measured case, as written to bench/results/. */
export interface CaseFigures {
  name: string;
  opsPerSecond: number;
  meanMs: number;
  relativeMarginOfError: number;
  samples: number;
}

/** Runs benchmark.js cases one after another; maxTime keeps a whole suite to seconds, not minutes. */
export function runCases(cases: Record<string, () => void>, maxTime: number): CaseFigures[] {
  const suite = new Benchmark.Suite();
  for (const [name, fn] of Object.entries(cases)) suite.add(name, fn, { maxTime });
  const figures: CaseFigures[] = [];
  suite.on('cycle', (event: Benchmark.Event) => {
    const b = event.target;
    figures.push({
      name: b.name ?? '',
      opsPerSecond: b.hz ?? 0,
      meanMs: (b.stats?.mean ?? 0) * 1000,
      relativeMarginOfError: b.stats?.rme ?? 0,
      samples: b.stats?.sample.length ?? 0,
    });
    process.stdout.write(`${String(b)}\n`);
  });
  suite.run({ async: false });
  return figures;
}
