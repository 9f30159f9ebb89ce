import { readFileSync } from 'node:fs';
import { readGraphSpec, type Graph, type ReadWarning } from '@cairn/engine';
import { CliError } from './cli-error';

/** Reads a file named on the command line, or standard input for '-'; a missing file is bad input. */
export function readInput(path: string): string {
  try {
    return readFileSync(path === '-' ? 0 : path, 'utf8');
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    throw new CliError(code === 'ENOENT' ? `no file ${path}` : `cannot read ${path}: ${(err as Error).message}`);
  }
}

export interface LoadedGraph {
  graph: Graph;
  /** Files the spec named, by path, so a worker thread can build the same graph. */
  files: Record<string, string>;
  warnings: ReadWarning[];
  warningCount: number;
}

/** The graph a command-line argument names: a spec (grid:4x7, mask:FILE, ...), a file, or '-' for stdin. */
export function loadGraph(arg: string): LoadedGraph {
  const files: Record<string, string> = {};
  const read = readGraphSpec(arg, (path) => (files[path] = readInput(path)));
  return { graph: read.graph, files, warnings: read.warnings, warningCount: read.warningCount };
}

/** Dropped self-loops and repeated edges, said on stderr with their lines. */
export function reportWarnings(loaded: LoadedGraph, quiet: boolean): void {
  if (quiet || loaded.warningCount === 0) return;
  for (const w of loaded.warnings) process.stderr.write(`cairn: warning: line ${w.line}, column ${w.column}: ${w.message}\n`);
  if (loaded.warningCount > loaded.warnings.length) process.stderr.write(`cairn: warning: ${loaded.warningCount - loaded.warnings.length} more\n`);
}
