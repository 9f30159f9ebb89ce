import { bestLowerBound, bestUpperBound, EngineError, formulaFor, graphFromSpec, parseGraphSpec } from '@cairn/engine';
import type { QuickAnswer } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import { HttpError } from '../http/errors';
import { findAtlasEntry, type AtlasReader } from './atlas-query';
import { graphKeyOf } from './graph-key';

/** Beyond this many vertices the constructions are not "at once" in a request; queue a run instead. */
export const QUICK_MAX_VERTICES = 250_000;

const describe = (p: Record<string, unknown>) => (typeof p.argument === 'string' ? p.argument : typeof p.value === 'string' ? p.value : JSON.stringify(p));

/**
 * What Cairn can say of a graph at once: the atlas's entry when there is one, else a closed form, else
 * the best construction and lower bound computed on the spot. Every number is computed or looked up,
 * never assumed; an upper bound from a construction comes from a ranking the engine built.
 */
export async function quickAnswer(source: DataSource, specText: string, reader: AtlasReader): Promise<QuickAnswer> {
  let spec;
  try {
    spec = parseGraphSpec(specText);
  } catch (err) {
    if (err instanceof EngineError) throw new HttpError(400, 'invalid_request', `query.spec: ${err.message}`, { problems: [{ field: 'query.spec', message: err.message }] });
    throw err;
  }
  if (spec.family === 'file' || ((spec.family === 'mask' || spec.family === 'tree') && spec.file !== undefined)) {
    throw new HttpError(400, 'invalid_request', 'query.spec: the server reads no files; upload the graph and start a run on it', {
      problems: [{ field: 'query.spec', message: 'names a file' }],
    });
  }
  const key = graphKeyOf(spec);
  const known = await findAtlasEntry(source, key.key, reader).catch((err: unknown) => {
    if (err instanceof HttpError && err.status === 404) return undefined;
    throw err;
  });
  if (known) {
    return {
      spec: specText,
      graphKey: known.graphKey,
      vertexCount: known.vertexCount,
      edgeCount: known.edgeCount,
      lower: known.lower,
      upper: known.upper,
      rankNumber: known.exact ? known.lower : null,
      source: 'atlas',
      lowerArgument: describe(known.lowerProvenance),
      upperArgument: describe(known.upperProvenance),
      lowerRunId: known.lowerRunId,
      upperRunId: known.upperRunId,
    };
  }
  let graph;
  try {
    graph = graphFromSpec(spec);
  } catch (err) {
    if (err instanceof EngineError) throw new HttpError(400, 'invalid_request', `query.spec: ${err.message}`, { problems: [{ field: 'query.spec', message: err.message }] });
    throw err;
  }
  const base = { spec: specText, graphKey: key.key, vertexCount: graph.vertexCount, edgeCount: graph.edgeCount, lowerRunId: null, upperRunId: null };
  const formula = formulaFor(graph);
  if (formula) {
    const words = `${formula.formula.statement} (${formula.formula.source.title}${formula.formula.source.year ? `, ${formula.formula.source.year}` : ''})`;
    return { ...base, lower: formula.value, upper: formula.value, rankNumber: formula.value, source: 'formula', lowerArgument: words, upperArgument: words };
  }
  if (graph.vertexCount > QUICK_MAX_VERTICES) {
    throw new HttpError(413, 'too_large_for_quick', `${specText} has ${graph.vertexCount} vertices; quick answers stop at ${QUICK_MAX_VERTICES}: start a run instead`);
  }
  const upper = bestUpperBound(graph).best;
  const lower = bestLowerBound(graph).best;
  const exact = lower.value === upper.value;
  return {
    ...base,
    lower: lower.value,
    upper: upper.value,
    rankNumber: exact ? upper.value : null,
    source: 'bounds',
    lowerArgument: lower.argument,
    upperArgument: `${upper.construction}: ${upper.argument}`,
  };
}
