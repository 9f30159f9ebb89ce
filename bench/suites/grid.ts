import { gridGraph, midlineSplitRanking, verifyRanking } from '@cairn/engine';
import { runCases } from '../harness';

/** Issue targets on this 2-core machine: build the 1000 x 1000 grid <= 50 ms, verify a ranking <= 100 ms. */
export function gridSuite(maxTime: number) {
  const g = gridGraph(1000, 1000);
  // A ranking of realistic shape to verify: the midline split's (about 3000 labels).
  const labels = midlineSplitRanking(1000, 1000).labels;
  if (!verifyRanking(g, labels).valid) throw new Error('the midline-split labelling must be a ranking');
  return runCases(
    {
      'gridGraph 1000x1000': {
        targetMs: 50,
        run: () => {
          if (gridGraph(1000, 1000).edgeCount !== 1_998_000) throw new Error('wrong edge count');
        },
      },
      'verifyRanking grid 1000x1000': {
        targetMs: 100,
        run: () => {
          if (!verifyRanking(g, labels).valid) throw new Error('must verify');
        },
      },
    },
    maxTime,
  );
}
