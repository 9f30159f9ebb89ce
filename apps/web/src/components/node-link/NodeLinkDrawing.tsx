import { useMemo, useState } from 'react';
import { LabelLegend } from '../ranking/LabelLegend';
import { labelColour, labelInk } from '../ranking/label-colours';
import { placeVertices, type DrawableGraph, type Positions } from './graph-data';

export interface NodeLinkDrawingProps {
  graph: DrawableGraph;
  /** labels[v] of each vertex (1-based). */
  labels: readonly number[];
  title: string;
}

const pointOf = (p: Positions, v: number, size: number, pad: number) => [pad + p.xs[v]! * (size - 2 * pad), pad + p.ys[v]! * (size - 2 * pad)] as const;

/** How tall the picture must be: the layouts fill the width, not always the height (a short path). */
function usedHeight(p: Positions, size: number, pad: number): number {
  let maxY = 0;
  for (const y of p.ys) maxY = Math.max(maxY, y);
  return Math.max(2 * pad + 20, pad * 2 + maxY * (size - 2 * pad));
}

/** Up to this many vertices each node carries its label and can be focused; beyond, only colours. */
const LABELLED_LIMIT = 150;

/**
 * A graph drawn as nodes and lines, each node filled by its label on Cairn's scale. Hover or focus a node
 * to light its label class: no two of them may be joined by a path of smaller labels.
 */
export function NodeLinkDrawing({ graph, labels, title }: NodeLinkDrawingProps) {
  const positions = useMemo(() => placeVertices(graph), [graph]);
  const labelCount = useMemo(() => labels.reduce((m, l) => Math.max(m, l), 0), [labels]);
  const [hovered, setHovered] = useState<number | null>(null);
  const n = graph.vertexCount;
  const size = 600;
  const pad = 24;
  const at = (v: number) => pointOf(positions, v, size, pad);
  const radius = n <= 30 ? 12 : n <= LABELLED_LIMIT ? 9 : n <= 1000 ? 4 : 2.5;
  const labelled = n <= LABELLED_LIMIT;
  const edgePath = useMemo(() => {
    let d = '';
    for (let i = 0; i + 1 < graph.edges.length; i += 2) {
      const [x1, y1] = pointOf(positions, graph.edges[i]!, size, pad);
      const [x2, y2] = pointOf(positions, graph.edges[i + 1]!, size, pad);
      d += `M${x1.toFixed(1)} ${y1.toFixed(1)}L${x2.toFixed(1)} ${y2.toFixed(1)}`;
    }
    return d;
  }, [graph, positions]);
  const hoveredLabel = hovered === null ? null : (labels[hovered] ?? null);

  return (
    <figure className="space-y-3" aria-label={title}>
      <svg role="img" aria-label={title} viewBox={`0 0 ${size} ${usedHeight(positions, size, pad).toFixed(0)}`} className="h-auto max-h-[70vh] w-full max-w-2xl" data-testid="node-link" onMouseLeave={() => setHovered(null)}>
        <path d={edgePath} stroke="#6f8a80" strokeOpacity={n > 1000 ? 0.35 : 0.7} strokeWidth={n > 1000 ? 0.5 : 1.2} fill="none" data-testid="node-link-edges" />
        {Array.from({ length: n }, (_, v) => {
          const [x, y] = at(v);
          const label = labels[v] ?? 0;
          const dim = hoveredLabel !== null && label !== hoveredLabel;
          return (
            <g
              key={v}
              transform={`translate(${x.toFixed(1)} ${y.toFixed(1)})`}
              data-vertex={v}
              data-label={label}
              tabIndex={labelled ? 0 : -1}
              aria-label={labelled ? `vertex ${v}: label ${label}` : undefined}
              onMouseEnter={() => setHovered(v)}
              onFocus={() => setHovered(v)}
            >
              <circle r={radius} fill={labelColour(Math.max(1, label), labelCount)} stroke="#1f2d2b" strokeWidth={labelled ? 0.8 : 0} opacity={dim ? 0.25 : 1} />
              {labelled && radius >= 9 && (
                <text dominantBaseline="central" textAnchor="middle" fontSize={radius >= 12 ? 11 : 9} fill={labelInk(Math.max(1, label), labelCount)} fontFamily="var(--font-mono)">
                  {label}
                </text>
              )}
            </g>
          );
        })}
      </svg>
      <figcaption className="flex flex-wrap items-center gap-4 text-sm text-lichen-700">
        <LabelLegend labelCount={labelCount} />
        <span aria-live="polite">
          {hovered === null ? 'Hover or focus a vertex to light its label class.' : `Vertex ${hovered} has label ${hoveredLabel}.`}
        </span>
      </figcaption>
    </figure>
  );
}
