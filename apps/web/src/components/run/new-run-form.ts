import { GraphSpec, RunRequest, SolveMethod, Visibility } from '@cairn/schema';
import { z } from 'zod';
import type { RunRequestBody } from '../../api/runs';

/** The families the form offers: the spec families, plus a drawn mask and an uploaded file. */
export const FORM_FAMILIES = ['grid', 'cylinder', 'torus', 'staircase', 'path', 'cycle', 'complete', 'bipartite', 'star', 'random-tree', 'gnp', 'mask', 'upload'] as const;
export type FormFamily = (typeof FORM_FAMILIES)[number];

export type SizeField = 'rows' | 'cols' | 'sizeT' | 'n' | 'a' | 'b' | 'leaves' | 'p' | 'seed';

export const FAMILY_FORM: Record<FormFamily, { label: string; explain: string; sizes: { field: SizeField; label: string; step?: string }[] }> = {
  grid: { label: 'Grid', explain: 'rows × columns cells, each joined to the cells beside it', sizes: [{ field: 'rows', label: 'Rows' }, { field: 'cols', label: 'Columns' }] },
  cylinder: { label: 'Cylinder', explain: 'a grid whose rows close into cycles (columns at least 3)', sizes: [{ field: 'rows', label: 'Rows' }, { field: 'cols', label: 'Columns (cycle length)' }] },
  torus: { label: 'Torus', explain: 'a grid closed in both directions (both sides at least 3)', sizes: [{ field: 'rows', label: 'Rows' }, { field: 'cols', label: 'Columns' }] },
  staircase: { label: 'Staircase S(t)', explain: 'the cells (i, j) with i + j < t', sizes: [{ field: 'sizeT', label: 't' }] },
  path: { label: 'Path', explain: 'n vertices in a line', sizes: [{ field: 'n', label: 'Vertices n' }] },
  cycle: { label: 'Cycle', explain: 'n vertices in a ring (at least 3)', sizes: [{ field: 'n', label: 'Vertices n' }] },
  complete: { label: 'Complete graph', explain: 'n vertices, every pair joined', sizes: [{ field: 'n', label: 'Vertices n' }] },
  bipartite: { label: 'Complete bipartite', explain: 'a vertices on one side, b on the other, every cross pair joined', sizes: [{ field: 'a', label: 'Side a' }, { field: 'b', label: 'Side b' }] },
  star: { label: 'Star', explain: 'one centre joined to every leaf', sizes: [{ field: 'leaves', label: 'Leaves' }] },
  'random-tree': { label: 'Random tree', explain: 'a tree on n vertices drawn from the seed (the same seed gives the same tree)', sizes: [{ field: 'n', label: 'Vertices n' }, { field: 'seed', label: 'Seed' }] },
  gnp: {
    label: 'Random graph G(n, p)',
    explain: 'n vertices, each pair joined with probability p, drawn from the seed',
    sizes: [{ field: 'n', label: 'Vertices n' }, { field: 'p', label: 'Edge probability p', step: 'any' }, { field: 'seed', label: 'Seed' }],
  },
  mask: { label: 'Mask (draw the cells)', explain: 'a grid with some cells removed, drawn below', sizes: [] },
  upload: { label: 'Uploaded file', explain: 'your own graph: an edge list, DIMACS, Matrix Market, Cairn JSON or a mask file', sizes: [] },
};

/** NaN is what an emptied number input gives; the shared spec schema turns it into "rows must be a number". */
const anyNumber = z.custom<number>((v) => typeof v === 'number');

const FormShape = z.object({
  family: z.enum(FORM_FAMILIES),
  rows: anyNumber,
  cols: anyNumber,
  sizeT: anyNumber,
  n: anyNumber,
  a: anyNumber,
  b: anyNumber,
  leaves: anyNumber,
  p: anyNumber,
  seed: anyNumber,
  maskText: z.string(),
  graphId: z.string(),
  graphName: z.string(),
  method: SolveMethod,
  timeLimitSeconds: anyNumber,
  visibility: Visibility,
});
export type NewRunValues = z.infer<typeof FormShape>;
export type FormField = keyof NewRunValues;

export const NEW_RUN_DEFAULTS: NewRunValues = {
  family: 'grid',
  rows: 4,
  cols: 9,
  sizeT: 7,
  n: 12,
  a: 3,
  b: 4,
  leaves: 8,
  p: 0.1,
  seed: 1,
  // An L-shaped panel with a notch: something to start drawing from.
  maskText: '######\n######\n##....\n##..##\n',
  graphId: '',
  graphName: '',
  method: 'auto',
  timeLimitSeconds: 60,
  visibility: 'private',
};

/** The spec object of the chosen family (not for uploads). */
export function specOf(v: NewRunValues): Record<string, unknown> {
  switch (v.family) {
    case 'grid':
    case 'cylinder':
    case 'torus':
      return { family: v.family, rows: v.rows, cols: v.cols };
    case 'staircase':
      return { family: 'staircase', t: v.sizeT };
    case 'path':
    case 'cycle':
    case 'complete':
      return { family: v.family, n: v.n };
    case 'bipartite':
      return { family: 'bipartite', a: v.a, b: v.b };
    case 'star':
      return { family: 'star', leaves: v.leaves };
    case 'random-tree':
      return { family: 'random-tree', n: v.n, seed: v.seed };
    case 'gnp':
      return { family: 'gnp', n: v.n, p: v.p, seed: v.seed };
    case 'mask':
      return { family: 'mask', text: v.maskText };
    case 'upload':
      return { family: 'upload', graphId: v.graphId };
  }
}

/** What POST /api/v1/runs is sent: the spec object, or `{ graphId }` for an upload. */
export function requestBodyOf(v: NewRunValues): RunRequestBody {
  const common = { method: v.method, timeLimitSeconds: v.timeLimitSeconds, visibility: v.visibility };
  if (v.family === 'upload') return { graphId: v.graphId, ...common };
  return { spec: specOf(v) as GraphSpec, ...common };
}

/** A key of the spec object, and of the server's `body.spec.<key>`, to the form field that holds it. */
const SPEC_KEY_FIELD: Record<string, FormField> = { rows: 'rows', cols: 'cols', t: 'sizeT', n: 'n', a: 'a', b: 'b', leaves: 'leaves', p: 'p', seed: 'seed', text: 'maskText', graphId: 'graphId' };

/**
 * The form field a server problem belongs to (`body.spec.rows` → rows, `body.timeLimitSeconds` →
 * timeLimitSeconds); `body.spec` itself, or anything unknown, goes to the spec as a whole (null).
 */
export function fieldOfServerProblem(field: string): FormField | null {
  const parts = field.replace(/^body\./, '').split('.');
  if (parts[0] === 'spec') return parts[1] ? (SPEC_KEY_FIELD[parts[1]] ?? null) : null;
  if (parts[0] === 'graphId') return 'graphId';
  if (parts[0] === 'method' || parts[0] === 'timeLimitSeconds' || parts[0] === 'visibility') return parts[0];
  return null;
}

/**
 * The form's schema: the shape above, then the chosen family's spec checked with the shared GraphSpec
 * (the same limits the server applies) and the run options with the shared RunRequest.
 */
export const NewRunSchema = FormShape.superRefine((v, ctx) => {
  const seen = new Set<string>();
  const add = (field: FormField, message: string) => {
    if (seen.has(field)) return;
    seen.add(field);
    ctx.addIssue({ code: 'custom', path: [field], message });
  };
  if (v.family === 'upload') {
    if (!v.graphId) add('graphId', 'upload a graph file first');
  } else {
    const spec = GraphSpec.safeParse(specOf(v));
    if (!spec.success) {
      for (const issue of spec.error.issues) add(SPEC_KEY_FIELD[String(issue.path[0])] ?? 'family', issue.message);
    } else if (v.family === 'mask' && !v.maskText.includes('#')) {
      add('maskText', 'the mask has no cell: restore at least one');
    }
  }
  // Any valid spec stands in here: only the run options are being checked.
  const options = RunRequest.safeParse({ spec: 'grid:1x1', method: v.method, timeLimitSeconds: v.timeLimitSeconds, visibility: v.visibility });
  if (!options.success) {
    for (const issue of options.error.issues) {
      const key = String(issue.path[0]);
      if (key === 'method' || key === 'timeLimitSeconds' || key === 'visibility') add(key, issue.message);
    }
  }
});
