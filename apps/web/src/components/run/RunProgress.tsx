import type { RunProgressEvent, RunView } from '@cairn/schema';
import { useEffect, useState } from 'react';
import type { StreamState } from '../../api/runs';
import { formatDuration } from './words';

const STREAM_WORDS: Record<StreamState, string> = {
  connecting: 'connecting to the live feed…',
  live: 'live',
  polling: 'live feed unavailable; re-reading the run every few seconds',
  closed: '',
};

/** Re-renders every second while `on`, so elapsed time moves between progress reports. */
function useNow(on: boolean): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!on) return;
    const t = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(t);
  }, [on]);
  return now;
}

/**
 * An unfinished run: waiting, or searching with elapsed time against the limit, search nodes and the
 * interval the rank number is known to lie in so far. Progress comes from the event stream, else from
 * the run as last read.
 */
export function RunProgress({ run, progress, stream }: { run: RunView; progress: RunProgressEvent | null; stream: StreamState }) {
  const latest = progress ?? (run.progress ? { ...run.progress, status: run.status } : null);
  const running = run.status === 'running';
  const now = useNow(running);
  // When the newest report arrived here, so elapsed time counts on from the server's figure between reports.
  const [receivedAt, setReceivedAt] = useState(() => Date.now());
  const reportElapsed = latest?.elapsedMs;
  const reportNodes = latest?.nodes;
  useEffect(() => setReceivedAt(Date.now()), [reportElapsed, reportNodes]);
  const elapsedMs = latest ? latest.elapsedMs + (running ? Math.max(0, now - receivedAt) : 0) : run.startedAt ? Math.max(0, now - Date.parse(run.startedAt)) : 0;
  const limitMs = (run.timeLimitSeconds ?? 0) * 1000;
  const share = limitMs > 0 ? Math.min(1, elapsedMs / limitMs) : null;

  return (
    <section aria-labelledby="progress-heading" className="space-y-3 rounded-xl border border-stone-200 bg-stone-50 p-4" data-testid="run-progress">
      <h2 id="progress-heading" className="font-display text-xl font-semibold">
        {run.status === 'queued' ? 'Waiting for a worker' : run.cancelRequested ? 'Stopping…' : 'Searching'}
      </h2>
      {running && share !== null && (
        <div>
          <div
            role="progressbar"
            aria-label="Time used of the limit"
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={Math.round(share * 100)}
            aria-valuetext={`${formatDuration(elapsedMs)} of ${formatDuration(limitMs)}`}
            className="h-3 w-full overflow-hidden rounded-full bg-stone-200"
          >
            <div className="h-full rounded-full bg-ochre-500 transition-[width] duration-700" style={{ width: `${(share * 100).toFixed(1)}%` }} />
          </div>
          <p className="mt-1 text-xs text-lichen-700">
            {formatDuration(elapsedMs)} of the {formatDuration(limitMs)} limit
          </p>
        </div>
      )}
      <dl className="grid grid-cols-2 gap-2 text-sm sm:grid-cols-4" aria-live="polite" aria-atomic="true" data-testid="progress-figures">
        <div>
          <dt className="text-xs uppercase tracking-wide text-lichen-700">elapsed</dt>
          <dd className="font-mono">{running || latest ? formatDuration(elapsedMs) : '—'}</dd>
        </div>
        <div>
          <dt className="text-xs uppercase tracking-wide text-lichen-700">search nodes</dt>
          <dd className="font-mono" data-testid="progress-nodes">
            {latest ? latest.nodes.toLocaleString('en') : '—'}
          </dd>
        </div>
        <div className="col-span-2">
          <dt className="text-xs uppercase tracking-wide text-lichen-700">rank number so far</dt>
          <dd className="font-mono" data-testid="progress-interval">
            {latest ? (latest.lower === latest.upper ? `${latest.lower}` : `between ${latest.lower} and ${latest.upper}`) : 'no bounds yet'}
          </dd>
        </div>
      </dl>
      {STREAM_WORDS[stream] && <p className="text-xs text-lichen-500">{STREAM_WORDS[stream]}</p>}
    </section>
  );
}
