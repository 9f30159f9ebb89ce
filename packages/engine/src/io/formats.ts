/** The graph file formats Cairn reads and writes; also the `format` of a `{ kind: 'file' }` family. */
export type GraphFormat = 'edge-list' | 'dimacs' | 'matrix-market' | 'json' | 'mask';

/** Every GraphFormat, for checking a format name that came from outside TypeScript (a CLI flag, a request). */
export const GRAPH_FORMATS: readonly GraphFormat[] = ['edge-list', 'dimacs', 'matrix-market', 'json', 'mask'];

export function isGraphFormat(name: string): name is GraphFormat {
  return (GRAPH_FORMATS as readonly string[]).includes(name);
}
