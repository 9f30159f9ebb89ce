import type { Graph } from '../graph/graph';
import { orderByLabel } from './label-order';
import { requireRanking } from './require-ranking';

/** One step of a plan read from a ranking: every vertex with this label, to be handled side by side. */
export interface PlanStep {
  /** 1, 2, ... from the bottom (the smallest label) up. */
  step: number;
  label: number;
  vertices: number[];
}

/**
 * The step plan of a ranking, bottom up: step s handles every vertex with the s-th smallest label.
 * Vertices of one step share no path of smaller labels, so their work is independent.
 */
export function stepPlan(g: Graph, labels: ArrayLike<number>): PlanStep[] {
  requireRanking(g, labels, 'stepPlan');
  const { order } = orderByLabel(g, labels);
  const steps: PlanStep[] = [];
  for (let i = 0; i < order.length; i++) {
    const v = order[i]!;
    const label = labels[v]!;
    const last = steps[steps.length - 1];
    if (last && last.label === label) last.vertices.push(v);
    else steps.push({ step: steps.length + 1, label, vertices: [v] });
  }
  return steps;
}

/**
 * An elimination order for sparse factorisation: the vertices by ascending label (ties by number).
 * Eliminating in this order gives an elimination tree no taller than the number of labels.
 */
export function eliminationOrder(g: Graph, labels: ArrayLike<number>): Uint32Array {
  requireRanking(g, labels, 'eliminationOrder');
  return orderByLabel(g, labels).order;
}
