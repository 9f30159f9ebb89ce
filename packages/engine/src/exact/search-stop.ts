/** Why a search stopped before its answer: the caller's signal, the time limit or the memory budget. */
export type StopReason = 'aborted' | 'time-limit' | 'memory-limit';

/** Thrown inside the search when the signal fires or the time runs out; caught at the top. */
export class SearchStopped extends Error {
  constructor(readonly reason: StopReason) {
    super(reason);
  }
}
