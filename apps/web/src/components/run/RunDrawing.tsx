import type { RunView, SolveResult } from '@cairn/schema';
import { useMemo, useState } from 'react';
import { useGraphContent } from '../../api/uploads';
import { exportHref, type ExportBase } from '../../api/runs';
import { familyGraph, parseGraphFile, type GraphData } from '../node-link/graph-data';
import { NodeLinkDrawing } from '../node-link/NodeLinkDrawing';
import { gridLayout, maskLayout, staircaseLayout, type CellLayout } from '../ranking/grid-cells';
import { RankingPicture } from '../ranking/RankingPicture';
import { Loading } from './bits';

/** The server's SVG export draws graphs that are not grid-like up to this many vertices. */
const SERVER_DRAWS_VERTICES = 100;

type Plan = { forestParents: readonly number[] } | undefined;

const num = (v: unknown) => (typeof v === 'number' && Number.isInteger(v) && v > 0 ? v : null);

/** The cell layout of a grid-like graph, from the result's family (kind ...) or the run's spec (family ...). */
export function cellLayoutOf(family: Record<string, unknown> | null, spec: Record<string, unknown>): { layout: CellLayout; note?: string } | null {
  const kind = (family?.kind as string | undefined) ?? (spec.family as string | undefined);
  const get = (k: string) => num(family?.[k]) ?? num(spec[k]);
  if (kind === 'grid' || kind === 'cylinder' || kind === 'torus') {
    const rows = get('rows');
    const cols = get('cols');
    if (rows === null || cols === null) return null;
    const note =
      kind === 'cylinder' ? 'Each row also closes into a cycle: its first and last cells are joined (not drawn).' : kind === 'torus' ? 'Rows and columns both close into cycles: opposite edge cells are joined (not drawn).' : undefined;
    return note ? { layout: gridLayout(rows, cols), note } : { layout: gridLayout(rows, cols) };
  }
  if (kind === 'staircase') {
    const t = get('t');
    return t === null ? null : { layout: staircaseLayout(t) };
  }
  if (kind === 'mask') {
    const text = (typeof family?.text === 'string' ? family.text : undefined) ?? (typeof spec.text === 'string' ? spec.text : undefined);
    return text ? { layout: maskLayout(text) } : null;
  }
  return null;
}

/**
 * The ranking drawn as well as the browser can know the graph: grid-like graphs cell by cell, classic
 * families and uploaded files as nodes and lines, random families by the server's own drawing when it
 * makes one, and otherwise a plain sentence saying why there is no picture.
 */
export function RunDrawing({ run, result, plan, exportBase, mayReadGraph }: { run: RunView; result: SolveResult; plan: Plan; exportBase: ExportBase; mayReadGraph: boolean }) {
  const family = result.graph.family;
  const title = `Ranking of ${run.specText} with ${result.upper} labels`;
  const cells = useMemo(() => cellLayoutOf(family, run.spec), [family, run.spec]);
  const classic = useMemo(() => familyGraph(family, run.spec), [family, run.spec]);

  if (cells) {
    if (cells.layout.cellOf.length !== result.labels.length) {
      return <CannotDraw reason={`the picture has ${cells.layout.cellOf.length} cells but the ranking labels ${result.labels.length} vertices`} />;
    }
    return (
      <div className="space-y-2">
        <RankingPicture layout={cells.layout} labels={result.labels} forestParents={plan?.forestParents} title={title} />
        {cells.note && <p className="text-sm text-lichen-700">{cells.note}</p>}
      </div>
    );
  }
  if (classic) return <FromGraphData data={classic} labels={result.labels} title={title} fallback={<ServerDrawing result={result} exportBase={exportBase} title={title} />} />;
  const graphId = typeof run.spec.graphId === 'string' ? run.spec.graphId : null;
  if (run.spec.family === 'upload' && graphId) {
    return <UploadDrawing graphId={graphId} format={typeof family?.format === 'string' ? family.format : null} result={result} plan={plan} title={title} exportBase={exportBase} mayRead={mayReadGraph} />;
  }
  return <ServerDrawing result={result} exportBase={exportBase} title={title} />;
}

function CannotDraw({ reason }: { reason: string }) {
  return <p className="rounded-md bg-stone-100 px-3 py-2 text-sm text-lichen-700">No picture of this ranking: {reason}. The CSV and JSON downloads hold every label.</p>;
}

function FromGraphData({ data, labels, title, fallback }: { data: GraphData; labels: readonly number[]; title: string; fallback?: React.ReactNode }) {
  if (!data.ok) return <CannotDraw reason={data.reason} />;
  if (data.graph.vertexCount !== labels.length) return fallback ?? <CannotDraw reason={`the graph read here has ${data.graph.vertexCount} vertices, the ranking ${labels.length}`} />;
  return <NodeLinkDrawing graph={data.graph} labels={labels} title={title} />;
}

/** An upload drawn from its stored file, when the reader may fetch it and it reads back to the same graph. */
function UploadDrawing({
  graphId,
  format,
  result,
  plan,
  title,
  exportBase,
  mayRead,
}: {
  graphId: string;
  format: string | null;
  result: SolveResult;
  plan: Plan;
  title: string;
  exportBase: ExportBase;
  mayRead: boolean;
}) {
  const content = useGraphContent(graphId, mayRead);
  const data = useMemo(() => (content.data !== undefined && format && format !== 'mask' ? parseGraphFile(content.data, format) : null), [content.data, format]);
  const serverDrawing = <ServerDrawing result={result} exportBase={exportBase} title={title} />;
  if (!mayRead || content.isError) return serverDrawing;
  if (content.isPending) return <Loading what="the uploaded graph" />;
  if (format === 'mask') {
    const layout = maskLayout(content.data);
    if (layout.cellOf.length === result.labels.length) return <RankingPicture layout={layout} labels={result.labels} forestParents={plan?.forestParents} title={title} />;
    return serverDrawing;
  }
  if (!data) return serverDrawing;
  if (data.ok && (data.graph.vertexCount !== result.graph.vertexCount || data.graph.edges.length / 2 !== result.graph.edgeCount)) {
    // Read differently here than on the server: better no picture than a wrong one.
    return serverDrawing;
  }
  return <FromGraphData data={data} labels={result.labels} title={title} />;
}

/** The server's SVG export when it draws this graph (small graphs), else a sentence. */
function ServerDrawing({ result, exportBase, title }: { result: SolveResult; exportBase: ExportBase; title: string }) {
  const [failed, setFailed] = useState(false);
  if (result.graph.vertexCount > SERVER_DRAWS_VERTICES) {
    return <CannotDraw reason={`the browser cannot rebuild this graph's edges, and the server draws graphs that are not grid-like only up to ${SERVER_DRAWS_VERTICES} vertices (this one has ${result.graph.vertexCount.toLocaleString('en')})`} />;
  }
  if (failed) return <CannotDraw reason="the server did not draw it" />;
  return (
    <figure className="space-y-1">
      <img src={exportHref(exportBase, 'svg')} alt={title} className="h-auto max-h-[70vh] w-full max-w-2xl" onError={() => setFailed(true)} data-testid="server-drawing" />
      <figcaption className="text-sm text-lichen-700">Drawn by the server from the stored graph.</figcaption>
    </figure>
  );
}
