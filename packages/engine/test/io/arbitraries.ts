// Generators and helpers shared by the io tests.
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { type Graph, type GridLayout, graphFromEdges, ParseError } from '../../src/index';

/** Random simple graphs: up to 30 vertices, up to 80 random pairs (loops and repeats are merged away). */
export const arbitraryGraph: fc.Arbitrary<Graph> = fc.integer({ min: 0, max: 30 }).chain((n) =>
  (n === 0 ? fc.constant<[number, number][]>([]) : fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1)), { maxLength: 80 })).map((pairs) =>
    graphFromEdges(n, pairs.flat()),
  ),
);

/** A grid-like graph: the present cells of a random rows x cols mask, numbered row-major, joined to side neighbours. */
export function gridLikeGraph(rows: number, cols: number, present: readonly boolean[]): Graph {
  const vertexOf = new Int32Array(rows * cols).fill(-1);
  const cells: number[] = [];
  for (let cell = 0; cell < rows * cols; cell++) {
    if (present[cell]) {
      vertexOf[cell] = cells.length;
      cells.push(cell);
    }
  }
  const pairs: number[] = [];
  for (const [v, cell] of cells.entries()) {
    const right = cell % cols < cols - 1 ? vertexOf[cell + 1]! : -1;
    const down = cell + cols < rows * cols ? vertexOf[cell + cols]! : -1;
    if (right >= 0) pairs.push(v, right);
    if (down >= 0) pairs.push(v, down);
  }
  const layout: GridLayout = { rows, cols, cells: Int32Array.from(cells) };
  return graphFromEdges(cells.length, pairs, undefined, layout);
}

export const arbitraryGridLikeGraph: fc.Arbitrary<Graph> = fc
  .record({ rows: fc.integer({ min: 1, max: 8 }), cols: fc.integer({ min: 1, max: 8 }) })
  .chain(({ rows, cols }) => fc.array(fc.boolean(), { minLength: rows * cols, maxLength: rows * cols }).map((present) => gridLikeGraph(rows, cols, present)));

export function edgeList(graph: Graph): [number, number][] {
  return [...graph.edges()];
}

/** The ParseError a function throws (fails the test if it throws anything else or nothing). */
export function parseErrorOf(read: () => unknown): ParseError {
  try {
    read();
  } catch (error) {
    if (error instanceof ParseError) return error;
    throw error;
  }
  throw new Error('expected a ParseError, but reading succeeded');
}

/** Where a ParseError points, and which reader raised it. */
export function placeOf(read: () => unknown): { format: string; line: number; column: number } {
  const { format, line, column } = parseErrorOf(read);
  return { format, line, column };
}

export function fixture(name: string): string {
  return readFileSync(new URL(`../fixtures/${name}`, import.meta.url), 'utf8');
}
