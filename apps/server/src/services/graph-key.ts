import { createHash } from 'node:crypto';
import { formatGraphSpec, parseMaskText, type GraphSpec } from '@cairn/engine';

/** A spec the atlas can key: any built-in family (masks and trees inline), or an upload by its content hash. */
export type KeyedSpec = Exclude<GraphSpec, { family: 'file' }> | { family: 'upload'; sha256: string };

/** The atlas's name for a graph, the family it files it under, and the sizes to filter by. */
export interface GraphKey {
  key: string;
  family: string;
  sizes: Record<string, number>;
}

const hashOf = (text: string) => createHash('sha256').update(text).digest('hex');

/**
 * One key per graph up to the symmetry the spec makes obvious: a grid or torus and its transpose are
 * the same graph (rows <= cols in the key), so are K_{a,b} and K_{b,a}; a mask is keyed by its cells
 * trimmed to their bounding box and taken in the least of the 8 symmetries of the square (a full
 * rectangle is the grid); an upload by the SHA-256 of its file. Cylinders P_m x C_n are not symmetric
 * and keep their order. Other families use the engine's canonical text form.
 */
export function graphKeyOf(spec: KeyedSpec): GraphKey {
  switch (spec.family) {
    case 'grid':
    case 'torus': {
      const [rows, cols] = spec.rows <= spec.cols ? [spec.rows, spec.cols] : [spec.cols, spec.rows];
      return { key: `${spec.family}:${rows}x${cols}`, family: spec.family, sizes: { rows, cols } };
    }
    case 'cylinder':
      return { key: formatGraphSpec(spec), family: spec.family, sizes: { rows: spec.rows, cols: spec.cols } };
    case 'bipartite': {
      const [a, b] = spec.a <= spec.b ? [spec.a, spec.b] : [spec.b, spec.a];
      return { key: `bipartite:${a}x${b}`, family: spec.family, sizes: { a, b } };
    }
    case 'staircase':
      return { key: formatGraphSpec(spec), family: spec.family, sizes: { t: spec.t } };
    case 'path':
    case 'cycle':
    case 'complete':
      return { key: formatGraphSpec(spec), family: spec.family, sizes: { n: spec.n } };
    case 'star':
      return { key: formatGraphSpec(spec), family: spec.family, sizes: { leaves: spec.leaves } };
    case 'random-tree':
      return { key: formatGraphSpec(spec), family: spec.family, sizes: { n: spec.n, seed: spec.seed } };
    case 'gnp':
      return { key: formatGraphSpec(spec), family: spec.family, sizes: { n: spec.n, p: spec.p, seed: spec.seed } };
    case 'mask':
      return maskKey(spec.text ?? '');
    case 'tree': {
      const parents = spec.parents ?? [];
      return { key: `tree:${parents.length}:${hashOf(parents.join(',')).slice(0, 24)}`, family: 'tree', sizes: { n: parents.length } };
    }
    case 'upload':
      return { key: `upload:${spec.sha256}`, family: 'upload', sizes: {} };
  }
}

/** The key of a mask: its trimmed cells in the least of the square's 8 symmetries, hashed. */
function maskKey(text: string): GraphKey {
  const shape = parseMaskText(text);
  let top = shape.rows;
  let bottom = -1;
  let left = shape.cols;
  let right = -1;
  let cells = 0;
  for (let r = 0; r < shape.rows; r++) {
    for (let c = 0; c < shape.cols; c++) {
      if (!shape.present[r * shape.cols + c]) continue;
      cells++;
      top = Math.min(top, r);
      bottom = Math.max(bottom, r);
      left = Math.min(left, c);
      right = Math.max(right, c);
    }
  }
  const h = bottom - top + 1;
  const w = right - left + 1;
  if (cells === h * w) return graphKeyOf({ family: 'grid', rows: h, cols: w });
  const at = (r: number, c: number) => shape.present[(top + r) * shape.cols + (left + c)] === 1;
  // The 8 symmetries of the square as maps from a cell of the transformed picture to the original.
  const maps: [number, number, (r: number, c: number) => boolean][] = [
    [h, w, (r, c) => at(r, c)],
    [h, w, (r, c) => at(r, w - 1 - c)],
    [h, w, (r, c) => at(h - 1 - r, c)],
    [h, w, (r, c) => at(h - 1 - r, w - 1 - c)],
    [w, h, (r, c) => at(c, r)],
    [w, h, (r, c) => at(c, h - 1 - r)],
    [w, h, (r, c) => at(w - 1 - c, r)],
    [w, h, (r, c) => at(w - 1 - c, h - 1 - r)],
  ];
  let best: { rows: number; cols: number; picture: string } | undefined;
  for (const [rows, cols, cell] of maps) {
    const bytes = new Uint8Array(rows * (cols + 1));
    let i = 0;
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < cols; c++) bytes[i++] = cell(r, c) ? 35 : 46; // '#' and '.'
      bytes[i++] = 10;
    }
    const picture = new TextDecoder().decode(bytes);
    if (!best || rows < best.rows || (rows === best.rows && picture < best.picture)) best = { rows, cols, picture };
  }
  return { key: `mask:${best!.rows}x${best!.cols}:${hashOf(best!.picture).slice(0, 24)}`, family: 'mask', sizes: { rows: best!.rows, cols: best!.cols, cells } };
}
