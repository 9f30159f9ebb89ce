import { useState } from 'react';
import { Link } from 'react-router';
import { useMe } from '../api/me';
import { SWEEP_PAGE_SIZE, useSweeps } from '../api/sweeps';
import { SweepForm } from '../components/sweep/SweepForm';
import { SweepProgress } from '../components/sweep/SweepProgress';
import { EmptyNote, ErrorNote, formatWhen, LoadingNote, PermissionNote, quietButtonClass } from '../components/sweep/states';

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
              <th scope="col" className="px-3 py-2">
                Name
              </th>
              <th scope="col" className="px-3 py-2">
                Sizes
              </th>
              <th scope="col" className="px-3 py-2">
                Progress
              </th>
              <th scope="col" className="px-3 py-2">
                Method
              </th>
              <th scope="col" className="px-3 py-2">
                Owner
              </th>
              <th scope="col" className="px-3 py-2">
                Started
              </th>
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
      <nav className="flex items-center gap-3" aria-label="Sweep pages">
        <button type="button" className={quietButtonClass} disabled={offset === 0 || list.isFetching} onClick={() => setOffset(Math.max(0, offset - SWEEP_PAGE_SIZE))}>
          Newer
        </button>
        <span className="text-sm text-lichen-700">
          {offset + 1}–{offset + sweeps.length}
        </span>
        <button
          type="button"
          className={quietButtonClass}
          disabled={list.data?.nextOffset === null || list.data?.nextOffset === undefined || list.isFetching}
          onClick={() => list.data?.nextOffset != null && setOffset(list.data.nextOffset)}
        >
          Older
        </button>
      </nav>
    </section>
  );
}
