/** What proves a lower bound; each can be checked against the graph by anyone. */
export type LowerBoundWitness =
  /** A path of the graph (consecutive vertices adjacent, none repeated): χr >= ⌊log2 length⌋ + 1. */
  | { kind: 'path'; vertices: number[] }
  /** A clique (every two adjacent): χr >= its size. */
  | { kind: 'clique'; vertices: number[] }
  /** The `degeneracy`-core: a vertex set in which every vertex has at least `degeneracy` neighbours inside it. */
  | { kind: 'degeneracy'; degeneracy: number; core: number[] }
  /** Minor-min-width: the contraction sequence that reached a minor of minimum degree `width`. */
  | { kind: 'minor-min-width'; width: number; contractions: [number, number][] }
  /** A contained full rectangle of a grid shape, at (row, col) in the layout, whose rank number is known. */
  | { kind: 'rectangle'; row: number; col: number; rows: number; cols: number; value: number; provenance: string }
  /** A contained staircase S(t) of a grid shape, anchored at (row, col), whose rank number is known. */
  | { kind: 'staircase'; row: number; col: number; t: number; value: number; provenance: string }
  /** The graph with `vertex` removed has rank number at least `value`, so G has too (χr never grows on subgraphs). */
  | { kind: 'vertex-removed'; vertex: number; value: number; provenance: string }
  /** Nothing to check: every graph with a vertex needs one label. */
  | { kind: 'trivial' };

/** A lower bound on the rank number with the sub-structure that proves it. */
export interface LowerBound {
  value: number;
  witness: LowerBoundWitness;
  /** The argument in words, with its source. */
  argument: string;
}
