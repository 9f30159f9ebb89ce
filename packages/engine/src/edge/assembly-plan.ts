import type { Graph } from '../graph/graph';
import { indexEdges } from './edge-index';
import { orderEdgesByLabel } from './edge-label-order';
import { requireEdgeRanking } from './require-edge-ranking';

/** One step of an assembly plan: every edge with this label, joined side by side. */
export interface AssemblyStep {
  /** 1, 2, ... from the bottom (the smallest label) up. */
  step: number;
  label: number;
  /** Edge numbers in `g.edges()` order, ascending. */
  edges: number[];
  /** The same edges as the vertex pairs [u, v], u < v, they join. */
  pairs: [number, number][];
}

/**
 * The step plan of an edge ranking, bottom up: step s joins every edge with the s-th smallest label.
 * Two edges of one step are never linked by a path of smaller labels, so no joint of an earlier step
 * connects them: each step's joints are made in separate, already finished subassemblies (the parallel
 * assembly reading of edge rankings; de la Torre, Greenlaw & Schäffer, "Optimal edge ranking of trees in
 * polynomial time", Algorithmica 13, 1995). A labelling that is not an edge ranking is a LabelError
 * naming the path that breaks it.
 */
export function assemblyPlan(g: Graph, edgeLabels: ArrayLike<number>): AssemblyStep[] {
  requireEdgeRanking(g, edgeLabels, 'assemblyPlan');
  const { order } = orderEdgesByLabel(g, edgeLabels);
  const { ends } = indexEdges(g);
  const steps: AssemblyStep[] = [];
  for (let i = 0; i < order.length; i++) {
    const e = order[i]!;
    const label = edgeLabels[e]!;
    let last = steps[steps.length - 1];
    if (!last || last.label !== label) {
      last = { step: steps.length + 1, label, edges: [], pairs: [] };
      steps.push(last);
    }
    last.edges.push(e);
    last.pairs.push([ends[2 * e]!, ends[2 * e + 1]!]);
  }
  return steps;
}
