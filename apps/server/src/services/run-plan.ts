import { eliminationForest, eliminationOrder, stepPlan } from '@cairn/engine';
import type { RunPlan } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { HttpError } from '../http/errors';
import { buildGraph, engineInputOf } from './run-engine-input';
import type { RunRow } from './run-row';

/**
 * The schedule a run's certificate gives: its elimination forest, step plan and elimination ordering,
 * computed from the stored ranking on the run's own graph (so it is always the certificate's, never a
 * second guess).
 */
export async function runPlanOf(source: DataSource, row: RunRow): Promise<RunPlan> {
  const labels = row.certificate;
  if (!labels || labels.length === 0) {
    throw new HttpError(409, 'no_certificate', `run ${row.id} has no certificate ranking yet (status ${row.status})`);
  }
  const input = await engineInputOf(source, row.spec);
  if (!input) throw new HttpError(410, 'graph_gone', `the uploaded graph of run ${row.id} no longer exists`);
  const graph = buildGraph(input);
  return {
    runId: row.id,
    vertexCount: graph.vertexCount,
    forestParents: Array.from(eliminationForest(graph, labels)),
    steps: stepPlan(graph, labels).map((s) => ({ step: s.step, vertices: s.vertices, count: s.vertices.length })),
    order: Array.from(eliminationOrder(graph, labels)),
  };
}
