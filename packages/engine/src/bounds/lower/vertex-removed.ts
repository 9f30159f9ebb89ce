import { SizeError } from '../../errors';
import type { GridLayout } from '../../graph/family';
import { Graph } from '../../graph/graph';
import type { LowerBound } from '../lower-bound';
import { CITE } from './citations';

/**
 * A lower bound for G from one for G − v. G − v is a subgraph of G and td is monotone under subgraphs
 * (Nešetřil & Ossona de Mendez, Sparsity, 2012), so td(G) >= td(G − v) >= `valueWithoutIt`: the bound
 * is `valueWithoutIt` itself, not one less. `valueWithoutIt` must be a lower bound (or the exact value)
 * of χr(G − v); `provenance` says where it comes from.
 *
 * The other fact, that removing a vertex lowers td by at most one (td(G) <= td(G − v) + 1: give v a label
 * above all of G − v's), runs the other way: it turns an upper bound U for G − v into the upper bound
 * U + 1 for G, and a lower bound L for G into the lower bound L − 1 for G − v. An upper bound for G − v
 * says nothing about a lower bound for G.
 */
export function vertexRemovedBound(vertex: number, valueWithoutIt: number, provenance: string): LowerBound {
  if (!Number.isInteger(vertex) || vertex < 0) throw new SizeError(`vertexRemovedBound: the vertex must be a whole number >= 0, got ${vertex}`);
  if (!Number.isInteger(valueWithoutIt) || valueWithoutIt < 0) throw new SizeError(`vertexRemovedBound: the value must be a whole number >= 0, got ${valueWithoutIt}`);
  return {
    value: valueWithoutIt,
    witness: { kind: 'vertex-removed', vertex, value: valueWithoutIt, provenance },
    argument: `G − ${vertex} has χr >= ${valueWithoutIt} (${provenance}); G − ${vertex} is a subgraph of G and χr is monotone under subgraphs (${CITE.sparsity}), so χr(G) >= ${valueWithoutIt}`,
  };
}

/**
 * G − v: vertex v removed, the vertices above it renumbered one lower (w > v becomes w − 1). The layout
 * keeps the other cells, so a grid shape stays a grid shape; the family no longer applies and is dropped.
 */
export function graphWithoutVertex(g: Graph, vertex: number): Graph {
  const n = g.vertexCount;
  if (!Number.isInteger(vertex) || vertex < 0 || vertex >= n) throw new SizeError(`graphWithoutVertex: vertex ${vertex} is not one of 0..${n - 1}`);
  const offsets = new Uint32Array(n);
  const targets = new Uint32Array(g.targets.length - 2 * g.degree(vertex));
  let k = 0;
  for (let v = 0, nv = 0; v < n; v++) {
    if (v === vertex) continue;
    offsets[nv++] = k;
    for (const w of g.neighbours(v)) if (w !== vertex) targets[k++] = w > vertex ? w - 1 : w;
  }
  offsets[n - 1] = k;
  let layout: GridLayout | undefined;
  if (g.layout) {
    const cells = new Int32Array(n - 1);
    for (let v = 0, nv = 0; v < n; v++) if (v !== vertex) cells[nv++] = g.layout.cells[v]!;
    layout = { rows: g.layout.rows, cols: g.layout.cols, cells };
  }
  return new Graph(offsets, targets, undefined, layout);
}
