import type { RunView } from '@cairn/schema';
import { StatusBadge } from './bits';
import { formatDuration, formatWhen, METHOD_WORDS, runDurationMs, STATUS_WORDS } from './words';

const VISIBILITY_SHORT = { private: 'private', link: 'shared by link', public: 'public' } as const;

/** The run's name (its spec), status and facts, as the run page and the shared page open. */
export function RunHeader({ run }: { run: RunView }) {
  const took = runDurationMs(run);
  return (
    <header className="space-y-2">
      <h1 className="break-all font-mono text-2xl font-semibold sm:text-3xl">{run.specText}</h1>
      <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-lichen-700">
        <StatusBadge status={run.status} />
        <span>{STATUS_WORDS[run.status]}</span>
        <span>by {run.owner.login}</span>
        <span>created {formatWhen(run.createdAt)}</span>
        {run.finishedAt && took !== null && <span>took {formatDuration(took)}</span>}
        <span>{METHOD_WORDS[run.method].name.toLowerCase()}</span>
        {run.timeLimitSeconds !== null && <span>limit {formatDuration(run.timeLimitSeconds * 1000)}</span>}
        <span>{VISIBILITY_SHORT[run.visibility]}</span>
        {run.attempts > 1 && <span title="a worker stopped mid-run and another took it over">attempt {run.attempts}</span>}
      </p>
    </header>
  );
}
