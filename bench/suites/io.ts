import { type Graph, graphFromEdges, readEdgeList, readMatrixMarket, writeEdgeList, writeMatrixMarket } from '@cairn/engine';
import { runCases } from '../harness';

/**
 * The 1000 x 500 torus: every cell joined to its right and lower neighbour with wrap-around, so exactly
 * 2 * 1000 * 500 = 10^6 edges, each one off-diagonal entry of a pattern symmetric Matrix Market file.
 */
function torus(rows: number, cols: number): Graph {
  const pairs = new Uint32Array(4 * rows * cols);
  let w = 0;
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      const v = r * cols + c;
      pairs[w++] = v;
      pairs[w++] = r * cols + ((c + 1) % cols);
      pairs[w++] = v;
      pairs[w++] = ((r + 1) % rows) * cols + c;
    }
  }
  return graphFromEdges(rows * cols, pairs);
}

/** Issue target: read a Matrix Market file of 10^6 off-diagonal entries in <= 1 s (the text is built in memory). */
export function ioSuite(maxTime: number) {
  const g = torus(1000, 500);
  const matrix = writeMatrixMarket(g);
  const edges = writeEdgeList(g);
  const expectSame = (read: Graph) => {
    if (read.vertexCount !== g.vertexCount || read.edgeCount !== g.edgeCount) throw new Error('the benchmark must read back the graph it wrote');
  };
  return runCases(
    {
      [`readMatrixMarket ${g.edgeCount} entries`]: { targetMs: 1000, run: () => expectSame(readMatrixMarket(matrix).graph) },
      [`readEdgeList ${g.edgeCount} edges`]: () => expectSame(readEdgeList(edges, { base: 0 }).graph),
    },
    maxTime,
  );
}
