import { SizeError } from '../errors';
import { MAX_EDGES, MAX_VERTICES } from '../graph/limits';

/** Throws unless value is a whole number >= min, naming the family and the parameter. */
export function checkWhole(family: string, name: string, value: number, min: number): void {
  if (!Number.isInteger(value) || value < min) {
    throw new SizeError(`${family}: ${name} must be a whole number >= ${min}, got ${value}`);
  }
}

/** Throws when a family's vertex or edge count is beyond what a graph may hold. */
export function checkCapacity(family: string, vertices: number, edges: number): void {
  if (vertices > MAX_VERTICES) throw new SizeError(`${family} would have ${vertices} vertices; a graph may have at most ${MAX_VERTICES}`);
  if (edges > MAX_EDGES) throw new SizeError(`${family} would have ${edges} edges; a graph may have at most ${MAX_EDGES}`);
}
