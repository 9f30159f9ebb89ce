import { EngineError, graphFromSpec, type Graph, type GraphSpec as EngineSpec } from '@cairn/engine';
import type { DataSource } from 'typeorm';
import { uploadForEngine } from './graphs';

/** What the engine needs to build a run's graph: a spec, and the files it names (an upload's content). */
export interface EngineInput {
  spec: EngineSpec;
  files: Record<string, string>;
}

/** The engine's input for a stored run spec; null when the run names an upload that no longer exists. */
export async function engineInputOf(source: DataSource, spec: Record<string, unknown>): Promise<EngineInput | null> {
  if (spec.family !== 'upload') return { spec: spec as unknown as EngineSpec, files: {} };
  const upload = await uploadForEngine(source, String(spec.graphId));
  return upload ? { spec: upload.spec, files: upload.files } : null;
}

/** Builds the graph of an engine input here, in this thread, independently of any worker. */
export function buildGraph(input: EngineInput): Graph {
  return graphFromSpec(input.spec, (path) => {
    const content = input.files[path];
    if (content === undefined) throw new EngineError('file_missing', `the spec names the file ${path}, which is not stored with the run`);
    return content;
  });
}
