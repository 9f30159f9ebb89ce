import type { Graph } from '../../graph/graph';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';
import { cliqueBound } from './clique';
import { degeneracyBound } from './degeneracy-bound';
import type { KnownRectangleValues, KnownStaircaseValues } from './grid-shape';
import { longPathBound } from './long-path';
import { minorMinWidthBound } from './minor-min-width';
import { rectangleBound } from './rectangle';
import { staircaseBound } from './staircase';

export interface BestLowerBoundOptions {
  /** DFS step budget of the path search (see longPathBound). */
  pathBudget?: number;
  /** Work budget of the clique search (see cliqueBound). */
  cliqueBudget?: number;
  /** Work cap of minor-min-width (see minorMinWidthBound). */
  mmwBudget?: number;
  /** Above this many vertices minor-min-width is skipped (its Sets cost memory); default 1,000,000. */
  mmwMaxVertices?: number;
  /** Above this many vertices the clique search is skipped (clique <= degeneracy + 1 anyway); default 1,000,000. */
  cliqueMaxVertices?: number;
  /** Known rank numbers of full grids, for rectangle bounds (rows <= cols). */
  knownRectangle?: KnownRectangleValues;
  /** Known rank numbers of staircases, for staircase bounds. */
  knownStaircase?: KnownStaircaseValues;
  /** Bounds computed elsewhere (e.g. vertexRemovedBound), taken into the comparison as they are. */
  extra?: LowerBound[];
}

export interface BestLowerBound {
  /** The largest of `all`; the first of them on ties. */
  best: LowerBound;
  /** Every bound computed, in the order run. */
  all: LowerBound[];
}

/**
 * Runs every lower bound that applies, with budgets, and keeps the largest: the trivial bound, the
 * degeneracy (linear time, always), a long path, a clique, minor-min-width (skipped above mmwMaxVertices),
 * and for grid shapes the contained rectangles and staircases. For the empty graph: value 0.
 */
export function bestLowerBound(g: Graph, options: BestLowerBoundOptions = {}): BestLowerBound {
  const n = g.vertexCount;
  const trivial: LowerBound =
    n === 0
      ? { value: 0, witness: { kind: 'trivial' }, argument: 'the empty graph needs no labels' }
      : { value: 1, witness: { kind: 'trivial' }, argument: `every graph with a vertex needs one label (${CITE.common})` };
  const all: LowerBound[] = [trivial];
  if (n > 0) {
    all.push(degeneracyBound(g));
    all.push(longPathBound(g, { budget: options.pathBudget }));
    if (n <= (options.cliqueMaxVertices ?? 1_000_000)) all.push(cliqueBound(g, { budget: options.cliqueBudget }));
    if (n <= (options.mmwMaxVertices ?? 1_000_000)) all.push(minorMinWidthBound(g, { budget: options.mmwBudget }));
    const rectangle = rectangleBound(g, options.knownRectangle);
    if (rectangle) all.push(rectangle);
    const staircase = staircaseBound(g, options.knownStaircase);
    if (staircase) all.push(staircase);
  }
  if (options.extra) all.push(...options.extra);
  let best = all[0]!;
  for (const b of all) if (b.value > best.value) best = b;
  return { best, all };
}
