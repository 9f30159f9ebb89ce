/**
 * A graph named in words: a family with its sizes, or a file to read. The text form is
 * `family:size` (`grid:4x7`, `staircase:6`, `mask:<file>`, ...) or a plain file path; mask and tree
 * specs may carry their content inline (`text`, `parents`) where no file system is at hand.
 */
export type GraphSpec =
  | { family: 'grid'; rows: number; cols: number }
  | { family: 'cylinder'; rows: number; cols: number }
  | { family: 'torus'; rows: number; cols: number }
  | { family: 'staircase'; t: number }
  | { family: 'path'; n: number }
  | { family: 'cycle'; n: number }
  | { family: 'complete'; n: number }
  | { family: 'bipartite'; a: number; b: number }
  | { family: 'star'; leaves: number }
  | { family: 'random-tree'; n: number; seed: number }
  | { family: 'gnp'; n: number; p: number; seed: number }
  | { family: 'mask'; file?: string; text?: string }
  | { family: 'tree'; file?: string; parents?: number[] }
  | { family: 'file'; file: string; format?: string };

export type GraphSpecFamily = GraphSpec['family'];

/** The families a text spec may name, with the size syntax each takes (for help and error messages). */
export const SPEC_FAMILIES: Readonly<Record<Exclude<GraphSpecFamily, 'file'>, string>> = {
  grid: 'grid:ROWSxCOLS',
  cylinder: 'cylinder:ROWSxCOLS',
  torus: 'torus:ROWSxCOLS',
  staircase: 'staircase:T',
  path: 'path:N',
  cycle: 'cycle:N',
  complete: 'complete:N',
  bipartite: 'bipartite:AxB',
  star: 'star:LEAVES',
  'random-tree': 'random-tree:N[:SEED]',
  gnp: 'gnp:N:P[:SEED]',
  mask: 'mask:FILE',
  tree: 'tree:FILE',
};
