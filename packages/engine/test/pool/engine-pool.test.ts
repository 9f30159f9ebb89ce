import { afterAll, describe, expect, it } from 'vitest';
import { EngineError, gridGraph, ParseError, SpecError, verifyRanking } from '../../src/index';
import { bruteForceTreeDepth } from '../brute-force-td';
import { EnginePool } from '../../src/pool/index';

const pool = new EnginePool({ size: 2, graceMs: 1500 });
afterAll(() => pool.close());

describe('EnginePool (real worker threads)', () => {
  it('solves on a worker and returns a ranking the verifier accepts', async () => {
    const result = await pool.run({ kind: 'solve', spec: 'grid:3x5' });
    if (result.kind !== 'solve') throw new Error('expected a solve result');
    expect(result.solution.rankNumber).toBe(bruteForceTreeDepth(gridGraph(3, 5)));
    expect(verifyRanking(gridGraph(3, 5), result.solution.labels).valid).toBe(true);
  });

  it('reads files sent with the task and verifies labels', async () => {
    const result = await pool.run({ kind: 'verify', spec: 'mask:l.mask', files: { 'l.mask': '#.\n##\n' }, labels: [1, 2, 1] });
    expect(result).toEqual({ kind: 'verify', verdict: { valid: true, labelsUsed: 2, maxLabel: 2 } });
  });

  it('reports progress and stops a search when cancelled, keeping the best interval', async () => {
    const controller = new AbortController();
    const seen: number[] = [];
    const running = pool.run({ kind: 'solve', spec: 'grid:12x12', method: 'exact' }, { signal: controller.signal, onProgress: (p) => seen.push(p.lower) });
    setTimeout(() => controller.abort(), 300);
    const result = await running;
    if (result.kind !== 'solve') throw new Error('expected a solve result');
    expect(result.solution.stats.stopReason).toBe('aborted');
    expect(result.solution.rankNumber).toBeNull();
    expect(result.solution.lower).toBeLessThan(result.solution.upper);
    expect(seen.length).toBeGreaterThan(0);
    expect(verifyRanking(gridGraph(12, 12), result.solution.labels)).toMatchObject({ valid: true, maxLabel: result.solution.upper });
  });

  it('honours a time limit inside the worker', async () => {
    const result = await pool.run({ kind: 'solve', spec: 'grid:9x9', timeLimitMs: 200 });
    if (result.kind !== 'solve') throw new Error('expected a solve result');
    expect(result.solution.stats.stopReason).toBe('time-limit');
  });

  it('starts a queued task\'s overdue clock when a worker takes it, not when it was queued', async () => {
    const one = new EnginePool({ size: 1, graceMs: 300 });
    try {
      // The second search waits about 1.5 s behind the first: counted from its queueing, the pool would
      // stop it (aborted) 0.3 s into its own 1.5 s limit.
      const [first, second] = await Promise.all([
        one.run({ kind: 'solve', spec: 'grid:12x12', method: 'exact', timeLimitMs: 1500 }),
        one.run({ kind: 'solve', spec: 'grid:12x12', method: 'exact', timeLimitMs: 1500 }),
      ]);
      for (const r of [first, second]) {
        if (r.kind !== 'solve') throw new Error('expected a solve result');
        expect(r.solution.stats.stopReason).toBe('time-limit');
      }
    } finally {
      await one.close();
    }
  }, 30_000);

  it('fails a task with a clear error and carries on', async () => {
    await expect(pool.run({ kind: 'solve', spec: 'grdi:4x4' })).rejects.toThrow(/unknown graph family 'grdi'/);
    await expect(pool.run({ kind: 'solve', spec: 'mask:gone.mask' })).rejects.toThrow(/not sent with it/);
    const after = await pool.run({ kind: 'solve', spec: 'path:9' });
    expect(after.kind === 'solve' && after.solution.rankNumber).toBe(4);
  });

  it("keeps an engine error's class, code and position across the thread boundary", async () => {
    const spec = await pool.run({ kind: 'solve', spec: 'grdi:4x4' }).catch((e: unknown) => e);
    expect(spec).toBeInstanceOf(SpecError);
    expect((spec as EngineError).code).toBe('spec_error');
    const parse = await pool.run({ kind: 'solve', spec: 'g.dimacs', files: { 'g.dimacs': 'p edge 3 1\ne 1 x\n' } }).catch((e: unknown) => e);
    expect(parse).toBeInstanceOf(ParseError);
    expect(parse).toMatchObject({ code: 'parse_error', line: 2, column: 5 });
    const formula = await pool.run({ kind: 'solve', spec: 'grid:5x5', method: 'formula' }).catch((e: unknown) => e);
    expect(formula).toBeInstanceOf(EngineError);
    expect((formula as EngineError).code).not.toBe('worker_failed');
  });

  it('fails a task that runs out of its memory limit, and the pool carries on', async () => {
    const small = new EnginePool({ size: 1, memoryLimitMb: 24 });
    try {
      // A JSON graph of 900,000 edges: parsing it makes as many small arrays in the heap, far beyond 24 MiB.
      const edges = Array.from({ length: 900_000 }, (_, i) => `[${i},${i + 1}]`).join(',');
      const files = { 'long.json': `{"vertexCount": 900001, "edges": [${edges}]}` };
      await expect(small.run({ kind: 'solve', spec: 'long.json', files, method: 'bounds' })).rejects.toThrow(/ran out of memory \(limit 24 MiB per worker\)/);
      const after = await small.run({ kind: 'solve', spec: 'cycle:9' });
      expect(after.kind === 'solve' && after.solution.rankNumber).toBe(5);
    } finally {
      await small.close();
    }
  }, 30_000);

  it('stops an exact search at the memory limit with its proven interval and a verified ranking', async () => {
    const small = new EnginePool({ size: 1, memoryLimitMb: 32 });
    try {
      // A random graph: vertex branching fills the memo fast (grids branch over separators and keep few sets).
      const result = await small.run({ kind: 'solve', spec: 'gnp:50:0.06:1', method: 'exact', timeLimitMs: 120_000 });
      if (result.kind !== 'solve') throw new Error('expected a solve result');
      const s = result.solution;
      expect(s.stats.stopReason).toBe('memory-limit');
      expect(s.rankNumber).toBeNull();
      expect(s.lower).toBeLessThan(s.upper);
      expect(s.verified).toBe(true);
      expect(Math.max(...s.labels)).toBe(s.upper);
    } finally {
      await small.close();
    }
  }, 30_000);
});
