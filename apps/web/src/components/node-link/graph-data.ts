/**
 * What the browser can know of a graph's edges without the engine: the classic families by their
 * definition (in the engine's vertex numbering), inline trees by their parent array, and uploaded files
 * by reading them again. Random families cannot be rebuilt here (their generator lives in the engine).
 */

/** How to place the vertices: by the family's shape, or by a general layout. */
export type Placement = 'line' | 'circle' | 'two-sides' | 'hub' | 'general';

export interface DrawableGraph {
  vertexCount: number;
  /** Edges as pairs: u0, v0, u1, v1, ... (0-based, the engine's numbering). */
  edges: Uint32Array;
  placement: Placement;
  /** For two-sides: how many vertices are on the first side. */
  sideA?: number;
}

/** The most vertices and edges drawn as nodes and lines; beyond this the picture says it is too big. */
export const NODE_LINK_MAX_VERTICES = 3000;
export const NODE_LINK_MAX_EDGES = 30_000;

export type GraphData = { ok: true; graph: DrawableGraph } | { ok: false; reason: string };

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isInteger(v) && v >= 0 ? v : null);

function tooBig(vertices: number, edges: number): string | null {
  if (vertices > NODE_LINK_MAX_VERTICES) return `it has ${vertices.toLocaleString('en')} vertices; the browser draws up to ${NODE_LINK_MAX_VERTICES.toLocaleString('en')} as nodes and lines`;
  if (edges > NODE_LINK_MAX_EDGES) return `it has ${edges.toLocaleString('en')} edges; the browser draws up to ${NODE_LINK_MAX_EDGES.toLocaleString('en')}`;
  return null;
}

/**
 * The graph of a family, from the solve result's family (kind ...) or the run's spec (family ...):
 * path, cycle, complete, complete bipartite, star, and trees given by their parents.
 */
export function familyGraph(family: Record<string, unknown> | null | undefined, spec: Record<string, unknown> | null | undefined): GraphData | null {
  const kind = (family?.kind as string | undefined) ?? specKind(spec?.family);
  const get = (k: string) => num(family?.[k]) ?? num(spec?.[k]);
  switch (kind) {
    case 'path': {
      const n = get('n');
      if (n === null) return null;
      return checked(n, Math.max(0, n - 1), () => {
        const e = new Uint32Array(2 * Math.max(0, n - 1));
        for (let i = 0; i + 1 < n; i++) e.set([i, i + 1], 2 * i);
        return { vertexCount: n, edges: e, placement: 'line' };
      });
    }
    case 'cycle': {
      const n = get('n');
      if (n === null) return null;
      return checked(n, n, () => {
        const e = new Uint32Array(2 * n);
        for (let i = 0; i < n; i++) e.set([i, (i + 1) % n], 2 * i);
        return { vertexCount: n, edges: e, placement: 'circle' };
      });
    }
    case 'complete': {
      const n = get('n');
      if (n === null) return null;
      return checked(n, (n * (n - 1)) / 2, () => {
        const e = new Uint32Array(n * (n - 1));
        let k = 0;
        for (let u = 0; u < n; u++) for (let v = u + 1; v < n; v++) (e[k++] = u), (e[k++] = v);
        return { vertexCount: n, edges: e, placement: 'circle' };
      });
    }
    case 'completeBipartite': {
      const a = get('a');
      const b = get('b');
      if (a === null || b === null) return null;
      return checked(a + b, a * b, () => {
        const e = new Uint32Array(2 * a * b);
        let k = 0;
        for (let u = 0; u < a; u++) for (let v = 0; v < b; v++) (e[k++] = u), (e[k++] = a + v);
        return { vertexCount: a + b, edges: e, placement: 'two-sides', sideA: a };
      });
    }
    case 'star': {
      const leaves = get('leaves');
      if (leaves === null) return null;
      return checked(leaves + 1, leaves, () => {
        const e = new Uint32Array(2 * leaves);
        for (let i = 0; i < leaves; i++) e.set([0, i + 1], 2 * i);
        return { vertexCount: leaves + 1, edges: e, placement: 'hub' };
      });
    }
    case 'tree': {
      const parents = spec?.parents;
      if (!Array.isArray(parents)) return null;
      const n = parents.length;
      return checked(n, n - 1, () => {
        const pairs: number[] = [];
        parents.forEach((p, v) => typeof p === 'number' && p >= 0 && p < n && pairs.push(p, v));
        return { vertexCount: n, edges: Uint32Array.from(pairs), placement: 'general' };
      });
    }
    default:
      return null;
  }
}

/** The solve result's family kinds under the spec's family names. */
function specKind(family: unknown): string | undefined {
  if (family === 'bipartite') return 'completeBipartite';
  if (family === 'random-tree') return 'randomTree';
  if (family === 'gnp') return 'randomGraph';
  return typeof family === 'string' ? family : undefined;
}

function checked(vertices: number, edges: number, build: () => DrawableGraph): GraphData {
  const big = tooBig(vertices, edges);
  return big ? { ok: false, reason: big } : { ok: true, graph: build() };
}

/** Edges as a reader finds them, before loops and repeats are dropped. */
interface RawEdges {
  vertexCount: number;
  pairs: number[];
}

/**
 * Reads an uploaded file again for drawing, following the engine's readers in outline (edge list with its
 * header and numbering rules, DIMACS, Matrix Market, Cairn JSON). Loops and repeated edges are dropped,
 * as the engine drops them. The caller compares the counts with the stored graph before trusting it.
 */
export function parseGraphFile(text: string, format: string): GraphData {
  let raw: RawEdges | string;
  try {
    if (format === 'json') raw = readJson(text);
    else if (format === 'dimacs') raw = readDimacs(text);
    else if (format === 'matrix-market') raw = readMatrixMarket(text);
    else if (format === 'edge-list') raw = readEdgeList(text);
    else return { ok: false, reason: `files in the ${format} format are not redrawn in the browser` };
  } catch {
    raw = 'the file could not be read again in the browser';
  }
  if (typeof raw === 'string') return { ok: false, reason: raw };
  const big = tooBig(raw.vertexCount, raw.pairs.length / 2);
  if (big) return { ok: false, reason: big };
  return { ok: true, graph: { vertexCount: raw.vertexCount, edges: simpleEdges(raw), placement: 'general' } };
}

function simpleEdges({ vertexCount, pairs }: RawEdges): Uint32Array {
  const seen = new Set<number>();
  const out: number[] = [];
  for (let i = 0; i + 1 < pairs.length; i += 2) {
    const u = Math.min(pairs[i]!, pairs[i + 1]!);
    const v = Math.max(pairs[i]!, pairs[i + 1]!);
    if (u === v || v >= vertexCount) continue;
    const key = u * vertexCount + v;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(u, v);
  }
  return Uint32Array.from(out);
}

const fields = (line: string) => line.trim().split(/[\s,]+/).filter((f) => f !== '');
const ids = (fs: string[]) => fs.map((f) => (/^\d+$/.test(f) ? Number(f) : Number.NaN));

function readJson(text: string): RawEdges | string {
  const doc = JSON.parse(text) as { vertexCount?: unknown; edges?: unknown };
  const n = num(doc.vertexCount);
  if (n === null || !Array.isArray(doc.edges)) return 'the JSON file has no vertexCount and edges';
  const pairs: number[] = [];
  for (const e of doc.edges) if (Array.isArray(e) && e.length === 2) pairs.push(Number(e[0]), Number(e[1]));
  return { vertexCount: n, pairs };
}

function readDimacs(text: string): RawEdges | string {
  let n: number | null = null;
  let pace = false;
  const pairs: number[] = [];
  for (const line of text.split(/\r?\n/)) {
    const fs = fields(line);
    if (fs.length === 0 || fs[0] === 'c' || fs[0] === 'n') continue;
    if (fs[0] === 'p') {
      n = Number(fs[2]);
      pace = fs[1] === 'tw';
      continue;
    }
    const [u, v] = ids(fs[0] === 'e' ? fs.slice(1, 3) : pace ? fs.slice(0, 2) : []);
    if (u === undefined || v === undefined || !Number.isFinite(u) || !Number.isFinite(v)) continue;
    pairs.push(u - 1, v - 1);
  }
  return n === null || !Number.isInteger(n) ? 'the DIMACS file has no problem line' : { vertexCount: n, pairs };
}

function readMatrixMarket(text: string): RawEdges | string {
  let n: number | null = null;
  const pairs: number[] = [];
  for (const line of text.split(/\r?\n/)) {
    if (line.startsWith('%') || line.trim() === '') continue;
    const fs = ids(fields(line).slice(0, 2));
    if (n === null) {
      n = fs[0]!;
      continue;
    }
    const [i, j] = fs;
    if (Number.isFinite(i) && Number.isFinite(j)) pairs.push(i! - 1, j! - 1);
  }
  return n === null || !Number.isInteger(n) ? 'the Matrix Market file has no size line' : { vertexCount: n, pairs };
}

function readEdgeList(text: string): RawEdges | string {
  const lines: number[][] = [];
  for (const line of text.split(/\r?\n/)) {
    const body = line.replace(/[#%].*$/, '');
    const fs = fields(body);
    if (fs.length === 0) continue;
    lines.push(ids(fs));
  }
  if (lines.length === 0) return 'the edge list is empty';
  // The header rules of the engine's reader (header 'auto'): `n` alone, or `n m` when exactly m edge lines
  // follow and every id fits in n vertices.
  let headerN: number | null = null;
  let edgeLines = lines;
  const first = lines[0]!;
  if (first.length === 1) {
    headerN = first[0]!;
    edgeLines = lines.slice(1);
  } else if (first.length === 2) {
    const [a, b] = first as [number, number];
    const rest = lines.slice(1);
    if (rest.length === b && rest.every((l) => l.slice(0, 2).every((x) => x <= a))) {
      headerN = a;
      edgeLines = rest;
    }
  }
  let min = Infinity;
  let max = -1;
  const pairs: number[] = [];
  for (const l of edgeLines) {
    const [u, v] = l;
    if (u === undefined || v === undefined || !Number.isFinite(u) || !Number.isFinite(v)) return 'the edge list has a line that is not an edge';
    pairs.push(u, v);
    min = Math.min(min, u, v);
    max = Math.max(max, u, v);
  }
  // 'auto' numbering: 1-based exactly when the smallest id is 1.
  const base = min === 1 ? 1 : 0;
  if (base === 1) for (let i = 0; i < pairs.length; i++) pairs[i]! -= 1;
  const vertexCount = headerN ?? (base === 1 ? max : max + 1);
  return { vertexCount, pairs };
}

/** Vertex positions in a unit box [0, 1] x [0, 1]: xs[v], ys[v]. Deterministic: the same graph, the same picture. */
export interface Positions {
  xs: Float64Array;
  ys: Float64Array;
}

/** Up to this many vertices a force layout runs (O(n²) a step); beyond, the vertices go round a circle. */
export const FORCE_LAYOUT_LIMIT = 400;

export function placeVertices(g: DrawableGraph): Positions {
  const n = g.vertexCount;
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  const ring = (order: ArrayLike<number>, cx = 0.5, cy = 0.5, r = 0.45, offset = 0) => {
    const k = order.length;
    for (let i = 0; i < k; i++) {
      const angle = offset + (2 * Math.PI * i) / Math.max(1, k) - Math.PI / 2;
      xs[order[i]!] = cx + r * Math.cos(angle);
      ys[order[i]!] = cy + r * Math.sin(angle);
    }
  };
  switch (g.placement) {
    case 'line': {
      // A snake, so a long path stays readable: row by row, every other row backwards, rows as far
      // apart as the vertices in a row (the drawing crops the box to what is used).
      const perRow = Math.max(1, Math.min(n, Math.ceil(Math.sqrt(n * 4))));
      const step = perRow === 1 ? 0 : 1 / (perRow - 1);
      for (let v = 0; v < n; v++) {
        const r = Math.floor(v / perRow);
        const c = r % 2 === 0 ? v % perRow : perRow - 1 - (v % perRow);
        xs[v] = perRow === 1 ? 0.5 : c * step;
        ys[v] = Math.min(1, r * Math.max(step, 0.08) * 1.5);
      }
      return { xs, ys };
    }
    case 'circle':
      ring(Array.from({ length: n }, (_, i) => i));
      return { xs, ys };
    case 'hub':
      xs[0] = 0.5;
      ys[0] = 0.5;
      ring(Array.from({ length: n - 1 }, (_, i) => i + 1));
      return { xs, ys };
    case 'two-sides': {
      const a = g.sideA ?? 0;
      const b = n - a;
      for (let i = 0; i < a; i++) (xs[i] = 0.15), (ys[i] = a === 1 ? 0.5 : i / (a - 1));
      for (let i = 0; i < b; i++) (xs[a + i] = 0.85), (ys[a + i] = b === 1 ? 0.5 : i / (b - 1));
      return { xs, ys };
    }
    case 'general':
      return n <= FORCE_LAYOUT_LIMIT ? forceLayout(g) : circleByTraversal(g);
  }
}

function adjacency(g: DrawableGraph): number[][] {
  const adj: number[][] = Array.from({ length: g.vertexCount }, () => []);
  for (let i = 0; i + 1 < g.edges.length; i += 2) {
    adj[g.edges[i]!]!.push(g.edges[i + 1]!);
    adj[g.edges[i + 1]!]!.push(g.edges[i]!);
  }
  return adj;
}

/** Breadth-first order over every component: neighbours land near each other round the circle. */
function traversalOrder(g: DrawableGraph): number[] {
  const adj = adjacency(g);
  const seen = new Uint8Array(g.vertexCount);
  const order: number[] = [];
  for (let s = 0; s < g.vertexCount; s++) {
    if (seen[s]) continue;
    seen[s] = 1;
    const queue = [s];
    for (let h = 0; h < queue.length; h++) {
      const u = queue[h]!;
      order.push(u);
      for (const w of adj[u]!) if (!seen[w]) (seen[w] = 1), queue.push(w);
    }
  }
  return order;
}

function circleByTraversal(g: DrawableGraph): Positions {
  const xs = new Float64Array(g.vertexCount);
  const ys = new Float64Array(g.vertexCount);
  traversalOrder(g).forEach((v, i, all) => {
    const angle = (2 * Math.PI * i) / all.length - Math.PI / 2;
    xs[v] = 0.5 + 0.45 * Math.cos(angle);
    ys[v] = 0.5 + 0.45 * Math.sin(angle);
  });
  return { xs, ys };
}

/**
 * Fruchterman and Reingold's spring embedder ("Graph drawing by force-directed placement", Software:
 * Practice and Experience, 1991): neighbours pull, every pair pushes, the step shrinks each round. It
 * starts from the traversal circle, not from random points, so the picture is the same on every visit.
 */
function forceLayout(g: DrawableGraph): Positions {
  const n = g.vertexCount;
  const { xs, ys } = circleByTraversal(g);
  if (n <= 2) return { xs, ys };
  const k = Math.sqrt(1 / n);
  const dx = new Float64Array(n);
  const dy = new Float64Array(n);
  const rounds = 250;
  for (let round = 0; round < rounds; round++) {
    dx.fill(0);
    dy.fill(0);
    for (let u = 0; u < n; u++) {
      for (let v = u + 1; v < n; v++) {
        let ex = xs[u]! - xs[v]!;
        let ey = ys[u]! - ys[v]!;
        let d2 = ex * ex + ey * ey;
        if (d2 < 1e-12) (ex = 1e-3 * (((u * 7 + v) % 5) - 2)), (ey = 1e-3), (d2 = ex * ex + ey * ey);
        const f = (k * k) / d2;
        dx[u]! += ex * f;
        dy[u]! += ey * f;
        dx[v]! -= ex * f;
        dy[v]! -= ey * f;
      }
    }
    for (let i = 0; i + 1 < g.edges.length; i += 2) {
      const u = g.edges[i]!;
      const v = g.edges[i + 1]!;
      const ex = xs[u]! - xs[v]!;
      const ey = ys[u]! - ys[v]!;
      const d = Math.sqrt(ex * ex + ey * ey) || 1e-6;
      const f = d / k;
      dx[u]! -= ex * f;
      dy[u]! -= ey * f;
      dx[v]! += ex * f;
      dy[v]! += ey * f;
    }
    const step = 0.1 * (1 - round / rounds) + 0.002;
    for (let v = 0; v < n; v++) {
      const len = Math.sqrt(dx[v]! * dx[v]! + dy[v]! * dy[v]!) || 1;
      const move = Math.min(len, step);
      xs[v]! += (dx[v]! / len) * move;
      ys[v]! += (dy[v]! / len) * move;
    }
  }
  // Fit the picture to the unit box.
  let [minX, maxX, minY, maxY] = [Infinity, -Infinity, Infinity, -Infinity];
  for (let v = 0; v < n; v++) (minX = Math.min(minX, xs[v]!)), (maxX = Math.max(maxX, xs[v]!)), (minY = Math.min(minY, ys[v]!)), (maxY = Math.max(maxY, ys[v]!));
  const span = Math.max(maxX - minX, maxY - minY) || 1;
  for (let v = 0; v < n; v++) (xs[v] = (xs[v]! - minX) / span), (ys[v] = (ys[v]! - minY) / span);
  return { xs, ys };
}
