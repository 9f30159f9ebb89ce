/**
 * How well a value is known, as one shade scale from Cairn's palette: the tighter the interval, the darker
 * the cell. Exact is slate ink; a gap of 1, 2, 3+ fades through lichen to stone; unknown is bare stone with
 * a dashed edge. Classes are written out whole so Tailwind finds them.
 */
export type Shade = 'exact' | 'gap1' | 'gap2' | 'gap3' | 'unknown';

export const SHADE_CLASS: Record<Shade, string> = {
  exact: 'bg-slate-ink text-stone-50 border-slate-ink',
  gap1: 'bg-lichen-700 text-stone-50 border-lichen-700',
  gap2: 'bg-lichen-300 text-slate-ink border-lichen-300',
  gap3: 'bg-stone-200 text-slate-ink border-stone-200',
  unknown: 'bg-stone-50 text-lichen-500 border-dashed border-lichen-300',
};

export const SHADE_WORDS: Record<Shade, string> = {
  exact: 'exact',
  gap1: 'bounded, gap 1',
  gap2: 'bounded, gap 2',
  gap3: 'bounded, gap 3 or more',
  unknown: 'unknown',
};

export const SHADES: readonly Shade[] = ['exact', 'gap1', 'gap2', 'gap3', 'unknown'];

export function shadeOf(lower: number | null | undefined, upper: number | null | undefined): Shade {
  if (lower === null || lower === undefined || upper === null || upper === undefined) return 'unknown';
  const gap = upper - lower;
  return gap <= 0 ? 'exact' : gap === 1 ? 'gap1' : gap === 2 ? 'gap2' : 'gap3';
}

/** The legend of the scale, shared by the atlas matrix and the sweep table. */
export function ShadeLegend({ extra }: { extra?: React.ReactNode }) {
  return (
    <ul className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm text-lichen-700" aria-label="Legend: how well each value is known" data-testid="shade-legend">
      {SHADES.map((s) => (
        <li key={s} className="inline-flex items-center gap-1.5">
          <span className={`inline-block h-4 w-5 rounded-sm border ${SHADE_CLASS[s]}`} aria-hidden="true" />
          {SHADE_WORDS[s]}
        </li>
      ))}
      <li className="inline-flex items-center gap-1.5">
        <span className="inline-block h-2 w-2 rounded-full bg-ochre-500" aria-hidden="true" />
        closed form
      </li>
      {extra}
    </ul>
  );
}
