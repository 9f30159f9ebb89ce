import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { repoRoot } from '../support/test-env';

// The built pool (what the CLI and the server run) finds its worker at dist/pool/worker.js, no TypeScript loader.
describe('the built worker pool', () => {
  it('runs a solve task on a worker thread from dist/', async () => {
    const built = (await import(pathToFileURL(join(repoRoot, 'packages/engine/dist/pool/index.js')).href)) as typeof import('@cairn/engine/pool');
    const pool = new built.EnginePool({ size: 1 });
    try {
      const result = await pool.run({ kind: 'solve', spec: 'cycle:17' });
      // χr(C_17) = 2 + ⌊log2 16⌋ = 6 (Bodlaender et al., SIAM J. Discrete Math. 1998).
      expect(result.kind === 'solve' && result.solution.rankNumber).toBe(6);
    } finally {
      await pool.close();
    }
  });
});
