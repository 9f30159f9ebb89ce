import type { SweepSummary } from '@cairn/schema';

/** How far a sweep's runs have got, as a bar and in words. */
export function SweepProgress({ sweep, live = false }: { sweep: SweepSummary; live?: boolean }) {
  const { counts, runCount } = sweep;
  const finished = counts.done + counts.failed + counts.cancelled;
  const total = Math.max(runCount, finished + counts.queued + counts.running);
  const pct = total === 0 ? 0 : Math.round((finished / total) * 100);
  const words = [
    `${counts.done} done`,
    counts.running > 0 ? `${counts.running} running` : null,
    counts.queued > 0 ? `${counts.queued} queued` : null,
    counts.failed > 0 ? `${counts.failed} failed` : null,
    counts.cancelled > 0 ? `${counts.cancelled} cancelled` : null,
  ]
    .filter(Boolean)
    .join(' · ');
  return (
    <div className="min-w-40 space-y-1">
      <div
        className="h-1.5 w-full overflow-hidden rounded-full bg-stone-200"
        role="progressbar"
        aria-valuemin={0}
        aria-valuemax={total}
        aria-valuenow={finished}
        aria-label={`${finished} of ${total} runs finished`}
      >
        <div className={`h-full ${counts.failed > 0 ? 'bg-ochre-700' : 'bg-lichen-700'}`} style={{ width: `${pct}%` }} />
      </div>
      <p className="text-xs text-lichen-700" aria-live={live ? 'polite' : undefined}>
        {words} <span className="text-lichen-500">of {total} runs</span>
      </p>
    </div>
  );
}
