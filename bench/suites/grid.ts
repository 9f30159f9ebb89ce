import { gridGraph, verifyRanking } from '@cairn/engine';
import { runCases } from '../harness';

/**
 * A valid ranking of the rows x cols grid for the benchmark to verify: cut the longer side's middle line,
 * rank both halves, then give the cut distinct labels above everything below it (classic nested dissection;
 * not a low ranking, only a valid one of realistic shape).
 */
export function dissectionLabels(rows: number, cols: number): Int32Array {
  const labels = new Int32Array(rows * cols);
  const rank = (r0: number, c0: number, h: number, w: number): number => {
    if (h <= 0 || w <= 0) return 0;
    if (h * w === 1) {
      labels[r0 * cols + c0] = 1;
      return 1;
    }
    let top: number;
    if (w >= h) {
      const mid = c0 + (w >> 1);
      top = Math.max(rank(r0, c0, h, mid - c0), rank(r0, mid + 1, h, c0 + w - mid - 1));
      for (let r = 0; r < h; r++) labels[(r0 + r) * cols + mid] = ++top;
    } else {
      const mid = r0 + (h >> 1);
      top = Math.max(rank(r0, c0, mid - r0, w), rank(mid + 1, c0, r0 + h - mid - 1, w));
      for (let c = 0; c < w; c++) labels[mid * cols + c0 + c] = ++top;
    }
    return top;
  };
  rank(0, 0, rows, cols);
  return labels;
}

/** Issue targets on this 2-core machine: build the 1000 x 1000 grid <= 50 ms, verify a ranking <= 100 ms. */
export function gridSuite(maxTime: number) {
  const g = gridGraph(1000, 1000);
  const labels = dissectionLabels(1000, 1000);
  if (!verifyRanking(g, labels).valid) throw new Error('the dissection labelling must be a ranking');
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
