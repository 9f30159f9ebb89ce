import { GraphSpec } from '@cairn/schema';

/** Families that have a text form (`grid:4x9`); masks and uploads are sent as objects. */
export type TextFamily = Exclude<GraphSpec['family'], 'mask' | 'tree' | 'upload'>;

/** The text form of a spec, as the engine and the API read it; parse(formatSpec(s)) gives s back. */
export function formatSpec(spec: GraphSpec): string {
  switch (spec.family) {
    case 'grid':
    case 'cylinder':
    case 'torus':
      return `${spec.family}:${spec.rows}x${spec.cols}`;
    case 'staircase':
      return `staircase:${spec.t}`;
    case 'path':
    case 'cycle':
    case 'complete':
      return `${spec.family}:${spec.n}`;
    case 'bipartite':
      return `bipartite:${spec.a}x${spec.b}`;
    case 'star':
      return `star:${spec.leaves}`;
    case 'random-tree':
      return `random-tree:${spec.n}:${spec.seed}`;
    case 'gnp':
      return `gnp:${spec.n}:${spec.p}:${spec.seed}`;
    case 'mask': {
      const lines = spec.text.split('\n').filter((l) => l.trim() !== '');
      return `mask:${lines.length}x${Math.max(0, ...lines.map((l) => l.trim().length))}`;
    }
    case 'tree':
      return `tree:${spec.parents.length} vertices`;
    case 'upload':
      return `upload:${spec.graphId}`;
  }
}

export type QuickParse = { ok: true; spec: string; graph: GraphSpec } | { ok: false; message: string };

const ALIASES: Record<string, TextFamily> = {
  grid: 'grid',
  rect: 'grid',
  rectangle: 'grid',
  cylinder: 'cylinder',
  cyl: 'cylinder',
  torus: 'torus',
  staircase: 'staircase',
  stair: 'staircase',
  s: 'staircase',
  path: 'path',
  p: 'path',
  cycle: 'cycle',
  c: 'cycle',
  complete: 'complete',
  clique: 'complete',
  k: 'complete',
  bipartite: 'bipartite',
  star: 'star',
  'random-tree': 'random-tree',
  tree: 'random-tree',
  gnp: 'gnp',
};

const PAIRS = new Set<TextFamily>(['grid', 'cylinder', 'torus', 'bipartite']);

/** Turns schema issues into one sentence, the first problem first. */
const firstProblem = (error: { issues: { message: string }[] }) => error.issues[0]?.message ?? 'not a graph Cairn knows';

const whole = (raw: string | undefined) => (raw !== undefined && /^\d+$/.test(raw) ? Number(raw) : Number.NaN);

/**
 * Reads what people type in the quick box: `4x9` (a grid), `grid 4x9`, `grid:4x9`, `staircase 7`,
 * `path:100`, `K5`, `K3,4`, `gnp 60 0.1`. Sizes are checked against the shared GraphSpec limits, so a
 * spec that reads here is one the server accepts.
 */
export function parseQuickInput(input: string): QuickParse {
  const text = input.trim().toLowerCase().replace(/×/g, 'x');
  if (text === '') return { ok: false, message: 'type a graph, such as 4x9 or staircase 7' };
  // A bare pair of sizes is a grid: the commonest question.
  const bare = /^(\d+)\s*x\s*(\d+)$/.exec(text);
  if (bare) return checked({ family: 'grid', rows: whole(bare[1]), cols: whole(bare[2]) });
  // K3,4 is the complete bipartite graph; K5, P10, C9, S7 the one-letter names of the families.
  const kab = /^k\s*(\d+)\s*,\s*(\d+)$/.exec(text);
  if (kab) return checked({ family: 'bipartite', a: whole(kab[1]), b: whole(kab[2]) });
  const m = /^([a-z][a-z-]*)\s*[:\s(]?\s*(.*?)\s*\)?$/.exec(text);
  if (!m) return { ok: false, message: `cannot read "${input.trim()}"; try 4x9, grid 4x9, staircase 7 or path:100` };
  const family = ALIASES[m[1]!];
  if (!family) return { ok: false, message: `"${m[1]}" is not a family Cairn knows; try grid, cylinder, torus, staircase, path, cycle, complete, bipartite, star` };
  const parts = m[2]!.split(/\s*[x:,\s]\s*/).filter((p) => p !== '');
  if (PAIRS.has(family)) {
    if (parts.length !== 2) return { ok: false, message: `${family} takes two sizes, such as ${family} 4x9` };
    const [x, y] = [whole(parts[0]), whole(parts[1])];
    if (family === 'bipartite') return checked({ family, a: x, b: y });
    return checked({ family: family as 'grid' | 'cylinder' | 'torus', rows: x, cols: y });
  }
  if (family === 'gnp') {
    if (parts.length < 2 || parts.length > 3) return { ok: false, message: 'gnp takes n, p and an optional seed, such as gnp 60 0.1' };
    return checked({ family, n: whole(parts[0]), p: parts[1]!.trim() === '' ? Number.NaN : Number(parts[1]), seed: parts[2] === undefined ? 1 : whole(parts[2]) });
  }
  if (family === 'random-tree') {
    if (parts.length < 1 || parts.length > 2) return { ok: false, message: 'random-tree takes n and an optional seed, such as random-tree 100 7' };
    return checked({ family, n: whole(parts[0]), seed: parts[1] === undefined ? 1 : whole(parts[1]) });
  }
  if (parts.length !== 1) return { ok: false, message: `${family} takes one size, such as ${family} 7` };
  const n = whole(parts[0]);
  if (family === 'staircase') return checked({ family, t: n });
  if (family === 'star') return checked({ family, leaves: n });
  return checked({ family, n });
}

function checked(candidate: Record<string, unknown>): QuickParse {
  const parsed = GraphSpec.safeParse(candidate);
  if (!parsed.success) return { ok: false, message: firstProblem(parsed.error) };
  return { ok: true, spec: formatSpec(parsed.data), graph: parsed.data };
}
