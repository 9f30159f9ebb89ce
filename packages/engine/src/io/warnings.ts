import type { Graph } from '../graph/graph';

/** Something a reader dropped rather than refused: the graph is still simple and usable. */
export interface ReadWarning {
  kind: 'self-loop' | 'duplicate-edge';
  /** Where the dropped edge is written, 1-based. */
  line: number;
  column: number;
  message: string;
}

/** What every graph reader returns: the graph, the first warnings and how many there were in all. */
export interface ReadResult {
  graph: Graph;
  /** At most MAX_LISTED_WARNINGS, in file order. */
  warnings: ReadWarning[];
  /** Every warning, listed or not: a file of a million repeated edges should not carry a million messages. */
  warningCount: number;
}

export const MAX_LISTED_WARNINGS = 100;

/** Collects warnings up to the listing limit and counts the rest. */
export class WarningList {
  readonly listed: ReadWarning[] = [];
  count = 0;

  /** True once the list is full: callers skip building messages nobody will see. */
  get full(): boolean {
    return this.listed.length >= MAX_LISTED_WARNINGS;
  }

  add(kind: ReadWarning['kind'], line: number, column: number, message: string): void {
    this.count++;
    if (!this.full) this.listed.push({ kind, line, column, message });
  }

  /** Counts a warning without listing it (the list is full). */
  countOnly(): void {
    this.count++;
  }

  result(graph: Graph): ReadResult {
    return { graph, warnings: this.listed, warningCount: this.count };
  }
}
