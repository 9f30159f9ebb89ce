import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { machineDescription } from './machine';
import { exactTreeDepth, gridGraph, maskGraph, randomGraph, staircaseGraph, type Graph } from '@cairn/engine';

// The exact search's benchmark cases (repeated timed runs, not benchmark.js: one run can take seconds). Each run
// has a time limit (CAIRN_EXACT_LIMIT_S, default 10 s, or the case's target or own limit when longer), so
// the figures say how far it got, not only how fast.
const limitMs = 1000 * Number(process.env.CAIRN_EXACT_LIMIT_S ?? 10);
// CAIRN_EXACT_ONLY="grid 8x8;staircase S(10)" runs only those cases (names end to end, split at ";", as
// some names hold commas) and keeps the other recorded rows.
const only = process.env.CAIRN_EXACT_ONLY?.split(';').map((s) => s.trim()).filter(Boolean);

function cornerless(rows: number, cols: number): Graph {
  const present = new Uint8Array(rows * cols).fill(1);
  present[0] = 0;
  return maskGraph({ rows, cols, present });
}

// [name, graph, target ms or null, own time limit ms]: the squares past 9 x 9 are open ground, with
// room to finish.
const cases: [string, Graph, number | null, number?][] = [
  ['grid 4x30', gridGraph(4, 30), 1000],
  ['grid 5x16', gridGraph(5, 16), 1000],
  ['grid 6x12', gridGraph(6, 12), 1000],
  ['grid 7x8', gridGraph(7, 8), 1000],
  ['grid 8x8', gridGraph(8, 8), 1000],
  ['grid 9x9', gridGraph(9, 9), 15000],
  ['grid 10x10', gridGraph(10, 10), null, 120_000],
  ['grid 11x11', gridGraph(11, 11), null, 600_000],
  ['staircase S(10)', staircaseGraph(10), null],
  ['grid 8x8 without a corner', cornerless(8, 8), null],
  ['G(30, 3/30) seed 1', randomGraph(30, 3 / 30, 1), null],
  ['G(40, 3/40) seed 1', randomGraph(40, 3 / 40, 1), null],
  ['G(50, 3/50) seed 1', randomGraph(50, 3 / 50, 1), null, 60_000],
];

const chosen = only ? cases.filter(([name]) => only.includes(name)) : cases;
if (only && chosen.length !== only.length) {
  const unknown = only.filter((o) => !cases.some(([name]) => name === o));
  process.stderr.write(`CAIRN_EXACT_ONLY names no case called ${unknown.map((u) => `"${u}"`).join(', ')}; the cases are: ${cases.map(([name]) => `"${name}"`).join('; ')}\n`);
  process.exit(2);
}
const rows = chosen.map(([name, g, targetMs, ownLimitMs]) => {
  global.gc?.();
  const before = process.memoryUsage().rss;
  let peak = before;
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 50);
  const caseLimitMs = Math.max(limitMs, targetMs ?? 0, ownLimitMs ?? 0);
  const solveOnce = () => exactTreeDepth(g, { timeLimitMs: caseLimitMs, onProgress: () => (peak = Math.max(peak, process.memoryUsage().rss)) });
  const r = solveOnce();
  // Repeated while cheap (the machine is noisy): five runs under 3 s, three under 20 s, else one; the
  // figure is the median. A finished search is deterministic, so every run must count the same nodes.
  const elapsed = [r.elapsedMs];
  const runs = r.status !== 'exact' ? 1 : r.elapsedMs < 3000 ? 5 : r.elapsedMs < 20_000 ? 3 : 1;
  while (elapsed.length < runs) {
    const again = solveOnce();
    if (again.nodes !== r.nodes || again.upper !== r.upper) throw new Error(`${name}: a second run differs (${again.nodes} nodes, ${again.upper} labels)`);
    elapsed.push(again.elapsedMs);
  }
  clearInterval(timer);
  peak = Math.max(peak, process.memoryUsage().rss);
  const median = [...elapsed].sort((a, b) => a - b)[elapsed.length >> 1]!;
  const row = {
    name,
    vertices: g.vertexCount,
    status: r.status,
    lower: r.lower,
    upper: r.upper,
    elapsedMs: median,
    elapsedMsRuns: elapsed,
    nodes: r.nodes,
    memoSize: r.memoSize,
    peakRssMiB: Math.round(peak / 2 ** 20),
    targetMs,
    timeLimitMs: caseLimitMs,
    meetsTarget: targetMs === null ? null : r.status === 'exact' && median <= targetMs,
  };
  process.stdout.write(`${name}: ${r.status} [${r.lower}, ${r.upper}] in ${median} ms (median of ${elapsed.join(', ')}), ${r.nodes} nodes, memo ${r.memoSize}, peak ${row.peakRssMiB} MiB\n`);
  return row;
});

const dir = new URL('./results/', import.meta.url);
const file = new URL('exact.json', dir);
type Row = Omit<(typeof rows)[number], 'timeLimitMs'> & { recordedAt?: string; timeLimitMs?: number };
const previous: { recordedAt?: string; timeLimitMs?: number; cases?: Row[] } = only && existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : {};
const now = new Date().toISOString();
// A partial run dates its own rows; the rows kept carry the date and limit they were recorded with.
const kept = (row: Row): Row => ({ ...row, recordedAt: row.recordedAt ?? previous.recordedAt, timeLimitMs: row.timeLimitMs ?? previous.timeLimitMs });
const out = {
  recordedAt: now,
  machine: machineDescription(),
  timeLimitMs: limitMs,
  cases: only
    ? cases.map(([name]) => {
        const fresh = rows.find((r) => r.name === name);
        if (fresh) return { ...fresh, recordedAt: now };
        const old = previous.cases?.find((r) => r.name === name);
        return old ? kept(old) : undefined;
      }).filter((r) => r !== undefined)
    : rows,
};
mkdirSync(dir, { recursive: true });
writeFileSync(file, `${JSON.stringify(out, null, 2)}\n`);
process.stdout.write('figures written to bench/results/exact.json\n');
