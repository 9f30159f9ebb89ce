import { GraphSpec, type VerifyRequest } from '@cairn/schema';
import { gridLayout, maskLayout, staircaseLayout, type CellLayout } from '../ranking/grid-cells';

/** What the graph box holds, read far enough to check the labels' count and to draw the cells. */
export interface GraphInput {
  spec: NonNullable<VerifyRequest['spec']>;
  /** In words, for the hint under the box. */
  describe: string;
  /** Vertices the graph has, when the text says (not for random graphs whose size the server decides). */
  vertexCount: number | null;
  /** Where each vertex sits, for grid-like graphs (and paths, drawn as one row). */
  layout: CellLayout | null;
  /** A mask: label rows may carry "." for its holes. */
  mask: boolean;
}

export type GraphRead = { ok: true; input: GraphInput } | { ok: false; message: string };

const firstIssue = (r: { success: boolean; error?: { issues: { message: string }[] } }) => r.error?.issues[0]?.message ?? 'not a graph spec';

/** Pictures beyond this many cells are left out (the canvas would be a blur of pixels anyway). */
const PICTURE_MAX_CELLS = 250_000;
const pictured = (layout: CellLayout) => (layout.cellOf.length <= PICTURE_MAX_CELLS ? layout : null);

/**
 * Reads the graph box: a text spec (`grid:4x7`, `staircase:6`, `path:12`, …), a pasted mask of `#` and
 * `.`, or a JSON spec. Grid-like specs are checked with the shared GraphSpec rules, so "torus:2x5" is
 * refused here with the server's own sentence.
 */
export function readGraphInput(raw: string): GraphRead {
  const text = raw.trim();
  if (text === '') return { ok: false, message: 'Give the graph: a spec such as grid:4x7, or paste a mask of # and .' };

  if (/^[#.\s]+$/.test(text)) {
    const lines = text.split(/\r?\n/).map((l) => l.trim()).filter((l) => l.length > 0);
    const width = lines[0]!.length;
    const bad = lines.findIndex((l) => l.length !== width);
    if (bad >= 0) return { ok: false, message: `mask row ${bad + 1} has ${lines[bad]!.length} cells and holes; row 1 has ${width}` };
    const maskText = lines.join('\n');
    const checked = GraphSpec.safeParse({ family: 'mask', text: maskText });
    if (!checked.success) return { ok: false, message: firstIssue(checked) };
    const layout = maskLayout(maskText);
    if (layout.cellOf.length === 0) return { ok: false, message: 'the mask has no cells (#)' };
    return { ok: true, input: { spec: { family: 'mask', text: maskText }, describe: `a ${layout.rows} × ${layout.cols} mask with ${layout.cellOf.length} cells`, vertexCount: layout.cellOf.length, layout: pictured(layout), mask: true } };
  }

  if (text.startsWith('{')) {
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch {
      return { ok: false, message: 'this looks like JSON but does not parse' };
    }
    const checked = GraphSpec.safeParse(json);
    if (!checked.success) return { ok: false, message: firstIssue(checked) };
    const spec = checked.data;
    return { ok: true, input: { spec, describe: `a ${spec.family} graph (JSON spec)`, ...shapeOf(spec) } };
  }

  const m = /^([a-z][a-z-]*):(.*)$/s.exec(text);
  if (!m) return { ok: false, message: `"${text.slice(0, 40)}" is not a spec: name a family, as in grid:4x7 or staircase:6, or paste a mask` };
  const [, family, body] = m as unknown as [string, string, string];
  const two = /^\s*(\d+)\s*[x×X]\s*(\d+)\s*$/.exec(body);
  const one = /^\s*(\d+)\s*$/.exec(body);
  let spec: unknown = null;
  if ((family === 'grid' || family === 'cylinder' || family === 'torus') && two) spec = { family, rows: Number(two[1]), cols: Number(two[2]) };
  else if (family === 'bipartite' && two) spec = { family, a: Number(two[1]), b: Number(two[2]) };
  else if (family === 'staircase' && one) spec = { family, t: Number(one[1]) };
  else if ((family === 'path' || family === 'cycle' || family === 'complete') && one) spec = { family, n: Number(one[1]) };
  else if (family === 'star' && one) spec = { family, leaves: Number(one[1]) };
  if (spec === null) {
    if (family === 'mask' || family === 'tree') return { ok: false, message: `${family}:FILE names a file, and the server reads none of yours: paste the mask here, or upload the graph and pick it below` };
    // Other families (random-tree:100:7, gnp:60:0.1:7) go to the server as written; it checks them.
    return { ok: true, input: { spec: text, describe: `${family} (checked by the server)`, vertexCount: null, layout: null, mask: false } };
  }
  const checked = GraphSpec.safeParse(spec);
  if (!checked.success) return { ok: false, message: `${text}: ${firstIssue(checked)}` };
  return { ok: true, input: { spec: text, describe: describeSpec(checked.data), ...shapeOf(checked.data) } };
}

function describeSpec(s: GraphSpec): string {
  switch (s.family) {
    case 'grid':
    case 'cylinder':
    case 'torus':
      return `the ${s.rows} × ${s.cols} ${s.family} (${s.rows * s.cols} vertices)`;
    case 'staircase':
      return `the staircase S(${s.t}) (${(s.t * (s.t + 1)) / 2} vertices)`;
    default:
      return `a ${s.family} graph`;
  }
}

function shapeOf(s: GraphSpec): Pick<GraphInput, 'vertexCount' | 'layout' | 'mask'> {
  switch (s.family) {
    case 'grid':
    case 'cylinder':
    case 'torus':
      return { vertexCount: s.rows * s.cols, layout: s.rows * s.cols <= PICTURE_MAX_CELLS ? gridLayout(s.rows, s.cols) : null, mask: false };
    case 'staircase':
      return { vertexCount: (s.t * (s.t + 1)) / 2, layout: pictured(staircaseLayout(s.t)), mask: false };
    case 'path':
      return { vertexCount: s.n, layout: s.n <= PICTURE_MAX_CELLS ? gridLayout(1, s.n) : null, mask: false };
    case 'mask': {
      const layout = maskLayout(s.text);
      return { vertexCount: layout.cellOf.length, layout: pictured(layout), mask: true };
    }
    case 'cycle':
    case 'complete':
      return { vertexCount: s.n, layout: null, mask: false };
    case 'bipartite':
      return { vertexCount: s.a + s.b, layout: null, mask: false };
    case 'star':
      return { vertexCount: s.leaves + 1, layout: null, mask: false };
    case 'tree':
      return { vertexCount: s.parents.length, layout: null, mask: false };
    default:
      return { vertexCount: null, layout: null, mask: false };
  }
}

/** A vertex in words: its row and column for grid-like graphs, else its number. */
export function vertexName(v: number, layout: CellLayout | null): string {
  const cell = layout?.cellOf[v];
  if (layout && cell !== undefined) return `row ${Math.floor(cell / layout.cols) + 1}, column ${(cell % layout.cols) + 1}`;
  return `vertex ${v}`;
}
