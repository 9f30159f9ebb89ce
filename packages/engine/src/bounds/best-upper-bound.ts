import type { Graph } from '../graph/graph';
import { isForest } from '../graph/is-forest';
import { BevelledSplit } from './bevelled-split';
import { boxRestrictionRanking } from './box-restriction';
import { DiagonalSplit } from './diagonal-split';
import { FourRowDoubling } from './four-row-doubling';
import { greedyEliminationRanking } from './greedy-elimination';
import { MidlineSplit } from './midline-split';
import { nestedDissectionRanking } from './nested-dissection';
import { StaircaseRanking } from './staircase-ranking';
import { optimalTreeRanking } from './tree-ranking';
import { boundOfRanking, type UpperBound } from './upper-bound';

export interface BestUpperBound {
  best: UpperBound;
  /** Every construction that applied, lowest first. */
  all: UpperBound[];
}

/**
 * Runs every construction that applies to g and keeps the lowest (the first listed on ties): the optimal
 * tree ranking for forests; for full grids the midline split, the diagonal split, the bevelled split of
 * the whole rectangle and, with 4 rows or 4 columns, the four-row doubling; the staircase construction
 * for staircases; for masks and staircases the best of those grid constructions on the bounding grid,
 * kept on the cells present; nested dissection and greedy elimination for anything. Each says in `construction`
 * which it is.
 */
export function bestUpperBound(g: Graph): BestUpperBound {
  const all: UpperBound[] = [];
  const n = g.vertexCount;
  if (n === 0) {
    const empty: UpperBound = { value: 0, labels: new Int32Array(0), construction: 'empty', argument: 'the empty graph needs no labels' };
    return { best: empty, all: [empty] };
  }
  if (isForest(g)) {
    all.push(boundOfRanking(optimalTreeRanking(g), 'tree-optimal', () => 'optimal ranking of a forest (Schäffer, Inform. Process. Lett. 1989)'));
  }
  const f = g.family;
  if (f?.kind === 'grid') all.push(...gridConstructions(f.rows, f.cols));
  if (f?.kind === 'staircase') all.push(new StaircaseRanking().ranking(f.t));
  const restricted = boxRestrictionRanking(g, (rows, cols) => lowest(gridConstructions(rows, cols)));
  if (restricted) all.push(restricted);
  all.push(nestedDissectionRanking(g));
  all.push(greedyEliminationRanking(g));
  all.sort((a, b) => a.value - b.value); // stable: ties keep the order above
  return { best: all[0]!, all };
}

/** The rankings of the full rows x cols grid by the grid constructions, in the order bestUpperBound lists them. */
function gridConstructions(rows: number, cols: number): UpperBound[] {
  const out = [new MidlineSplit().ranking(rows, cols)];
  const split = new BevelledSplit(); // one memo for both: the diagonal split's pieces recur inside the rectangle's
  out.push(new DiagonalSplit(split).ranking(rows, cols));
  out.push(split.rectangleRanking(rows, cols));
  if (rows === 4 || cols === 4) out.push(new FourRowDoubling().gridRanking(rows, cols));
  return out;
}

/** The lowest of some bounds (the first on ties). */
function lowest(bounds: UpperBound[]): UpperBound {
  return bounds.reduce((best, b) => (b.value < best.value ? b : best));
}
