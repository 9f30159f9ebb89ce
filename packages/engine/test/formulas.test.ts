import { describe, expect, it } from 'vitest';
import {
  completeBipartiteGraph,
  completeGraph,
  completeMultipartiteRankNumber,
  cycleGraph,
  floorLog2,
  formulaFor,
  graphFromEdges,
  grid2RankNumber,
  gridGraph,
  pathGraph,
  randomTree,
  starGraph,
  torusGraph,
} from '../src/index';
import { bruteForceTreeDepth } from './brute-force-td';

describe('closed forms against a brute-force subset search', () => {
  it('paths: ⌊log2 n⌋ + 1 (Bodlaender et al., SIAM J. Discrete Math. 1998)', () => {
    for (let n = 1; n <= 20; n++) expect(formulaFor(pathGraph(n))?.value, `P_${n}`).toBe(bruteForceTreeDepth(pathGraph(n)));
  });

  it('cycles: 2 + ⌊log2(n − 1)⌋ (Bodlaender et al. 1998)', () => {
    for (let n = 3; n <= 20; n++) expect(formulaFor(cycleGraph(n))?.value, `C_${n}`).toBe(bruteForceTreeDepth(cycleGraph(n)));
  });

  it('complete, complete bipartite and star graphs (common practice)', () => {
    for (let n = 1; n <= 9; n++) expect(formulaFor(completeGraph(n))?.value).toBe(bruteForceTreeDepth(completeGraph(n)));
    for (let a = 1; a <= 5; a++) for (let b = 1; b <= 6; b++) expect(formulaFor(completeBipartiteGraph(a, b))?.value).toBe(bruteForceTreeDepth(completeBipartiteGraph(a, b)));
    for (let n = 1; n <= 12; n++) expect(formulaFor(starGraph(n))?.value).toBe(2);
  });

  it('complete multipartite graphs: total − largest part + 1 (common practice)', () => {
    for (const parts of [[1, 1, 1], [2, 3], [2, 2, 2], [1, 3, 4], [3, 1, 2, 2]]) {
      const pairs: number[] = [];
      const part: number[] = parts.flatMap((size, i) => new Array<number>(size).fill(i));
      for (let u = 0; u < part.length; u++) for (let v = u + 1; v < part.length; v++) if (part[u] !== part[v]) pairs.push(u, v);
      expect(completeMultipartiteRankNumber(parts), parts.join(',')).toBe(bruteForceTreeDepth(graphFromEdges(part.length, pairs)));
    }
  });

  it('the 2 x n grid (Alpert, "Rank numbers of grid graphs", Discrete Math. 2010; from memory) for n <= 11', () => {
    for (let n = 1; n <= 11; n++) {
      expect(formulaFor(gridGraph(2, n))?.value, `2x${n}`).toBe(bruteForceTreeDepth(gridGraph(2, n)));
      expect(formulaFor(gridGraph(n, 2))?.value).toBe(grid2RankNumber(n));
    }
  });

  it('says nothing where no closed form is attributed', () => {
    expect(formulaFor(gridGraph(3, 5))).toBeUndefined();
    expect(formulaFor(torusGraph(4, 4))).toBeUndefined();
    expect(formulaFor(randomTree(10, 1))).toBeUndefined();
    expect(formulaFor(graphFromEdges(2, [0, 1]))).toBeUndefined();
  });

  it('carries its source with the value', () => {
    expect(formulaFor(pathGraph(9))).toMatchObject({ value: 4, provenance: 'formula:path', formula: { source: { year: 1998 } } });
  });

  it('floorLog2 is exact at powers of two and beyond 2^32', () => {
    for (let k = 0; k < 53; k++) {
      expect(floorLog2(2 ** k)).toBe(k);
      if (k > 1) expect(floorLog2(2 ** k - 1)).toBe(k - 1);
    }
  });
});
