import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import ForestTree, { FOREST_DRAW_LIMIT, forestDepth } from '../src/components/forest/ForestTree';

afterEach(cleanup);

// The 2 x 3 grid ranked 1 3 1 / 2 4 2: vertex 4 is the root, 1 below it, 3 and 5 below 1, 0 under 3, 2 under 5.
const parents = [3, 4, 5, 1, -1, 1];
const labels = [1, 3, 1, 2, 4, 2];

describe('ForestTree', () => {
  it('draws one node per vertex and one line per parent link', () => {
    render(<ForestTree forestParents={parents} labels={labels} />);
    const svg = screen.getByTestId('forest-tree');
    const nodes = svg.querySelectorAll('[data-vertex]');
    expect(nodes).toHaveLength(6);
    expect(Array.from(nodes, (n) => Number(n.getAttribute('data-vertex'))).sort()).toEqual([0, 1, 2, 3, 4, 5]);
    expect(svg.querySelectorAll('path')).toHaveLength(5); // the hidden common root draws no line
    expect(svg.getAttribute('aria-label')).toBe('Elimination forest: 6 vertices in 1 tree, 4 levels deep');
  });

  it('puts each vertex below its parent', () => {
    render(<ForestTree forestParents={parents} labels={labels} />);
    const yOf = (v: number) => Number(/translate\(\S+ (\S+)\)/.exec(screen.getByTestId('forest-tree').querySelector(`[data-vertex="${v}"]`)!.getAttribute('transform')!)![1]);
    parents.forEach((p, v) => {
      if (p >= 0) expect(yOf(v)).toBeGreaterThan(yOf(p));
    });
  });

  it('draws a forest of several trees, each root a top node', () => {
    // Two paths of three: 0-1-2 with 1 on top, 3-4-5 with 4 on top.
    render(<ForestTree forestParents={[1, -1, 1, 4, -1, 4]} />);
    expect(screen.getByTestId('forest-tree').querySelectorAll('[data-vertex]')).toHaveLength(6);
    expect(screen.getByTestId('forest-tree').getAttribute('aria-label')).toContain('in 2 trees, 2 levels deep');
  });

  it('lights the separators above a hovered vertex', () => {
    render(<ForestTree forestParents={parents} labels={labels} />);
    fireEvent.mouseEnter(screen.getByTestId('forest-tree').querySelector('[data-vertex="0"]')!);
    expect(screen.getByText('Vertex 0: 3 vertices above it.', { exact: false })).toBeTruthy();
  });

  it('summarises a forest too big to draw', () => {
    const chain = Array.from({ length: FOREST_DRAW_LIMIT + 1 }, (_, v) => v - 1);
    render(<ForestTree forestParents={chain} />);
    expect(screen.queryByTestId('forest-tree')).toBeNull();
    expect(screen.getByText(/Too many vertices to draw/)).toBeTruthy();
  });

  it('measures depth as the longest root-to-leaf chain', () => {
    expect(forestDepth(parents)).toBe(4);
    expect(forestDepth([-1, -1, -1])).toBe(1);
    expect(forestDepth([])).toBe(0);
  });
});
