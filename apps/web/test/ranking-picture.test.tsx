import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { gridLayout, maskLayout, staircaseLayout } from '../src/components/ranking/grid-cells';
import { labelColour } from '../src/components/ranking/label-colours';
import { RankingPicture, SVG_CELL_LIMIT } from '../src/components/ranking/RankingPicture';

afterEach(cleanup);

// The 2 x 3 grid, row-major: 0 1 2 / 3 4 5, ranked 1 3 1 / 2 4 2 (a ranking: checked by hand); its
// elimination forest has vertex 4 at the root, then 1; without 4 and 1 the pieces {0, 3} and {2, 5}
// hang from 3 and 5, with 0 under 3 and 2 under 5.
const labels = [1, 3, 1, 2, 4, 2];
const parents = [3, 4, 5, 1, -1, 1];

describe('RankingPicture', () => {
  it('draws one labelled cell per vertex, in the engine order', () => {
    render(<RankingPicture layout={gridLayout(2, 3)} labels={labels} forestParents={parents} title="2 x 3 grid" />);
    const cells = screen.getByTestId('ranking-picture').querySelectorAll('[data-vertex]');
    expect(cells).toHaveLength(6);
    expect(Array.from(cells, (c) => Number(c.getAttribute('data-label')))).toEqual(labels);
    expect(cells[4]!.getAttribute('aria-label')).toBe('row 2, column 2: label 4');
  });

  it('on hover names the label and counts the cells above it in the elimination forest', () => {
    render(<RankingPicture layout={gridLayout(2, 3)} labels={labels} forestParents={parents} title="2 x 3 grid" />);
    const cells = screen.getByTestId('ranking-picture').querySelectorAll('[data-vertex]');
    fireEvent.mouseEnter(cells[0]!);
    // Vertex 0's ancestors: 3, 1, then 4.
    expect(screen.getByTestId('hover-note').textContent).toBe('Vertex 0 has label 1; 3 cells above it separate it.');
    for (const v of [3, 1, 4]) expect(cells[v]!.querySelector('rect')!.getAttribute('stroke')).toBe('#c98a3a');
    // Its own class stays lit; a cell of another class that is not above it is dimmed.
    expect(cells[2]!.querySelector('rect')!.getAttribute('opacity')).toBe('1');
    expect(cells[5]!.querySelector('rect')!.getAttribute('opacity')).toBe('0.25');
  });

  it('keeps the scale monotone from light to dark and shows a legend', () => {
    render(<RankingPicture layout={gridLayout(2, 3)} labels={labels} title="legend" />);
    expect(screen.getByTestId('label-legend').textContent).toContain('1234');
    const lightness = (hex: string) => parseInt(hex.slice(1, 3), 16) + parseInt(hex.slice(3, 5), 16) + parseInt(hex.slice(5, 7), 16);
    const steps = [1, 2, 3, 4, 5, 6].map((l) => lightness(labelColour(l, 6)));
    for (let i = 1; i < steps.length; i++) expect(steps[i]!).toBeLessThan(steps[i - 1]!);
  });

  it('switches to a canvas for pictures too big for SVG', () => {
    const side = Math.ceil(Math.sqrt(SVG_CELL_LIMIT + 1));
    render(<RankingPicture layout={gridLayout(side, side)} labels={new Array(side * side).fill(1)} title="big" />);
    expect(screen.getByTestId('ranking-canvas')).toBeTruthy();
    expect(screen.queryByTestId('ranking-picture')).toBeNull();
  });
});

describe('cell layouts follow the engine numbering', () => {
  it('numbers a mask over its cells row by row, holes skipped', () => {
    const m = maskLayout('#.#\n###\n');
    expect(m.rows).toBe(2);
    expect(m.cols).toBe(3);
    expect(Array.from(m.cellOf)).toEqual([0, 2, 3, 4, 5]);
  });

  it('puts the staircase S(3) in a 3 x 3 box with 6 cells', () => {
    expect(Array.from(staircaseLayout(3).cellOf)).toEqual([0, 1, 2, 3, 4, 6]);
  });
});
