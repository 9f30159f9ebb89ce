import Graphology from 'graphology';
import florentineFamilies from 'graphology-generators/social/florentine-families';
import karateClub from 'graphology-generators/social/karate-club';
import { describe, expect, it } from 'vitest';
import { exactTreeDepth, graphFromEdges, solve, verifyRanking, type Graph } from '../src/index';
import { bruteForceTreeDepth } from './brute-force-td';

/** A graphology graph as a Cairn graph, vertices numbered in graphology's node order. */
function fromGraphology(g: Graphology): Graph {
  const index = new Map(g.nodes().map((node, i) => [node, i]));
  const pairs: number[] = [];
  g.forEachEdge((_e, _a, source, target) => pairs.push(index.get(source)!, index.get(target)!));
  return graphFromEdges(g.order, pairs);
}

// Two small social networks shipped by graphology-generators (a general-purpose graph library from npm).
describe('social networks from graphology-generators', () => {
  it('the Florentine families: the search, solve and an independent brute force agree, and the ranking verifies', () => {
    const g = fromGraphology(florentineFamilies(Graphology));
    expect([g.vertexCount, g.edgeCount]).toEqual([15, 20]);
    const exact = exactTreeDepth(g);
    expect(exact.status).toBe('exact');
    expect(exact.upper).toBe(bruteForceTreeDepth(g));
    const solved = solve(g);
    expect(solved.rankNumber).toBe(exact.upper);
    expect(verifyRanking(g, solved.labels)).toMatchObject({ valid: true, maxLabel: exact.upper });
  });

  it('Zachary\u2019s karate club: computed, verified, and deterministic', () => {
    const g = fromGraphology(karateClub(Graphology));
    expect([g.vertexCount, g.edgeCount]).toEqual([34, 78]);
    const first = exactTreeDepth(g, { timeLimitMs: 60_000 });
    expect(first.status).toBe('exact');
    expect(verifyRanking(g, first.labels)).toMatchObject({ valid: true, maxLabel: first.upper });
    const second = exactTreeDepth(g, { timeLimitMs: 60_000 });
    expect(Array.from(second.labels)).toEqual(Array.from(first.labels));
  }, 130_000);
});
