import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { machineDescription } from './machine';
import { boundsSuite, meshReport } from './suites/bounds';
import { constructionsReport, constructionsSuite } from './suites/constructions';
import { edgeSuite } from './suites/edge';
import { gridSuite } from './suites/grid';
import { ioSuite } from './suites/io';
import { lowerBoundsSuite } from './suites/lower-bounds';
import { verifySuite } from './suites/verify';

// CAIRN_BENCH_MAX_TIME (seconds per case) trades precision for time; benchmark.js defaults to 5.
const maxTime = Number(process.env.CAIRN_BENCH_MAX_TIME ?? 2);
// CAIRN_BENCH_ONLY=name,name runs only those suites and keeps the other figures already recorded.
const only = process.env.CAIRN_BENCH_ONLY?.split(',').filter(Boolean);
const suites: Record<string, () => unknown> = {
  verify: () => verifySuite(maxTime),
  grid: () => gridSuite(maxTime),
  io: () => ioSuite(maxTime),
  bounds: () => boundsSuite(maxTime),
  edge: () => edgeSuite(maxTime),
  lowerBounds: () => lowerBoundsSuite(maxTime),
  constructions: () => constructionsSuite(maxTime),
};
const runs = (name: string) => !only || only.includes(name);
const dir = new URL('./results/', import.meta.url);
const file = new URL('engine.json', dir);
const previous = only && existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : {};
const results = {
  recordedAt: new Date().toISOString(),
  ...(only ? { suitesRun: only } : {}),
  machine: machineDescription(),
  mesh: runs('bounds') ? meshReport() : previous.mesh,
  // Reported before its suite runs, so the first-call times are of a fresh process.
  constructions: runs('constructions') ? constructionsReport() : previous.constructions,
  suites: Object.fromEntries(Object.entries(suites).map(([name, run]) => [name, runs(name) ? run() : previous.suites?.[name]])),
};
mkdirSync(dir, { recursive: true });
writeFileSync(file, `${JSON.stringify(results, null, 2)}\n`);
process.stdout.write('figures written to bench/results/engine.json\n');
