import { midlineSplitRanking, optimalTreeRanking, randomTree } from '@cairn/engine';
import { runCases } from '../harness';

/** Issue targets: midline split of the 2000 x 2000 grid <= 500 ms; Schäffer on a 10^6-vertex random tree <= 500 ms. */
export function boundsSuite(maxTime: number) {
  const tree = randomTree(1_000_000, 11);
  return runCases(
    {
      'midlineSplitRanking 2000x2000': { targetMs: 500, run: () => void midlineSplitRanking(2000, 2000) },
      'optimalTreeRanking random tree 10^6': { targetMs: 500, run: () => void optimalTreeRanking(tree) },
    },
    maxTime,
  );
}
