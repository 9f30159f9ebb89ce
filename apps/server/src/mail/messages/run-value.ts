/** What a run established, in words for a mail: the rank number, the interval, or why there is none. */
export interface RunOutcome {
  status: string;
  rankNumber: number | null;
  lower: number | null;
  upper: number | null;
  provenance: string | null;
  error: { code: string; message: string } | null;
}

export function describeOutcome(o: RunOutcome): string {
  if (o.status === 'failed') return `The run failed: ${o.error?.message ?? 'no reason was recorded'} (${o.error?.code ?? 'unknown'}).`;
  if (o.rankNumber !== null) return `Rank number: ${o.rankNumber} (${o.provenance ?? 'no provenance'}).`;
  if (o.lower !== null && o.upper !== null) {
    const why = o.status === 'cancelled' ? 'the run was cancelled' : 'the search stopped at its time limit';
    return `Rank number between ${o.lower} and ${o.upper}: ${why} before the two sides met. The upper bound comes with a verified certificate.`;
  }
  if (o.status === 'cancelled') return 'The run was cancelled before it reached any bounds.';
  return `The run is ${o.status}.`;
}
