import { stratify, tree, type HierarchyPointNode } from 'd3-hierarchy';
import { useMemo, useState } from 'react';
import { labelColour, labelInk } from '../ranking/label-colours';

export interface ForestTreeProps {
  /** parent[v] in the elimination forest, -1 at a root. */
  forestParents: readonly number[];
  /** labels[v], to colour each node as the ranking pictures do. */
  labels?: readonly number[] | undefined;
  title?: string;
}

/** Beyond this many vertices the tree is summarised instead of drawn: an SVG of more nodes is unreadable. */
export const FOREST_DRAW_LIMIT = 2000;

interface Item {
  id: string;
  parent: string | null;
  v: number;
}

const ROOT = 'forest';

/**
 * The elimination forest of a ranking, top down: each vertex hangs below the nearest vertex above it
 * that separates it from the rest (its parent); the roots are the first separators. A forest of several
 * trees hangs from a hidden common root so one tree layout places them all (Reingold–Tilford tidy
 * trees, as d3-hierarchy lays them out).
 */
export default function ForestTree({ forestParents, labels, title = 'Elimination forest' }: ForestTreeProps) {
  const n = forestParents.length;
  const [hovered, setHovered] = useState<number | null>(null);
  const layout = useMemo(() => {
    if (n === 0 || n > FOREST_DRAW_LIMIT) return null;
    const items: Item[] = [{ id: ROOT, parent: null, v: -1 }];
    forestParents.forEach((p, v) => items.push({ id: String(v), parent: p >= 0 && p < n ? String(p) : ROOT, v }));
    try {
      const root = stratify<Item>()
        .id((d) => d.id)
        .parentId((d) => d.parent)(items);
      const dx = 26;
      const dy = 48;
      const placed = tree<Item>().nodeSize([dx, dy])(root);
      let [minX, maxX, maxY] = [Infinity, -Infinity, 0];
      placed.each((d) => {
        minX = Math.min(minX, d.x);
        maxX = Math.max(maxX, d.x);
        maxY = Math.max(maxY, d.y);
      });
      return { placed, minX, width: maxX - minX + 2 * dx, height: maxY + dy / 2, dx, dy };
    } catch (err) {
      return { error: err instanceof Error ? err.message : String(err) };
    }
  }, [forestParents, n]);

  const labelCount = useMemo(() => (labels ? labels.reduce((m, l) => Math.max(m, l), 0) : 0), [labels]);
  const roots = useMemo(() => forestParents.filter((p) => p < 0).length, [forestParents]);
  const depth = useMemo(() => forestDepth(forestParents), [forestParents]);
  const summary = `${n} vertices in ${roots} tree${roots === 1 ? '' : 's'}, ${depth} level${depth === 1 ? '' : 's'} deep`;

  if (n === 0) return <p className="text-sm text-lichen-700">The forest is empty.</p>;
  if (!layout) return <p className="text-sm text-lichen-700">{`${title}: ${summary}. Too many vertices to draw as a tree (the limit is ${FOREST_DRAW_LIMIT}).`}</p>;
  if ('error' in layout) return <p className="text-sm text-alarm-600">The forest could not be laid out: {layout.error}</p>;

  const { placed, minX, width, height, dx, dy } = layout;
  const shiftX = -minX + dx;
  // The hidden root sits at depth 0; every drawn node moves up one level.
  const y = (d: HierarchyPointNode<Item>) => d.y - dy + dy / 2;
  const nodes = placed.descendants().filter((d) => d.data.v >= 0);
  const links = placed.links().filter((l) => l.source.data.v >= 0);
  const small = n <= 300;
  const above = new Set<number>();
  for (let p = hovered === null ? -1 : (forestParents[hovered] ?? -1), guard = 0; p >= 0 && guard < n; p = forestParents[p] ?? -1, guard++) above.add(p);

  return (
    <figure className="space-y-2" aria-label={title}>
      <div className="max-h-[70vh] overflow-auto rounded-md border border-stone-200 bg-stone-50">
        <svg role="img" aria-label={`${title}: ${summary}`} width={Math.max(width, 200)} height={Math.max(height, 60)} data-testid="forest-tree" onMouseLeave={() => setHovered(null)}>
          <g transform={`translate(${shiftX} 0)`}>
            {links.map((l) => (
              <path
                key={`${l.source.data.id}-${l.target.data.id}`}
                d={`M${l.source.x},${y(l.source)}C${l.source.x},${(y(l.source) + y(l.target)) / 2} ${l.target.x},${(y(l.source) + y(l.target)) / 2} ${l.target.x},${y(l.target)}`}
                fill="none"
                stroke="#a9b9a8"
                strokeWidth={1}
              />
            ))}
            {nodes.map((d) => {
              const v = d.data.v;
              const label = labels?.[v];
              const fill = label !== undefined ? labelColour(label, labelCount) : '#a9b9a8';
              const lit = hovered === v || above.has(v);
              return (
                <g
                  key={d.data.id}
                  transform={`translate(${d.x} ${y(d)})`}
                  data-vertex={v}
                  onMouseEnter={() => setHovered(v)}
                  onFocus={() => setHovered(v)}
                  tabIndex={small ? 0 : -1}
                  aria-label={small ? `vertex ${v}${label !== undefined ? `, label ${label}` : ''}${forestParents[v]! >= 0 ? `, below vertex ${forestParents[v]}` : ', a root'}` : undefined}
                >
                  <circle r={10} fill={fill} stroke={lit ? '#c98a3a' : '#1f2d2b'} strokeWidth={lit ? 3 : 0.6} />
                  <text dominantBaseline="central" textAnchor="middle" fontSize={v >= 1000 ? 7 : 9} fill={label !== undefined ? labelInk(label, labelCount) : '#1f2d2b'} fontFamily="var(--font-mono)">
                    {v}
                  </text>
                </g>
              );
            })}
          </g>
        </svg>
      </div>
      <figcaption className="text-sm text-lichen-700" aria-live="polite">
        {hovered === null ? `${summary}. Numbers are vertices; hover one to light the separators above it.` : `Vertex ${hovered}: ${above.size} ${above.size === 1 ? 'vertex' : 'vertices'} above it.`}
      </figcaption>
    </figure>
  );
}

/** Levels of the forest: the most vertices on a path from a root down to a leaf (the ranking's height, at most). */
export function forestDepth(parents: readonly number[]): number {
  const n = parents.length;
  const depth = new Int32Array(n).fill(-1);
  let best = 0;
  for (let v = 0; v < n; v++) {
    const chain: number[] = [];
    let u = v;
    while (u >= 0 && u < n && depth[u] === -1 && chain.length <= n) {
      chain.push(u);
      u = parents[u] ?? -1;
    }
    let d = u >= 0 && u < n ? depth[u]! : 0;
    for (let i = chain.length - 1; i >= 0; i--) depth[chain[i]!] = ++d;
    best = Math.max(best, depth[v]!);
  }
  return best;
}
