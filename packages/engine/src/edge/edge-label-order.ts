import type { Graph } from '../graph/graph';
import { orderLabels, type LabelOrder } from '../ranking/label-order';

/** Edge labels checked against a graph, with the edges (numbered as in g.edges()) in ascending label order. */
export type EdgeLabelOrder = LabelOrder;

/**
 * Checks that edgeLabels hold one positive whole number per edge of g (a LabelError names the first that
 * does not) and orders the edges by label, as ranking/label-order.ts does for vertices.
 */
export function orderEdgesByLabel(g: Graph, edgeLabels: ArrayLike<number>): EdgeLabelOrder {
  return orderLabels(edgeLabels, g.edgeCount, 'edge', 'one per edge in g.edges() order');
}
