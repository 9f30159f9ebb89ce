import { bestLowerBound, midlineSplitRanking, nestedDissectionRanking, optimalTreeRanking, randomTree } from '@cairn/engine';
import { holedGrid } from './lower-bounds';
import { runCases } from '../harness';

/** The 10^5-cell mesh of the nested-dissection target: its ranking height beside the best lower bound. */
export function meshReport() {
  const mesh = holedGrid(333, 334, 0.1, 7);
  const upper = nestedDissectionRanking(mesh).value;
  const lower = bestLowerBound(mesh).best;
  return { vertices: mesh.vertexCount, edges: mesh.edgeCount, nestedDissectionHeight: upper, bestLowerBound: lower.value, lowerArgument: lower.argument };
}

/**
 * Issue targets: midline split of the 2000 x 2000 grid <= 500 ms; Schäffer on a 10^6-vertex random tree
 * <= 500 ms; nested dissection of a 10^5-vertex mesh (a grid with 10% of cells removed) <= 2 s.
 */
export function boundsSuite(maxTime: number) {
  const tree = randomTree(1_000_000, 11);
  const mesh = holedGrid(333, 334, 0.1, 7);
  return runCases(
    {
      'nestedDissectionRanking mesh 10^5 cells': { targetMs: 2000, run: () => void nestedDissectionRanking(mesh) },
      'midlineSplitRanking 2000x2000': { targetMs: 500, run: () => void midlineSplitRanking(2000, 2000) },
      'optimalTreeRanking random tree 10^6': { targetMs: 500, run: () => void optimalTreeRanking(tree) },
    },
    maxTime,
  );
}
