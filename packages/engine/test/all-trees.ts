// Every tree up to isomorphism, for checks against a brute force on all small trees.

/** Every parent array with parent[v] < v: each unlabelled tree on n vertices appears among them. */
export function* recursiveTrees(n: number): Generator<number[]> {
  const parent = new Array<number>(n).fill(-1);
  function* fill(v: number): Generator<number[]> {
    if (v === n) {
      yield parent.slice();
      return;
    }
    for (let p = 0; p < v; p++) {
      parent[v] = p;
      yield* fill(v + 1);
    }
  }
  yield* fill(1);
}

/** A canonical string of the unrooted tree (AHU encoding from its centre or centres), to skip repeats. */
export function canonicalTree(parent: number[]): string {
  const n = parent.length;
  const adj: number[][] = Array.from({ length: n }, () => []);
  parent.forEach((p, v) => p >= 0 && (adj[p]!.push(v), adj[v]!.push(p)));
  const degree = adj.map((a) => a.length);
  let layer = degree.flatMap((d, v) => (d <= 1 ? [v] : []));
  let left = n;
  while (left > 2) {
    left -= layer.length;
    const next: number[] = [];
    for (const v of layer) for (const w of adj[v]!) if (--degree[w]! === 1) next.push(w);
    layer = next;
  }
  const encode = (v: number, from: number): string => `(${adj[v]!.filter((w) => w !== from).map((w) => encode(w, v)).sort().join('')})`;
  return layer.map((c) => encode(c, -1)).sort()[0]!;
}

/** Every tree with 1 .. maxN vertices once up to isomorphism, as parent arrays. */
export function* distinctTrees(maxN: number): Generator<number[]> {
  for (let n = 1; n <= maxN; n++) {
    const seen = new Set<string>();
    for (const parent of recursiveTrees(n)) {
      const key = canonicalTree(parent);
      if (seen.has(key)) continue;
      seen.add(key);
      yield parent;
    }
  }
}
