import { mkdirSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { boundsSuite, meshReport } from './suites/bounds';
import { edgeSuite } from './suites/edge';
import { gridSuite } from './suites/grid';
import { ioSuite } from './suites/io';
import { lowerBoundsSuite } from './suites/lower-bounds';
import { verifySuite } from './suites/verify';

// CAIRN_BENCH_MAX_TIME (seconds per case) trades precision for time; benchmark.js defaults to 5.
const maxTime = Number(process.env.CAIRN_BENCH_MAX_TIME ?? 2);
const results = {
  recordedAt: new Date().toISOString(),
  machine: { cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? 'unknown', node: process.version, memoryGiB: Math.round(os.totalmem() / 2 ** 30) },
  mesh: meshReport(),
  suites: { verify: verifySuite(maxTime), grid: gridSuite(maxTime), io: ioSuite(maxTime), bounds: boundsSuite(maxTime), edge: edgeSuite(maxTime), lowerBounds: lowerBoundsSuite(maxTime) },
};
const dir = new URL('./results/', import.meta.url);
mkdirSync(dir, { recursive: true });
writeFileSync(new URL('engine.json', dir), `${JSON.stringify(results, null, 2)}\n`);
process.stdout.write('figures written to bench/results/engine.json\n');
