import { useEffect, useId, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { FieldError } from '../form/Field';
import { inputClass, quietButtonClass } from '../run/bits';
import { EDITOR_MAX_SIDE, cellCount, formatMaskText, fullMask, parseMaskText, resizeMask, type MaskModel } from './mask-text';

export interface MaskEditorProps {
  /** The mask text (`#` cell, `.` hole); the editor sends every change back through onChange. */
  value: string;
  onChange: (text: string) => void;
  /** A problem with the mask from the form or the server, shown under the cells. */
  problem?: string | undefined;
  /** The name the whole editor goes by for screen readers. */
  label?: string;
}

const clampSide = (n: number) => Math.max(1, Math.min(EDITOR_MAX_SIDE, Math.floor(n)));

/**
 * Draws a mask cell by cell: click a cell, or press and drag across cells, to remove or restore them
 * (the first cell touched decides which); arrow keys move between cells and Space or Enter toggles.
 * The mask text can be pasted in, copied and saved as a file.
 */
export function MaskEditor({ value, onChange, problem, label = 'Mask cells' }: MaskEditorProps) {
  const ids = { rows: useId(), cols: useId(), text: useId(), textError: useId(), problem: useId(), hint: useId() };
  const parsed = useMemo(() => parseMaskText(value), [value]);
  const mask: MaskModel = parsed.ok ? parsed.mask : fullMask(4, 6);
  // The newest mask, for pointer moves that arrive faster than the form re-renders the editor.
  const latest = useRef(mask);
  latest.current = mask;
  const paint = useRef<boolean | null>(null);
  const pointerToggled = useRef(false);
  const [focus, setFocus] = useState(0);
  const cellRefs = useRef<(HTMLButtonElement | null)[]>([]);
  const [draft, setDraft] = useState(value);
  const [draftProblem, setDraftProblem] = useState<string | undefined>();
  const [note, setNote] = useState('');
  const tooBig = mask.rows > EDITOR_MAX_SIDE || mask.cols > EDITOR_MAX_SIDE;

  // Edits in the cells show up in the text box; a half-typed draft is replaced only when the cells change.
  useEffect(() => setDraft(value), [value]);

  useEffect(() => {
    const stop = () => (paint.current = null);
    window.addEventListener('pointerup', stop);
    window.addEventListener('pointercancel', stop);
    return () => {
      window.removeEventListener('pointerup', stop);
      window.removeEventListener('pointercancel', stop);
    };
  }, []);

  const commit = (next: MaskModel) => {
    latest.current = next;
    onChange(formatMaskText(next));
  };
  const setCell = (i: number, on: boolean) => {
    const m = latest.current;
    if (m.cells[i] === on) return;
    const cells = m.cells.slice();
    cells[i] = on;
    commit({ ...m, cells });
  };
  const toggle = (i: number) => setCell(i, !latest.current.cells[i]);

  const moveFocus = (i: number) => {
    setFocus(i);
    cellRefs.current[i]?.focus();
  };
  const onKeyDown = (e: KeyboardEvent<HTMLButtonElement>, i: number) => {
    const r = Math.floor(i / mask.cols);
    const c = i % mask.cols;
    let next: number | null = null;
    switch (e.key) {
      case ' ':
      case 'Enter':
        e.preventDefault(); // keeps the browser from also sending a click
        toggle(i);
        return;
      case 'ArrowRight':
        next = c + 1 < mask.cols ? i + 1 : i;
        break;
      case 'ArrowLeft':
        next = c > 0 ? i - 1 : i;
        break;
      case 'ArrowDown':
        next = r + 1 < mask.rows ? i + mask.cols : i;
        break;
      case 'ArrowUp':
        next = r > 0 ? i - mask.cols : i;
        break;
      case 'Home':
        next = r * mask.cols;
        break;
      case 'End':
        next = r * mask.cols + mask.cols - 1;
        break;
      default:
        return;
    }
    e.preventDefault();
    moveFocus(next);
  };

  const onPointerDown = (e: PointerEvent<HTMLButtonElement>, i: number) => {
    if (e.button !== 0) return;
    // Touch captures the pointer on the first cell; release it so moves can be followed across cells.
    if (e.currentTarget.hasPointerCapture?.(e.pointerId)) e.currentTarget.releasePointerCapture(e.pointerId);
    paint.current = !latest.current.cells[i];
    pointerToggled.current = true;
    setFocus(i);
    setCell(i, paint.current);
  };
  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    if (paint.current === null) return;
    const under = document.elementFromPoint?.(e.clientX, e.clientY);
    const cell = under?.closest?.('[data-cell]')?.getAttribute('data-cell');
    if (cell != null) setCell(Number(cell), paint.current);
  };

  const readDraft = () => {
    const read = parseMaskText(draft);
    if (!read.ok) {
      setDraftProblem(`line ${read.line}, column ${read.column}: ${read.message}`);
      return;
    }
    if (read.mask.rows > EDITOR_MAX_SIDE || read.mask.cols > EDITOR_MAX_SIDE) {
      setDraftProblem(`this mask is ${read.mask.rows} x ${read.mask.cols}; the editor takes up to ${EDITOR_MAX_SIDE} x ${EDITOR_MAX_SIDE} (upload larger shapes as a .mask file)`);
      return;
    }
    setDraftProblem(undefined);
    setFocus(0);
    commit(read.mask);
  };

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(value);
      setNote('Mask text copied.');
    } catch {
      setNote('The browser did not allow copying; select the text box and copy it by hand.');
    }
  };
  const save = () => {
    const url = URL.createObjectURL(new Blob([value], { type: 'text/plain' }));
    const a = document.createElement('a');
    a.href = url;
    a.download = `shape-${mask.rows}x${mask.cols}.mask`;
    a.click();
    URL.revokeObjectURL(url);
    setNote('Mask saved as a file.');
  };

  const cells = cellCount(mask);
  const focusAt = Math.min(focus, mask.cells.length - 1);

  return (
    <div className="space-y-3" data-testid="mask-editor">
      <div className="flex flex-wrap items-end gap-3">
        <span className="w-24">
          <label htmlFor={ids.rows} className="block text-xs text-lichen-700">
            Mask rows
          </label>
          <input
            id={ids.rows}
            type="number"
            min={1}
            max={EDITOR_MAX_SIDE}
            className={inputClass}
            value={mask.rows}
            onChange={(e) => Number.isFinite(e.target.valueAsNumber) && commit(resizeMask(mask, clampSide(e.target.valueAsNumber), mask.cols))}
          />
        </span>
        <span className="w-24">
          <label htmlFor={ids.cols} className="block text-xs text-lichen-700">
            Mask columns
          </label>
          <input
            id={ids.cols}
            type="number"
            min={1}
            max={EDITOR_MAX_SIDE}
            className={inputClass}
            value={mask.cols}
            onChange={(e) => Number.isFinite(e.target.valueAsNumber) && commit(resizeMask(mask, mask.rows, clampSide(e.target.valueAsNumber)))}
          />
        </span>
        <button type="button" className={quietButtonClass} onClick={() => commit(fullMask(mask.rows, mask.cols))}>
          Restore every cell
        </button>
        <span className="text-sm text-lichen-700" data-testid="mask-count">
          {cells} cell{cells === 1 ? '' : 's'}, {mask.rows * mask.cols - cells} hole{mask.rows * mask.cols - cells === 1 ? '' : 's'}
        </span>
      </div>

      <p id={ids.hint} className="text-xs text-lichen-700">
        Click a cell, or drag across cells, to remove or restore them. With the keyboard: arrow keys move, Space or Enter toggles.
      </p>
      {tooBig ? (
        <p className="text-sm text-lichen-700">This mask is too large to edit cell by cell; edit its text below.</p>
      ) : (
        <div
          role="group"
          aria-label={`${label}: ${mask.rows} rows by ${mask.cols} columns`}
          aria-describedby={[ids.hint, problem ? ids.problem : ''].join(' ').trim()}
          className="inline-grid max-w-full touch-none select-none gap-px overflow-auto rounded-md bg-stone-200 p-px"
          style={{ gridTemplateColumns: `repeat(${mask.cols}, ${mask.cols <= 24 ? '1.75rem' : mask.cols <= 40 ? '1.25rem' : '0.85rem'})` }}
          onPointerMove={onPointerMove}
        >
          {mask.cells.map((on, i) => (
            <button
              key={i}
              ref={(el) => {
                cellRefs.current[i] = el;
              }}
              type="button"
              data-cell={i}
              aria-pressed={on}
              aria-label={`row ${Math.floor(i / mask.cols) + 1}, column ${(i % mask.cols) + 1}: ${on ? 'cell' : 'hole'}`}
              tabIndex={i === focusAt ? 0 : -1}
              className={`aspect-square focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500 ${on ? 'bg-lichen-500 hover:bg-lichen-700' : 'bg-stone-50 hover:bg-stone-100'}`}
              onPointerDown={(e) => onPointerDown(e, i)}
              onClick={() => {
                if (pointerToggled.current) {
                  pointerToggled.current = false; // this click ends a press that already toggled
                  return;
                }
                setFocus(i);
                toggle(i);
              }}
              onKeyDown={(e) => onKeyDown(e, i)}
              onFocus={() => setFocus(i)}
            />
          ))}
        </div>
      )}
      <FieldError id={ids.problem} message={problem} />

      <div className="space-y-1">
        <label htmlFor={ids.text} className="block text-sm font-medium">
          Mask text <span className="font-normal text-lichen-700">(# a cell, . a hole, one line per row)</span>
        </label>
        <textarea
          id={ids.text}
          className={`${inputClass} h-32 font-mono`}
          value={draft}
          spellCheck={false}
          onChange={(e) => setDraft(e.target.value)}
          aria-invalid={draftProblem ? true : undefined}
          aria-describedby={draftProblem ? ids.textError : undefined}
        />
        <FieldError id={ids.textError} message={draftProblem} />
        <div className="flex flex-wrap gap-2">
          <button type="button" className={quietButtonClass} onClick={readDraft}>
            Use this text
          </button>
          <button type="button" className={quietButtonClass} onClick={() => void copy()}>
            Copy mask text
          </button>
          <button type="button" className={quietButtonClass} onClick={save}>
            Save as .mask file
          </button>
          <span aria-live="polite" className="self-center text-xs text-lichen-700">
            {note}
          </span>
        </div>
      </div>
    </div>
  );
}
