/** Thrown inside the search when the signal fires or the time runs out; caught at the top. */
export class SearchStopped extends Error {
  constructor(readonly reason: 'aborted' | 'time-limit') {
    super(reason);
  }
}
