import { useEffect, useMemo, useRef, useState } from 'react';
import type { CellLayout } from './grid-cells';
import { labelColour, labelInk } from './label-colours';
import { LabelLegend } from './LabelLegend';

export interface RankingPictureProps {
  layout: CellLayout;
  /** labels[v] for each vertex v (1-based labels). */
  labels: readonly number[];
  /** parent[v] in the elimination forest (-1 for a root); enables "what separates this cell" on hover. */
  forestParents?: readonly number[] | undefined;
  /** Vertices to mark (a violation path, for instance), drawn with an ochre ring. */
  marked?: ReadonlySet<number> | undefined;
  title: string;
}

/** Beyond this many cells an SVG gets slow to draw and to hover; a canvas takes over. */
export const SVG_CELL_LIMIT = 4096;

function ancestorsOf(v: number, parents: readonly number[] | undefined): Set<number> {
  const out = new Set<number>();
  if (!parents) return out;
  for (let p = parents[v] ?? -1, guard = 0; p >= 0 && guard < parents.length; p = parents[p] ?? -1, guard++) out.add(p);
  return out;
}

/**
 * A grid-like graph drawn as labelled cells on Cairn's sequential scale. Hovering (or focusing) a cell
 * lights its label class and the cells above it in the elimination forest: the separators that cut it off.
 */
export function RankingPicture({ layout, labels, forestParents, marked, title }: RankingPictureProps) {
  const labelCount = useMemo(() => labels.reduce((m, l) => Math.max(m, l), 0), [labels]);
  const [hovered, setHovered] = useState<number | null>(null);
  const above = useMemo(() => (hovered === null ? new Set<number>() : ancestorsOf(hovered, forestParents)), [hovered, forestParents]);
  const vertexAt = useMemo(() => {
    const at = new Int32Array(layout.rows * layout.cols).fill(-1);
    layout.cellOf.forEach((cell, v) => (at[cell] = v));
    return at;
  }, [layout]);
  const hoveredLabel = hovered === null ? null : labels[hovered]!;
  const useCanvas = layout.cellOf.length > SVG_CELL_LIMIT;

  return (
    <figure className="space-y-3" aria-label={title}>
      {useCanvas ? (
        <CanvasCells layout={layout} labels={labels} labelCount={labelCount} vertexAt={vertexAt} onHover={setHovered} hoveredLabel={hoveredLabel} above={above} marked={marked} />
      ) : (
        <SvgCells
          layout={layout}
          labels={labels}
          labelCount={labelCount}
          onHover={setHovered}
          hovered={hovered}
          hoveredLabel={hoveredLabel}
          above={above}
          marked={marked}
          title={title}
        />
      )}
      <figcaption className="flex flex-wrap items-center gap-4 text-sm text-lichen-700">
        <LabelLegend labelCount={labelCount} />
        <span aria-live="polite" data-testid="hover-note">
          {hovered === null
            ? 'Hover or focus a cell to see its label class and what separates it.'
            : `Vertex ${hovered} has label ${hoveredLabel}; ${above.size} cell${above.size === 1 ? '' : 's'} above it separate it.`}
        </span>
      </figcaption>
    </figure>
  );
}

interface CellsProps {
  layout: CellLayout;
  labels: readonly number[];
  labelCount: number;
  onHover: (v: number | null) => void;
  hoveredLabel: number | null;
  above: ReadonlySet<number>;
}

function SvgCells({ layout, labels, labelCount, onHover, hovered, hoveredLabel, above, marked, title }: CellsProps & { hovered: number | null; marked?: ReadonlySet<number> | undefined; title: string }) {
  const size = 28;
  const showText = layout.cellOf.length <= 900;
  return (
    <svg
      role="img"
      aria-label={title}
      viewBox={`0 0 ${layout.cols * size} ${layout.rows * size}`}
      className="h-auto max-h-[70vh] w-full max-w-3xl"
      // Small grids keep cells about 40 px wide instead of stretching to the column's width.
      style={{ maxWidth: `min(48rem, ${layout.cols * 2.5}rem)` }}
      onMouseLeave={() => onHover(null)}
      data-testid="ranking-picture"
    >
      {Array.from(layout.cellOf, (cell, v) => {
        const r = Math.floor(cell / layout.cols);
        const c = cell % layout.cols;
        const label = labels[v]!;
        const dim = hoveredLabel !== null && label !== hoveredLabel && !above.has(v) && v !== hovered;
        return (
          <g
            key={v}
            transform={`translate(${c * size} ${r * size})`}
            onMouseEnter={() => onHover(v)}
            onFocus={() => onHover(v)}
            tabIndex={showText ? 0 : -1}
            data-vertex={v}
            data-label={label}
            data-above={above.has(v) ? '' : undefined}
            data-marked={marked?.has(v) ? '' : undefined}
            aria-label={`row ${r + 1}, column ${c + 1}: label ${label}`}
          >
            <rect
              width={size - 1}
              height={size - 1}
              rx={3}
              fill={labelColour(label, labelCount)}
              opacity={dim ? 0.25 : 1}
              stroke={above.has(v) ? '#c98a3a' : marked?.has(v) ? '#b23a2e' : 'none'}
              strokeWidth={above.has(v) || marked?.has(v) ? 3 : 0}
            />
            {showText && (
              <text x={(size - 1) / 2} y={(size - 1) / 2} dominantBaseline="central" textAnchor="middle" fontSize={12} fill={labelInk(label, labelCount)} fontFamily="var(--font-mono)">
                {label}
              </text>
            )}
          </g>
        );
      })}
    </svg>
  );
}

function CanvasCells({ layout, labels, labelCount, vertexAt, onHover, hoveredLabel, above, marked }: CellsProps & { vertexAt: Int32Array; marked?: ReadonlySet<number> | undefined }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const cellPx = Math.max(1, Math.min(8, Math.floor(1200 / Math.max(layout.rows, layout.cols))));
  useEffect(() => {
    const ctx = ref.current?.getContext('2d');
    if (!ctx) return;
    const palette = Array.from({ length: labelCount + 1 }, (_, l) => labelColour(Math.max(1, l), labelCount));
    ctx.clearRect(0, 0, layout.cols * cellPx, layout.rows * cellPx);
    layout.cellOf.forEach((cell, v) => {
      const label = labels[v]!;
      ctx.globalAlpha = hoveredLabel !== null && label !== hoveredLabel && !above.has(v) ? 0.25 : 1;
      ctx.fillStyle = marked?.has(v) ? '#b23a2e' : above.has(v) ? '#c98a3a' : palette[label]!;
      ctx.fillRect((cell % layout.cols) * cellPx, Math.floor(cell / layout.cols) * cellPx, cellPx, cellPx);
    });
    ctx.globalAlpha = 1;
  }, [layout, labels, labelCount, cellPx, hoveredLabel, above, marked]);
  return (
    <canvas
      ref={ref}
      width={layout.cols * cellPx}
      height={layout.rows * cellPx}
      className="h-auto max-h-[70vh] w-full max-w-3xl [image-rendering:pixelated]"
      data-testid="ranking-canvas"
      onMouseLeave={() => onHover(null)}
      onMouseMove={(e) => {
        const box = e.currentTarget.getBoundingClientRect();
        const c = Math.floor(((e.clientX - box.left) / box.width) * layout.cols);
        const r = Math.floor(((e.clientY - box.top) / box.height) * layout.rows);
        const v = r >= 0 && c >= 0 && r < layout.rows && c < layout.cols ? vertexAt[r * layout.cols + c]! : -1;
        onHover(v >= 0 ? v : null);
      }}
    />
  );
}
