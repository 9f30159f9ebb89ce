import { useParams } from 'react-router';
import { ApiRequestError } from '../api/client';
import { isFinished, sharedExportBase, useSharedRun, useSharedRunPlan } from '../api/runs';
import { ErrorNote, Loading } from '../components/run/bits';
import { RunHeader } from '../components/run/RunHeader';
import { RunResult } from '../components/run/RunResult';
import { STATUS_WORDS } from '../components/run/words';

/** A run read through its share link: the run page's read-only view, for anyone holding the link. */
export function SharedRunPage() {
  const { token = '' } = useParams();
  const shared = useSharedRun(token);
  const plan = useSharedRunPlan(token, Boolean(shared.data?.result));
  if (shared.isPending) return <Loading what="the shared run" />;
  if (shared.isError) {
    const notFound = shared.error instanceof ApiRequestError && (shared.error.status === 404 || shared.error.status === 400);
    return (
      <section className="space-y-3">
        <h1 className="font-display text-3xl font-semibold">{notFound ? 'This share link leads nowhere' : 'The shared run could not be read'}</h1>
        <ErrorNote error={shared.error} />
        {notFound && <p className="text-sm text-lichen-700">Its owner may have made the run private again, or deleted it.</p>}
      </section>
    );
  }
  const run = shared.data;
  return (
    <article className="space-y-8">
      <p className="text-sm text-lichen-700">Shared with you by {run.owner.login}. You are reading it through its link; nothing here can be changed.</p>
      <RunHeader run={run} />
      {!isFinished(run.status) && <p className="text-lichen-700">This run is {STATUS_WORDS[run.status]}; come back later for its result.</p>}
      {run.status === 'failed' && <ErrorNote error={new Error(run.error?.message ?? 'the run failed without saying why')} what="The run failed" />}
      {run.result ? (
        <RunResult run={run} result={run.result} plan={plan} exportBase={sharedExportBase(token)} mayReadGraph={false} />
      ) : (
        isFinished(run.status) && <p className="text-lichen-700">The run ended without a result.</p>
      )}
    </article>
  );
}
