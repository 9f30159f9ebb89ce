import type { Family } from '../graph/family';

/** The family of a graph read from a file: which format, and the file's name when the caller knows it. */
export function fileFamily(format: string, name?: string): Family {
  return name === undefined || name === '' ? { kind: 'file', format } : { kind: 'file', format, name };
}
