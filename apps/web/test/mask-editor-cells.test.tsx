import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { MaskEditor } from '../src/components/mask-editor/MaskEditor';
import { formatMaskText, parseMaskText, resizeMask } from '../src/components/mask-editor/mask-text';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** The editor in a parent that keeps its text, as the form does; `seen` records every text sent back. */
function Harness({ initial, seen }: { initial: string; seen: string[] }) {
  const [text, setText] = useState(initial);
  return (
    <MaskEditor
      value={text}
      onChange={(t) => {
        seen.push(t);
        setText(t);
      }}
    />
  );
}

const cell = (r: number, c: number) => screen.getByRole('button', { name: new RegExp(`^row ${r}, column ${c}: `) });

describe('mask text', () => {
  it('round-trips through parse and format', () => {
    const text = '#.#\n###\n..#\n';
    const read = parseMaskText(text);
    expect(read.ok).toBe(true);
    if (read.ok) {
      expect(read.mask).toEqual({ rows: 3, cols: 3, cells: [true, false, true, true, true, true, false, false, true] });
      expect(formatMaskText(read.mask)).toBe(text);
    }
  });

  it('names the line and column of a fault, as the engine reader does', () => {
    expect(parseMaskText('##\n#x\n')).toMatchObject({ ok: false, line: 2, column: 2 });
    expect(parseMaskText('###\n##\n')).toMatchObject({ ok: false, line: 2, message: 'this row has 2 positions, the first row has 3' });
    expect(parseMaskText('##\n\n##\n')).toMatchObject({ ok: false, line: 2, message: 'a blank line between rows' });
  });

  it('keeps the shape when the box grows, filling the new positions with cells', () => {
    const read = parseMaskText('#.\n');
    if (!read.ok) throw new Error('unreadable');
    expect(formatMaskText(resizeMask(read.mask, 2, 3))).toBe('#.#\n###\n');
  });
});

describe('MaskEditor', () => {
  it('toggles a cell by click: removes it, then restores it', () => {
    const seen: string[] = [];
    render(<Harness initial={'###\n###\n'} seen={seen} />);
    fireEvent.click(cell(1, 2));
    expect(seen.at(-1)).toBe('#.#\n###\n');
    expect(cell(1, 2).getAttribute('aria-pressed')).toBe('false');
    expect(cell(1, 2).getAttribute('aria-label')).toBe('row 1, column 2: hole');
    expect(screen.getByTestId('mask-count').textContent).toBe('5 cells, 1 hole');
    fireEvent.click(cell(1, 2));
    expect(seen.at(-1)).toBe('###\n###\n');
  });

  it('moves with the arrow keys and toggles with Space and Enter', () => {
    const seen: string[] = [];
    render(<Harness initial={'###\n###\n'} seen={seen} />);
    const first = cell(1, 1);
    expect(first.getAttribute('tabindex')).toBe('0'); // one tab stop for the whole grid
    first.focus();
    fireEvent.keyDown(first, { key: 'ArrowDown' });
    expect(document.activeElement).toBe(cell(2, 1));
    fireEvent.keyDown(document.activeElement!, { key: 'ArrowRight' });
    expect(document.activeElement).toBe(cell(2, 2));
    fireEvent.keyDown(document.activeElement!, { key: ' ' });
    expect(seen.at(-1)).toBe('###\n#.#\n');
    fireEvent.keyDown(document.activeElement!, { key: 'Enter' });
    expect(seen.at(-1)).toBe('###\n###\n');
    expect(cell(2, 2).getAttribute('tabindex')).toBe('0');
    expect(cell(1, 1).getAttribute('tabindex')).toBe('-1');
  });

  it('paints holes across cells while the pointer is held, then stops', () => {
    const seen: string[] = [];
    render(<Harness initial={'####\n'} seen={seen} />);
    const group = screen.getByRole('group', { name: /Mask cells: 1 rows by 4 columns/ });
    fireEvent.pointerDown(cell(1, 1), { button: 0, pointerId: 1 });
    // jsdom has no layout: point elementFromPoint at the cell the pointer is over.
    let over: Element = cell(1, 2);
    document.elementFromPoint = () => over;
    fireEvent.pointerMove(group, { pointerId: 1 });
    over = cell(1, 3);
    fireEvent.pointerMove(group, { pointerId: 1 });
    fireEvent.pointerUp(window, { pointerId: 1 });
    over = cell(1, 4);
    fireEvent.pointerMove(group, { pointerId: 1 });
    expect(seen.at(-1)).toBe('...#\n');
  });

  it('reads pasted mask text into the cells and reports bad text with its place', () => {
    const seen: string[] = [];
    render(<Harness initial={'##\n'} seen={seen} />);
    const box = screen.getByLabelText(/Mask text/);
    fireEvent.change(box, { target: { value: '#.#\n#x#\n' } });
    fireEvent.click(screen.getByRole('button', { name: 'Use this text' }));
    expect(screen.getByText('line 2, column 2: found "x", expected # (a cell) or . (a hole)')).toBeTruthy();
    expect(box.getAttribute('aria-invalid')).toBe('true');
    fireEvent.change(box, { target: { value: '\n#.#\n.#.   \n' } });
    fireEvent.click(screen.getByRole('button', { name: 'Use this text' }));
    expect(seen.at(-1)).toBe('#.#\n.#.\n');
    expect(screen.getByRole('group', { name: /2 rows by 3 columns/ })).toBeTruthy();
    expect(cell(2, 2).getAttribute('aria-pressed')).toBe('true');
    expect(cell(2, 1).getAttribute('aria-pressed')).toBe('false');
    // The text box now shows the mask as the editor writes it.
    expect((box as HTMLTextAreaElement).value).toBe('#.#\n.#.\n');
  });

  it('copies the mask text', async () => {
    const writeText = vi.fn(async () => undefined);
    vi.stubGlobal('navigator', { ...navigator, clipboard: { writeText } });
    render(<Harness initial={'#.\n##\n'} seen={[]} />);
    fireEvent.click(screen.getByRole('button', { name: 'Copy mask text' }));
    expect(await screen.findByText('Mask text copied.')).toBeTruthy();
    expect(writeText).toHaveBeenCalledWith('#.\n##\n');
  });

  it('resizes the box from the size fields', () => {
    const seen: string[] = [];
    render(<Harness initial={'#.\n'} seen={seen} />);
    fireEvent.change(screen.getByLabelText('Mask rows'), { target: { value: '2' } });
    expect(seen.at(-1)).toBe('#.\n##\n');
  });
});
