import type { EntityManager } from 'typeorm';
import type { Logger } from '../logger';
import type { GraphKey } from './graph-key';
import { queryRows } from './run-row';

/** What one finished run established about its graph. */
export interface RunFinding {
  key: GraphKey;
  vertexCount: number;
  edgeCount: number;
  runId: string;
  lower: number;
  upper: number;
  /** The lower side's argument (how it is known) and the upper side's construction (the certificate's). */
  lowerProvenance: Record<string, unknown>;
  upperProvenance: Record<string, unknown>;
}

export interface Tightening {
  created: boolean;
  lower: boolean;
  upper: boolean;
}

interface EntrySides {
  lower: number;
  upper: number;
}

/**
 * Tightens the atlas entry of a graph with one run's finding, inside the run's result transaction: a side
 * changes only when the run improves it (a higher lower bound, a lower upper bound), and then records
 * the run and the argument that proved it. So an exact entry is never weakened. The entry's row is
 * locked (FOR UPDATE) for the decision, which makes concurrent runs of one graph take turns. A finding
 * that contradicts the entry (its lower above the entry's upper, or the reverse) means a wrong lower
 * bound somewhere: the entry is left as it is and the contradiction logged, never stored.
 */
export async function tightenAtlas(manager: EntityManager, f: RunFinding, logger: Logger): Promise<Tightening> {
  const [inserted] = await queryRows<{ graph_key: string }>(
    manager,
    `INSERT INTO atlas_entries (graph_key, family, sizes, vertex_count, edge_count, lower, upper, exact, lower_provenance, upper_provenance, lower_run_id, upper_run_id)
     VALUES ($1, $2, $3::jsonb, $4::int, $5::int, $6::int, $7::int, $6::int = $7::int, $8::jsonb, $9::jsonb, $10::uuid, $10::uuid)
     ON CONFLICT (graph_key) DO NOTHING RETURNING graph_key`,
    [f.key.key, f.key.family, f.key.sizes, f.vertexCount, f.edgeCount, f.lower, f.upper, f.lowerProvenance, f.upperProvenance, f.runId],
  );
  if (inserted) return { created: true, lower: true, upper: true };
  const [entry] = await queryRows<EntrySides>(manager, `SELECT lower, upper FROM atlas_entries WHERE graph_key = $1 FOR UPDATE`, [f.key.key]);
  if (!entry) return { created: false, lower: false, upper: false };
  if (f.lower > entry.upper || f.upper < entry.lower) {
    logger.error({ graphKey: f.key.key, entry, run: f.runId, lower: f.lower, upper: f.upper }, 'a run contradicts the atlas; the entry is left unchanged');
    return { created: false, lower: false, upper: false };
  }
  const lower = f.lower > entry.lower;
  const upper = f.upper < entry.upper;
  if (!lower && !upper) return { created: false, lower, upper };
  await manager.query(
    `UPDATE atlas_entries SET
       lower = CASE WHEN $2::boolean THEN $4::int ELSE lower END,
       lower_provenance = CASE WHEN $2::boolean THEN $6::jsonb ELSE lower_provenance END,
       lower_run_id = CASE WHEN $2::boolean THEN $8::uuid ELSE lower_run_id END,
       upper = CASE WHEN $3::boolean THEN $5::int ELSE upper END,
       upper_provenance = CASE WHEN $3::boolean THEN $7::jsonb ELSE upper_provenance END,
       upper_run_id = CASE WHEN $3::boolean THEN $8::uuid ELSE upper_run_id END,
       exact = (CASE WHEN $2::boolean THEN $4::int ELSE lower END) = (CASE WHEN $3::boolean THEN $5::int ELSE upper END),
       updated_at = now()
     WHERE graph_key = $1`,
    [f.key.key, lower, upper, f.lower, f.upper, f.lowerProvenance, f.upperProvenance, f.runId],
  );
  return { created: false, lower, upper };
}
