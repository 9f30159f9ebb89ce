import { graphFromSpec, solve } from '@cairn/engine';
import { EnginePool, type EngineTask, type EngineTaskResult } from '@cairn/engine/pool';
import type { RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { executeRunJob, rejectCertificate } from '../src/jobs/run-executor';
import { api, FAST_QUEUE, startRunsHarness, waitForRun, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// The server checks what a worker claims before storing it: a certificate that is not a ranking of the
// run's graph fails the run (certificate_rejected) and never reaches the atlas; engine errors fail the
// run with their code and message.
vi.setConfig({ testTimeout: 60_000, hookTimeout: 60_000 });

let h: RunsHarness;
let owner: string;

beforeAll(async () => {
  h = await startRunsHarness('jobs_verify', { workers: true });
  owner = (await insertMemberWithKey(h.source, 'owner-verify', 'researcher')).authorization;
});
afterAll(() => h?.close());

/** The real engine pool, with the answer's labels altered afterwards: a worker whose claim is wrong. */
class MisreportingPool extends EnginePool {
  override async run(task: EngineTask, options?: Parameters<EnginePool['run']>[1]): Promise<EngineTaskResult> {
    const answer = await super.run(task, options);
    if (answer.kind !== 'solve') return answer;
    const labels = [...answer.solution.labels];
    // Two neighbours of the path (vertices 0 and 1) with one label: no longer a ranking.
    labels[1] = labels[0]!;
    return { kind: 'solve', solution: { ...answer.solution, labels } };
  }
}

describe('re-verification on the server', () => {
  it('names what is wrong with a certificate (checked on the engine pool)', async () => {
    const input = { spec: { family: 'path' as const, n: 8 }, files: {} };
    const s = solve(graphFromSpec(input.spec));
    const pool = new EnginePool({ size: 1 });
    try {
      expect(await rejectCertificate(pool, input, s)).toBeUndefined();
      expect(await rejectCertificate(pool, input, { ...s, labels: s.labels.slice(1) })).toBe('the certificate is not one label per vertex: expected 8 labels, one per vertex, got 7');
      expect(await rejectCertificate(pool, input, { ...s, labels: s.labels.map(() => 1) })).toMatch(/^the certificate is not a ranking: vertices \d and \d both have label 1/);
      expect(await rejectCertificate(pool, input, { ...s, upper: s.upper + 1 })).toBe(`the certificate uses ${s.upper} labels but claims an upper bound of ${s.upper + 1}`);
      expect(await rejectCertificate(pool, input, { ...s, rankNumber: s.upper + 1 })).toMatch(/^the rank number/);
    } finally {
      await pool.close();
    }
  });

  it('fails a run whose worker claims a certificate that is not a ranking, and keeps it out of the atlas', async () => {
    await h.stopWorkers();
    const run = (await api<RunView>(h, 'POST', '/api/v1/runs', owner, { spec: 'path:12' })).body;
    const pool = new MisreportingPool({ size: 1 });
    try {
      await executeRunJob({ ctx: h.ctx, source: h.source, pool, worker: 'test:verify', settings: FAST_QUEUE, closing: new AbortController().signal }, run.id);
    } finally {
      await pool.close();
    }
    const failed = (await api<RunView>(h, 'GET', `/api/v1/runs/${run.id}`, owner)).body;
    expect(failed.status).toBe('failed');
    expect(failed.error!.code).toBe('certificate_rejected');
    expect(failed.error!.message).toMatch(/re-verification refused the result: the certificate is not a ranking: vertices 0 and 1 both have label/);
    expect(failed.result).toBeNull();
    const [{ n }] = (await h.source.query(`SELECT count(*)::int AS n FROM atlas_entries WHERE graph_key = 'path:12'`)) as [{ n: number }];
    expect(n).toBe(0);
    await h.startWorkers();
  });

  it('fails a run with the engine error that stopped it', async () => {
    // No closed form is known for the 5 x 5 grid, so method formula cannot answer.
    const run = (await api<RunView>(h, 'POST', '/api/v1/runs', owner, { spec: 'grid:5x5', method: 'formula' })).body;
    const failed = await waitForRun(h, run.id, owner);
    expect(failed.status).toBe('failed');
    // The engine's reason reaches the run. (The pool reports errors from its threads as worker_failed
    // with the engine's message; the engine's own code, no_formula, would be as good.)
    expect(['no_formula', 'worker_failed']).toContain(failed.error!.code);
    expect(failed.error!.message).toMatch(/no closed form applies to this graph/);
    expect(failed.result).toBeNull();
  });
});
