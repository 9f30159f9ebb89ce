import { useState } from 'react';
import { Link } from 'react-router';
import { useMe } from '../api/me';
import { SWEEP_PAGE_SIZE, useSweeps } from '../api/sweeps';
import { SweepForm } from '../components/sweep/SweepForm';
import { SweepProgress } from '../components/sweep/SweepProgress';
import { EmptyNote, ErrorNote, formatWhen, LoadingNote, PermissionNote } from '../components/sweep/states';
import { PagerNav } from '../components/table/Pager';

/** /sweeps: the member's sweeps (and those shared with them), and a form to start one. */
export function SweepsPage() {
  const me = useMe();
  if (me.isLoading) return <LoadingNote />;
  if (me.isError) return <ErrorNote error={me.error} what="check who is signed in" />;
  const can = me.data?.permissions ?? [];
  if (!can.includes('runs:read')) return <PermissionNote signedIn={!!me.data?.user} needs="sweeps" />;
  return (
    <section className="space-y-8">
      <header className="space-y-2">
        <h1 className="font-display text-3xl font-semibold">Sweeps</h1>
        <p className="max-w-2xl text-lichen-700">
          A sweep runs one family over a range of sizes and lays the answers out as a table and a chart — say, every grid from 1 × 1 to 6 × 12 for a table in a
          paper.
        </p>
      </header>
      {can.includes('runs:write') && <SweepForm />}
      <SweepList />
    </section>
  );
}

const SWEEP_COLUMNS = ['Name', 'Sizes', 'Progress', 'Method', 'Owner', 'Started'];

function SweepList() {
  const [offset, setOffset] = useState(0);
  const list = useSweeps(offset);
  if (list.isLoading) return <LoadingNote>Loading sweeps…</LoadingNote>;
  if (list.isError) return <ErrorNote error={list.error} what="load the sweeps" />;
  const sweeps = list.data?.sweeps ?? [];
  if (sweeps.length === 0 && offset === 0) return <EmptyNote>No sweeps yet. Start one above: pick a family and a range of rows and columns.</EmptyNote>;
  return (
    <section aria-labelledby="sweep-list-title" className="space-y-3">
      <h2 id="sweep-list-title" className="font-display text-xl font-semibold">
        Recent sweeps
      </h2>
      <div className="overflow-x-auto rounded-md border border-stone-200">
        <table className="w-full min-w-[40rem] text-left text-sm" data-testid="sweep-list">
          <thead className="bg-stone-100 text-xs uppercase tracking-wide text-lichen-700">
            <tr>
              {SWEEP_COLUMNS.map((name) => (
                <th key={name} scope="col" className="px-3 py-2">
                  {name}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {sweeps.map((s) => (
              <tr key={s.id} className="border-t border-stone-200 align-top">
                <td className="px-3 py-2">
                  <Link to={`/sweeps/${s.id}`} className="font-medium text-slate-ink underline decoration-lichen-300 underline-offset-2 hover:decoration-ochre-500">
                    {s.name}
                  </Link>
                </td>
                <td className="px-3 py-2 font-mono text-xs">
                  {s.family} {s.rows.from}–{s.rows.to} × {s.cols.from}–{s.cols.to}
                  <span className="block font-sans text-lichen-500">{s.cellCount} cells</span>
                </td>
                <td className="px-3 py-2">
                  <SweepProgress sweep={s} />
                </td>
                <td className="px-3 py-2">
                  {s.method}
                  {s.timeLimitSeconds !== null && <span className="block text-xs text-lichen-500">{s.timeLimitSeconds} s a run</span>}
                </td>
                <td className="px-3 py-2">{s.owner.login}</td>
                <td className="px-3 py-2 whitespace-nowrap">{formatWhen(s.createdAt)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <PagerNav
        label="Sweep pages"
        previousText="Newer"
        nextText="Older"
        canPrevious={offset > 0 && !list.isFetching}
        canNext={list.data?.nextOffset != null && !list.isFetching}
        onPrevious={() => setOffset(Math.max(0, offset - SWEEP_PAGE_SIZE))}
        onNext={() => list.data?.nextOffset != null && setOffset(list.data.nextOffset)}
      >
        <span className="text-sm text-lichen-700">
          {offset + 1}–{offset + sweeps.length}
        </span>
      </PagerNav>
    </section>
  );
}
