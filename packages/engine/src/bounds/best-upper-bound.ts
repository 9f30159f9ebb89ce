import type { Graph } from '../graph/graph';
import { isForest } from '../graph/is-forest';
import { greedyEliminationRanking } from './greedy-elimination';
import { MidlineSplit } from './midline-split';
import { nestedDissectionRanking } from './nested-dissection';
import { optimalTreeRanking } from './tree-ranking';
import type { UpperBound } from './upper-bound';

export interface BestUpperBound {
  best: UpperBound;
  /** Every construction that applied, lowest first. */
  all: UpperBound[];
}

/**
 * Runs every construction that applies to g and keeps the lowest: the optimal tree ranking for forests,
 * the midline split for full grids, nested dissection and greedy elimination for anything.
 */
export function bestUpperBound(g: Graph): BestUpperBound {
  const all: UpperBound[] = [];
  const n = g.vertexCount;
  if (n === 0) {
    const empty: UpperBound = { value: 0, labels: new Int32Array(0), construction: 'empty', argument: 'the empty graph needs no labels' };
    return { best: empty, all: [empty] };
  }
  if (isForest(g)) {
    const labels = optimalTreeRanking(g);
    all.push({ value: maxOf(labels), labels, construction: 'tree-optimal', argument: 'optimal ranking of a forest (Schäffer, Inform. Process. Lett. 1989)' });
  }
  if (g.family?.kind === 'grid') all.push(new MidlineSplit().ranking(g.family.rows, g.family.cols));
  all.push(nestedDissectionRanking(g));
  all.push(greedyEliminationRanking(g));
  all.sort((a, b) => a.value - b.value);
  return { best: all[0]!, all };
}

function maxOf(labels: Int32Array): number {
  let m = 0;
  for (const l of labels) if (l > m) m = l;
  return m;
}
