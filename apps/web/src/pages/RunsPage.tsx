import { RunStatus } from '@cairn/schema';
import { useId, useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import { signInHref, useCan, useMe } from '../api/me';
import { useRunList } from '../api/runs';
import { ErrorNote, Loading, inputClass, linkClass, quietButtonClass } from '../components/run/bits';
import { RunsTable } from '../components/run/RunsTable';
import { PagerNav } from '../components/table/Pager';

/** The families runs are filed under (the spec's family; uploads as `upload`). */
const FAMILIES = ['grid', 'cylinder', 'torus', 'staircase', 'path', 'cycle', 'complete', 'bipartite', 'star', 'random-tree', 'gnp', 'mask', 'tree', 'upload'] as const;
const PAGE_SIZES = [25, 50, 100] as const;

export function RunsPage() {
  const me = useMe();
  const canRead = useCan('runs:read');
  if (me.isPending) return <Loading what="your account" />;
  if (!canRead) {
    return (
      <section className="space-y-3">
        <h1 className="font-display text-3xl font-semibold">Runs</h1>
        <p>
          <a className={linkClass} href={signInHref('/runs')}>
            Sign in
          </a>{' '}
          to see your runs and the public ones. The{' '}
          <Link className={linkClass} to="/atlas">
            atlas
          </Link>{' '}
          is open to everyone.
        </p>
      </section>
    );
  }
  return <RunsList />;
}

/**
 * The runs a member may see, newest first. Filters live in the address (so a filtered list can be
 * bookmarked) and go to the server; pages follow the server's cursors, kept on a stack for "Previous".
 */
export function RunsList() {
  const [params, setParams] = useSearchParams();
  const isAdmin = useCan('admin');
  const canWrite = useCan('runs:write');
  const statusParam = params.get('status');
  const status = RunStatus.safeParse(statusParam).success ? (statusParam as RunStatus) : undefined;
  const family = params.get('family') ?? undefined;
  const owner = params.get('owner') === 'me' ? 'me' : undefined;
  const limit = PAGE_SIZES.find((s) => String(s) === params.get('limit')) ?? 25;
  // cursors[i] opens page i + 1; the first page has none.
  const [cursors, setCursors] = useState<(string | undefined)[]>([undefined]);
  const cursor = cursors[cursors.length - 1];
  const list = useRunList({ status, family, owner, limit, cursor });
  const ids = { status: useId(), family: useId(), owner: useId(), limit: useId() };

  const setFilter = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
    setCursors([undefined]); // a new filter starts again at the newest run
  };

  const runs = list.data?.runs ?? [];
  const nextCursor = list.data?.nextCursor ?? null;
  const filtered = status !== undefined || family !== undefined || owner !== undefined;

  return (
    <section className="space-y-5">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="font-display text-3xl font-semibold">Runs</h1>
          <p className="text-sm text-lichen-700">{isAdmin ? 'Every run on this server, newest first.' : 'Your runs and the public ones, newest first.'}</p>
        </div>
        {canWrite && (
          <Link to="/runs/new" className={quietButtonClass}>
            New run
          </Link>
        )}
      </header>

      <form className="flex flex-wrap items-end gap-3" aria-label="Filter runs" onSubmit={(e) => e.preventDefault()}>
        <span>
          <label htmlFor={ids.status} className="block text-xs text-lichen-700">
            Status
          </label>
          <select id={ids.status} className={inputClass} value={status ?? ''} onChange={(e) => setFilter('status', e.target.value)}>
            <option value="">any</option>
            {RunStatus.options.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </span>
        <span>
          <label htmlFor={ids.family} className="block text-xs text-lichen-700">
            Family
          </label>
          <select id={ids.family} className={inputClass} value={family ?? ''} onChange={(e) => setFilter('family', e.target.value)}>
            <option value="">any</option>
            {FAMILIES.map((f) => (
              <option key={f} value={f}>
                {f}
              </option>
            ))}
          </select>
        </span>
        <span>
          <label htmlFor={ids.owner} className="block text-xs text-lichen-700">
            Whose
          </label>
          <select id={ids.owner} className={inputClass} value={owner ?? ''} onChange={(e) => setFilter('owner', e.target.value)}>
            <option value="">{isAdmin ? "everyone's" : 'mine and public'}</option>
            <option value="me">mine</option>
          </select>
        </span>
        <span>
          <label htmlFor={ids.limit} className="block text-xs text-lichen-700">
            Per page
          </label>
          <select id={ids.limit} className={inputClass} value={limit} onChange={(e) => setFilter('limit', e.target.value === '25' ? '' : e.target.value)}>
            {PAGE_SIZES.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </span>
      </form>

      <div aria-live="polite" aria-busy={list.isFetching}>
        {list.isPending && <Loading what="runs" />}
        {list.isError && <ErrorNote error={list.error} what="The runs could not be read" />}
        {list.isSuccess && runs.length === 0 && (
          <p className="rounded-md bg-stone-100 px-3 py-4 text-sm text-lichen-700" data-testid="runs-empty">
            {filtered ? 'No run matches these filters.' : 'No runs yet.'}{' '}
            {canWrite && (
              <Link className={linkClass} to="/runs/new">
                Start one
              </Link>
            )}
          </p>
        )}
      </div>
      {runs.length > 0 && <RunsTable runs={runs} showOwner={isAdmin || owner === undefined} />}

      {(cursors.length > 1 || nextCursor) && (
        <PagerNav
          label="Pages of runs"
          className="flex items-center gap-3 text-sm"
          buttonClassName={quietButtonClass}
          canPrevious={cursors.length > 1 && !list.isFetching}
          canNext={!!nextCursor && !list.isFetching}
          onPrevious={() => setCursors((s) => s.slice(0, -1))}
          onNext={() => nextCursor && setCursors((s) => [...s, nextCursor])}
        >
          <span>page {cursors.length}</span>
        </PagerNav>
      )}
    </section>
  );
}
