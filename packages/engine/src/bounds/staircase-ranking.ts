import { SizeError } from '../errors';
import { staircaseBox } from './bevelled-box';
import { BevelledSplit } from './bevelled-split';
import type { UpperBound } from './upper-bound';

/** The vertex of staircaseGraph(t) at cell (i, j): rows are numbered in turn and row i holds t - i cells. */
export function staircaseVertex(t: number, i: number, j: number): number {
  return i * t - (i * (i - 1)) / 2 + j;
}

/**
 * The staircase construction (Cairn's own): a ranking of the staircase S(t) by recursive separators.
 * The bevelled-box program (BevelledSplit) cuts S(t) along a row, a column or a diagonal, and every
 * piece left (smaller staircases, rectangles with a staircase corner cut off, and the pieces the
 * diagonal cuts leave) again, each cut taking distinct labels above the pieces it separates. Heights
 * are memoised over canonical pieces, so t in the thousands takes milliseconds.
 */
export class StaircaseRanking {
  constructor(private readonly split: BevelledSplit = new BevelledSplit()) {}

  /** The number of labels the construction uses on S(t). */
  value(t: number): number {
    checkSize(t);
    return this.split.value(staircaseBox(t));
  }

  /** The ranking of staircaseGraph(t) (its vertex numbering), with its number of labels. */
  ranking(t: number): UpperBound {
    checkSize(t);
    const labels = new Int32Array((t * (t + 1)) / 2);
    const value = this.split.label(staircaseBox(t), (i, j, label) => {
      labels[staircaseVertex(t, i, j)] = label;
    });
    return {
      value,
      labels,
      construction: 'staircase-split',
      argument: `cut the staircase S(${t}) and each piece left along the row, column or diagonal chosen by dynamic programming; each cut takes distinct labels above the pieces it separates (${value} labels)`,
    };
  }
}

function checkSize(t: number): void {
  if (!Number.isInteger(t) || t < 1) throw new SizeError(`the staircase construction needs a whole t >= 1, got ${t}`);
  if ((t * (t + 1)) / 2 > 1e8) throw new SizeError(`the staircase construction: S(${t}) has more cells than it labels (10^8)`);
}

/** The staircase construction's ranking of S(t). */
export function staircaseRanking(t: number): UpperBound {
  return new StaircaseRanking().ranking(t);
}
