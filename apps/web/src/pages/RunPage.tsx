import { useEffect, useState } from 'react';
import { Link, useParams } from 'react-router';
import { ApiRequestError } from '../api/client';
import { useCan, useMe } from '../api/me';
import { isFinished, runExportBase, useCancelRun, useRun, useRunEvents, useRunPlan } from '../api/runs';
import { ErrorNote, Loading, linkClass, quietButtonClass } from '../components/run/bits';
import { RunHeader } from '../components/run/RunHeader';
import { RunProgress } from '../components/run/RunProgress';
import { RunResult } from '../components/run/RunResult';
import { ShareBox, ShareLink, VisibilityControl } from '../components/run/Sharing';

/** How often the run is re-read when the event stream is not available. */
const POLL_MS = 2000;

export function RunPage() {
  const { id = '' } = useParams();
  const [polling, setPolling] = useState(false);
  const run = useRun(id, { pollMs: polling ? POLL_MS : false });
  const events = useRunEvents(run.data);
  useEffect(() => setPolling(events.state === 'polling'), [events.state]);
  const plan = useRunPlan(id, Boolean(run.data?.result));
  const me = useMe();
  const isAdmin = useCan('admin');
  const canWrite = useCan('runs:write');
  const cancel = useCancelRun(id);

  if (run.isPending) return <Loading what="the run" />;
  if (run.isError) {
    const status = run.error instanceof ApiRequestError ? run.error.status : 0;
    return (
      <section className="space-y-3">
        <h1 className="font-display text-3xl font-semibold">{status === 404 ? 'No such run' : 'The run could not be read'}</h1>
        <ErrorNote error={run.error} />
        {status === 404 && <p className="text-sm text-lichen-700">It may have been deleted, or it is private to another member.</p>}
        <p>
          <Link className={linkClass} to="/runs">
            Back to the runs
          </Link>
        </p>
      </section>
    );
  }
  const r = run.data;
  const owns = me.data?.user?.id === r.owner.id;
  const mayManage = canWrite && (owns || isAdmin);
  const finished = isFinished(r.status);

  return (
    <article className="space-y-8">
      <RunHeader run={r} />

      {!finished && (
        <div className="space-y-3">
          <RunProgress run={r} progress={events.progress} stream={events.state} />
          {mayManage && (
            <div className="flex flex-wrap items-center gap-3">
              <button type="button" className={quietButtonClass} onClick={() => cancel.mutate()} disabled={cancel.isPending || r.cancelRequested}>
                {r.cancelRequested ? 'Cancel requested' : cancel.isPending ? 'Cancelling…' : 'Cancel the run'}
              </button>
              <span className="text-sm text-lichen-700">A cancelled run keeps the best interval it reached.</span>
            </div>
          )}
          {cancel.isError && <ErrorNote error={cancel.error} what="Not cancelled" />}
        </div>
      )}

      {r.status === 'failed' && <ErrorNote error={new Error(r.error?.message ?? 'the run failed without saying why')} what={`The run failed${r.error ? ` (${r.error.code})` : ''}`} />}
      {r.status === 'cancelled' && !r.result && <p className="text-lichen-700">The run was cancelled before it reached any result.</p>}
      {r.status === 'cancelled' && r.result && <p className="text-lichen-700">The run was cancelled; below is the best it had proven by then.</p>}

      {r.result && (
        <RunResult
          run={r}
          result={r.result}
          plan={{ data: plan.data, isPending: plan.isPending, error: plan.error }}
          exportBase={runExportBase(r.id)}
          mayReadGraph={owns || isAdmin}
        />
      )}

      <section aria-labelledby="sharing-heading" className="space-y-4">
        <h2 id="sharing-heading" className="font-display text-xl font-semibold">
          Sharing
        </h2>
        {mayManage ? (
          <div className="grid gap-6 md:grid-cols-2">
            <VisibilityControl run={r} />
            <ShareBox run={r} />
          </div>
        ) : r.links.shared ? (
          <ShareLink url={r.links.shared} />
        ) : (
          <p className="text-sm text-lichen-700">Only the owner ({r.owner.login}) can share this run.</p>
        )}
      </section>
    </article>
  );
}
