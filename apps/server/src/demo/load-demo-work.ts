import type { SweepRequest } from '@cairn/schema';
import { RunRequest as RunRequestSchema, SweepRequest as SweepRequestSchema } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import type { ServerContext } from '../context';
import { User } from '../entities/user.entity';
import { readUpload, storeUpload, type MemberActor } from '../services/graphs';
import { createRun } from '../services/runs';
import { createSweep } from '../services/sweeps';
import { COURTYARD_MASK, WORKBENCH_ASSEMBLY } from './demo-graphs';

export interface DemoWork {
  runs: number;
  sweeps: number;
  uploads: number;
}

async function actorFor(source: DataSource, login: string): Promise<MemberActor> {
  const user = await source.getRepository(User).findOneByOrFail({ login });
  return { kind: 'session', user };
}

/**
 * The demo's work, queued through the same services as the API so the server computes every value
 * itself: the Tollgate lattice group tabulates 4-row grids and a few shapes, the Brackwater Joinery
 * uploads its workbench assembly. Loading again adds nothing (identical runs are found, the sweep by name,
 * the upload by its content).
 */
export async function loadDemoWork(ctx: ServerContext, source: DataSource): Promise<DemoWork> {
  const tobias = await actorFor(source, 'tobias-quell');
  const wren = await actorFor(source, 'wren-adeyemi');
  const ines = await actorFor(source, 'ines-marlow');
  let runs = 0;
  const run = async (actor: MemberActor, request: Record<string, unknown>) => {
    const { created } = await createRun(ctx, source, actor, RunRequestSchema.parse(request));
    if (created) runs++;
  };

  await run(tobias, { spec: 'grid:4x7', method: 'exact', timeLimitSeconds: 60, visibility: 'public' });
  await run(tobias, { spec: 'staircase:6', method: 'auto', timeLimitSeconds: 30, visibility: 'public' });
  await run(tobias, { spec: { family: 'mask', text: COURTYARD_MASK }, method: 'auto', timeLimitSeconds: 30, visibility: 'public' });
  await run(tobias, { spec: 'grid:12x12', method: 'bounds', timeLimitSeconds: 10, visibility: 'link' });
  await run(ines, { spec: 'cycle:40', method: 'formula', timeLimitSeconds: 10 });

  let sweeps = 0;
  const sweep: SweepRequest = SweepRequestSchema.parse({
    name: 'Four-row grids, 4 x 1 to 4 x 8',
    family: 'grid',
    rows: { from: 4, to: 4 },
    cols: { from: 1, to: 8 },
    method: 'auto',
    timeLimitSeconds: 15,
    visibility: 'public',
  });
  const [existing] = (await source.query(`SELECT id FROM sweeps WHERE owner_id = $1 AND name = $2`, [tobias.user.id, sweep.name])) as { id: string }[];
  if (!existing) {
    await createSweep(ctx, source, tobias, sweep);
    sweeps++;
  }

  const bytes = Buffer.from(WORKBENCH_ASSEMBLY);
  const upload = readUpload(bytes, 'workbench-frame.edges', 'edge-list');
  const stored = await storeUpload(source, wren.user.id, { name: 'workbench-frame.edges', format: upload.format, bytes, read: upload.read });
  await run(wren, { graphId: stored.graph.id, method: 'auto', timeLimitSeconds: 30, visibility: 'link' });
  await run(wren, { spec: 'random-tree:500:7', method: 'auto', timeLimitSeconds: 10 });

  return { runs, sweeps, uploads: stored.created ? 1 : 0 };
}
