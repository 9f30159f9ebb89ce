import { describe, expect, it } from 'vitest';
import { cycleGraph, EngineError, graphFromEdges, optimalTreeRanking, pathGraph, randomTree, starGraph, treeFromParents, verifyRanking } from '../src/index';
import { distinctTrees } from './all-trees';
import { bruteForceTreeDepth } from './brute-force-td';

describe('optimalTreeRanking (Schäffer, Inform. Process. Lett. 1989)', () => {
  it('equals a brute-force subset search on every tree with up to 10 vertices', () => {
    let checked = 0;
    for (const parent of distinctTrees(10)) {
      const tree = treeFromParents(parent);
      const labels = optimalTreeRanking(tree);
      const verdict = verifyRanking(tree, labels);
      expect(verdict.valid).toBe(true);
      expect(Math.max(...labels), parent.join()).toBe(bruteForceTreeDepth(tree));
      checked++;
    }
    // The numbers of unlabelled trees on 1..10 vertices (OEIS A000055) add up to 201.
    expect(checked).toBe(1 + 1 + 1 + 2 + 3 + 6 + 11 + 23 + 47 + 106);
  });

  it('equals the brute force on random trees of up to 16 vertices', () => {
    for (let seed = 1; seed <= 120; seed++) {
      const tree = randomTree(11 + (seed % 6), seed);
      const labels = optimalTreeRanking(tree);
      expect(verifyRanking(tree, labels).valid).toBe(true);
      expect(Math.max(...labels)).toBe(bruteForceTreeDepth(tree));
    }
  });

  it('gives paths ⌊log2 n⌋ + 1 labels (Bodlaender et al. 1998) and stars 2', () => {
    for (const n of [1, 2, 3, 7, 8, 1000, 65_536]) expect(Math.max(...optimalTreeRanking(pathGraph(n)))).toBe(Math.floor(Math.log2(n)) + 1);
    expect(Math.max(...optimalTreeRanking(starGraph(50)))).toBe(2);
  });

  it('ranks forests and refuses graphs with a cycle', () => {
    const forest = graphFromEdges(5, [0, 1, 3, 4]);
    expect(verifyRanking(forest, optimalTreeRanking(forest)).valid).toBe(true);
    expect(() => optimalTreeRanking(cycleGraph(5))).toThrow(EngineError);
    const cycleAndPoint = graphFromEdges(5, [0, 1, 1, 2, 2, 0]);
    expect(() => optimalTreeRanking(cycleAndPoint)).toThrow(/cycle/);
  });
});
