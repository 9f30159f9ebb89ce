import type { AtlasEntryView } from '@cairn/schema';
import { useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { Link } from 'react-router';
import { entrySize, hasMirror, provenanceWords, valueText } from './entries';
import { SHADE_CLASS, ShadeLegend, shadeOf, SHADE_WORDS } from './knowledge';

interface Slot {
  entry: AtlasEntryView;
  /** The cell shows its transpose's entry (rows > cols of a grid or torus). */
  mirror: boolean;
}

const fromFormula = (e: AtlasEntryView) => [e.lowerProvenance, e.upperProvenance].some((p) => Object.values(p).some((v) => typeof v === 'string' && v.startsWith('formula:')));

/** The run a cell opens: the one holding the certificate (upper) if any, else the lower bound's. */
const runOf = (e: AtlasEntryView) => e.upperRunId ?? e.lowerRunId;

/**
 * The atlas of one family as a rows × cols matrix, each cell shaded by how well its value is known. The
 * matrix is one stop for Tab; arrow keys move inside it (Home/End to a row's ends), and the panel below
 * names the focused or hovered cell with links to the runs proving each side.
 */
export function AtlasMatrix({ family, entries }: { family: string; entries: readonly AtlasEntryView[] }) {
  const mirrored = hasMirror(family);
  const { slots, rows, cols } = useMemo(() => {
    const slots = new Map<string, Slot>();
    let rows = 0;
    let cols = 0;
    for (const entry of entries) {
      const size = entrySize(entry);
      if (!size) continue;
      slots.set(`${size.rows}x${size.cols}`, { entry, mirror: false });
      rows = Math.max(rows, size.rows);
      cols = Math.max(cols, size.cols);
      if (mirrored && size.rows !== size.cols && !slots.has(`${size.cols}x${size.rows}`)) slots.set(`${size.cols}x${size.rows}`, { entry, mirror: true });
    }
    // With mirrors the matrix is square: every stored m × n also shows as n × m.
    if (mirrored) rows = cols = Math.max(rows, cols);
    return { slots, rows, cols };
  }, [entries, mirrored]);

  const [active, setActive] = useState<{ r: number; c: number }>({ r: 1, c: 1 });
  const tableRef = useRef<HTMLTableElement>(null);
  const activeSlot = slots.get(`${active.r}x${active.c}`);

  const moveTo = (r: number, c: number) => {
    const next = { r: Math.min(rows, Math.max(1, r)), c: Math.min(cols, Math.max(1, c)) };
    setActive(next);
    tableRef.current?.querySelector<HTMLElement>(`[data-cell="${next.r}x${next.c}"]`)?.focus();
  };
  const onKeyDown = (e: KeyboardEvent) => {
    const moves: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
    const d = moves[e.key];
    if (d) moveTo(active.r + d[0], active.c + d[1]);
    else if (e.key === 'Home') moveTo(active.r, 1);
    else if (e.key === 'End') moveTo(active.r, cols);
    else return;
    e.preventDefault();
  };

  if (rows === 0) return null;
  const rowNumbers = Array.from({ length: rows }, (_, i) => i + 1);
  const colNumbers = Array.from({ length: cols }, (_, i) => i + 1);

  return (
    <div className="space-y-4">
      {/* The caption is read out with the table; the same words show above the scroll box, where a phone can see them. */}
      <p className="text-sm text-lichen-700" aria-hidden="true">
        Rows 1–{rows} down, columns 1–{cols} across{mirrored ? '; below the diagonal, slanted, each cell mirrors the one above it' : ''}. Arrow keys move between cells.
      </p>
      <div className="overflow-x-auto rounded-md border border-stone-200 bg-white/40 p-1">
        <table ref={tableRef} className="border-separate border-spacing-px" onKeyDown={onKeyDown} data-testid="atlas-matrix">
          <caption className="sr-only">
            {family} rank numbers, rows 1–{rows} down, columns 1–{cols} across{mirrored ? '; the part below the diagonal mirrors the part above' : ''}. Arrow keys
            move between cells.
          </caption>
          <thead>
            <tr>
              <th scope="col" className="sticky left-0 bg-stone-50 text-[10px] font-normal text-lichen-500">
                <span className="sr-only">rows \ columns</span>
              </th>
              {colNumbers.map((c) => (
                <th key={c} scope="col" className="w-8 font-mono text-[10px] font-medium text-lichen-700">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rowNumbers.map((r) => (
              <tr key={r}>
                <th scope="row" className="sticky left-0 bg-stone-50 pr-1 text-right font-mono text-[10px] font-medium text-lichen-700">
                  {r}
                </th>
                {colNumbers.map((c) => {
                  const slot = slots.get(`${r}x${c}`);
                  const isActive = active.r === r && active.c === c;
                  return (
                    <td key={c} className="p-0">
                      <MatrixCell r={r} c={c} slot={slot} family={family} tabbable={isActive} onPick={() => setActive({ r, c })} />
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <ShadeLegend extra={mirrored ? <li className="italic">slanted: mirror of the stored cell</li> : undefined} />
      <CellDetail family={family} r={active.r} c={active.c} slot={activeSlot} />
    </div>
  );
}

function MatrixCell({ r, c, slot, family, tabbable, onPick }: { r: number; c: number; slot: Slot | undefined; family: string; tabbable: boolean; onPick: () => void }) {
  const shade = slot ? shadeOf(slot.entry.lower, slot.entry.upper) : 'unknown';
  const run = slot ? runOf(slot.entry) : null;
  const label = slot
    ? `${family} ${r} × ${c}: ${slot.entry.exact ? `rank number ${valueText(slot.entry)}` : `between ${slot.entry.lower} and ${slot.entry.upper}`}${slot.mirror ? ` (mirror of ${c} × ${r})` : ''}`
    : `${family} ${r} × ${c}: unknown`;
  const className = `relative flex h-8 w-8 items-center justify-center border font-mono leading-none ${SHADE_CLASS[shade]} ${
    slot && !slot.entry.exact ? 'text-[9px]' : 'text-[11px]'
  } ${slot?.mirror ? 'italic opacity-85' : ''} ${tabbable ? 'z-10 outline outline-2 outline-offset-1 outline-ochre-500' : ''} focus:z-10 focus:outline focus:outline-2 focus:outline-offset-1 focus:outline-ochre-500`;
  const common = {
    'data-cell': `${r}x${c}`,
    'data-shade': shade,
    'data-mirror': slot?.mirror || undefined,
    'aria-label': label,
    title: label,
    tabIndex: tabbable ? 0 : -1,
    className,
    onFocus: onPick,
    onMouseEnter: onPick,
  };
  const body = (
    <>
      {slot ? valueText(slot.entry) : ''}
      {slot && fromFormula(slot.entry) && <span className="absolute right-0.5 top-0.5 h-1.5 w-1.5 rounded-full bg-ochre-500" aria-hidden="true" />}
    </>
  );
  if (slot && run) {
    return (
      <Link to={`/runs/${run}`} {...common}>
        {body}
      </Link>
    );
  }
  return <span {...common}>{body}</span>;
}

function CellDetail({ family, r, c, slot }: { family: string; r: number; c: number; slot: Slot | undefined }) {
  return (
    <section aria-live="polite" aria-label="Selected cell" className="rounded-md border border-stone-200 bg-stone-100/60 p-3 text-sm" data-testid="atlas-cell-detail">
      {!slot ? (
        <p className="text-lichen-700">
          <span className="font-mono">
            {family} {r} × {c}
          </span>
          : nothing established yet. A run of this size adds it to the atlas.
        </p>
      ) : (
        <div className="space-y-1.5">
          <p>
            <span className="font-mono font-medium">
              {family} {r} × {c}
            </span>
            {slot.mirror && <span className="text-lichen-700"> (the same graph as {slot.entry.graphKey})</span>}:{' '}
            {slot.entry.exact ? (
              <>
                rank number <strong>{valueText(slot.entry)}</strong>
              </>
            ) : (
              <>
                between <strong>{slot.entry.lower}</strong> and <strong>{slot.entry.upper}</strong>
              </>
            )}{' '}
            <span className="text-lichen-500">({SHADE_WORDS[shadeOf(slot.entry.lower, slot.entry.upper)]})</span>
          </p>
          <p>
            Lower bound: {provenanceWords(slot.entry.lowerProvenance)}{' '}
            {slot.entry.lowerRunId ? (
              <Link className="text-lichen-700 underline underline-offset-2" to={`/runs/${slot.entry.lowerRunId}`}>
                run proving the lower bound
              </Link>
            ) : (
              <span className="text-lichen-500">(no run stored)</span>
            )}
          </p>
          <p>
            Upper bound: {provenanceWords(slot.entry.upperProvenance)}{' '}
            {slot.entry.upperRunId ? (
              <Link className="text-lichen-700 underline underline-offset-2" to={`/runs/${slot.entry.upperRunId}`}>
                run with the certificate
              </Link>
            ) : (
              <span className="text-lichen-500">(no run stored)</span>
            )}
          </p>
        </div>
      )}
    </section>
  );
}
