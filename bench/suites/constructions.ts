import { diagonalSplitRanking, fourRowDoublingRanking, MidlineSplit, staircaseRanking } from '@cairn/engine';
import { runCases } from '../harness';

/**
 * The heights the constructions reach on the benchmark sizes, beside the midline split's, and how long the
 * very first call took (later calls in one process find the four-row doubling's exact leaves cached, so
 * benchmark.js's figures are the warm ones).
 */
export function constructionsReport() {
  const midline = new MidlineSplit();
  const timed = <T>(run: () => T): [T, number] => {
    const started = performance.now();
    const out = run();
    return [out, Math.round(performance.now() - started)];
  };
  const [fourRows, fourRowsFirstMs] = timed(() => fourRowDoublingRanking(10_000).value);
  const [diagonal, diagonalFirstMs] = timed(() => diagonalSplitRanking(1000, 1000).value);
  const [stairs, stairsFirstMs] = timed(() => staircaseRanking(2000).value);
  return {
    diagonalSplit1000x1000: { labels: diagonal, midlineSplit: midline.value(1000, 1000), firstCallMs: diagonalFirstMs },
    fourRowDoubling4x10000: { labels: fourRows, midlineSplit: midline.value(4, 10_000), firstCallMs: fourRowsFirstMs },
    staircaseS2000: { labels: stairs, firstCallMs: stairsFirstMs },
  };
}

/**
 * Targets: the diagonal split of the 1000 x 1000 grid, ranking included, <= 500 ms. The four-row doubling
 * of the 4 x 10^4 grid and the staircase construction of S(2000) (2 million cells) have none; they are
 * recorded to watch.
 */
export function constructionsSuite(maxTime: number) {
  return runCases(
    {
      'diagonalSplitRanking 1000x1000': { targetMs: 500, run: () => void diagonalSplitRanking(1000, 1000) },
      'fourRowDoublingRanking 4x10^4': () => void fourRowDoublingRanking(10_000),
      'staircaseRanking S(2000)': () => void staircaseRanking(2000),
    },
    maxTime,
  );
}
