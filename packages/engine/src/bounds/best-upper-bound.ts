import type { Graph } from '../graph/graph';
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
  if (g.edgeCount <= n - 1 && isForest(g)) {
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

/** True when g has no cycle: every component has one edge fewer than vertices. */
function isForest(g: Graph): boolean {
  const n = g.vertexCount;
  const seen = new Uint8Array(n);
  const stack: number[] = [];
  let components = 0;
  for (let s = 0; s < n; s++) {
    if (seen[s]) continue;
    components++;
    seen[s] = 1;
    stack.push(s);
    while (stack.length) {
      const v = stack.pop()!;
      for (const w of g.neighbours(v)) {
        if (!seen[w]) {
          seen[w] = 1;
          stack.push(w);
        }
      }
    }
  }
  return g.edgeCount === n - components;
}
