import { describe, expect, it } from 'vitest';
import { gridGraph, maskGraph, parseMaskText, pathGraph, rankingSvg, rankingTikz, solve, vertexPositions } from '../src/index';

// The pictures of a ranking: cells at their grid positions for grid-like graphs, nodes and edges otherwise.
describe('drawing a ranking', () => {
  it('draws a grid cell by cell, each with its label, in SVG and TikZ', () => {
    const g = gridGraph(2, 3);
    const { labels } = solve(g);
    const svg = rankingSvg(g, labels);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.match(/<rect /g)).toHaveLength(6);
    expect(svg).not.toContain('<line ');
    expect([...svg.matchAll(/>(\d+)<\/text>/g)].map((m) => Number(m[1]))).toEqual(labels);
    const tikz = rankingTikz(g, labels);
    expect([...tikz.matchAll(/\\node\[rectangle\] at \((\d)\.00,(\d)\.00\) \{(\d+)\};/g)].map((m) => [Number(m[1]), Number(m[2]), Number(m[3])])).toEqual(
      labels.map((l, v) => [v % 3, Math.floor(v / 3), l]),
    );
  });

  it('puts a mask\'s cells where they are, holes left out', () => {
    const g = maskGraph(parseMaskText('#.#\n###\n'));
    expect(vertexPositions(g)).toEqual([
      { x: 0, y: 0 },
      { x: 2, y: 0 },
      { x: 0, y: 1 },
      { x: 1, y: 1 },
      { x: 2, y: 1 },
    ]);
    expect(rankingSvg(g, solve(g).labels).match(/<rect /g)).toHaveLength(5);
  });

  it('draws other graphs as nodes on a circle joined by their edges', () => {
    const g = pathGraph(5);
    const svg = rankingSvg(g, solve(g).labels);
    expect(svg.match(/<circle /g)).toHaveLength(5);
    expect(svg.match(/<line /g)).toHaveLength(4);
    expect(rankingTikz(g, solve(g).labels).match(/\\draw /g)).toHaveLength(4);
  });

  it('draws a large grid without running out of stack for its labels', () => {
    const g = gridGraph(300, 300);
    const labels = new Int32Array(g.vertexCount).fill(1);
    expect(rankingSvg(g, labels).match(/<rect /g)).toHaveLength(90_000);
  });
});
