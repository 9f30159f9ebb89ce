import { SweepIdParams } from '@cairn/schema';
import { lazy, Suspense } from 'react';
import { Link, useParams } from 'react-router';
import { sweepExportHref, sweepIsActive, useSweep } from '../api/sweeps';
import { SweepProgress } from '../components/sweep/SweepProgress';
import { SweepTable } from '../components/sweep/SweepTable';
import { EmptyNote, ErrorNote, formatWhen, LoadingNote, quietButtonClass } from '../components/sweep/states';

// The chart pulls in recharts (about 100 KB gzipped): it loads after the table, in a chunk of its own.
const SweepChart = lazy(() => import('../components/sweep/SweepChart'));

/** /sweeps/:id: the table of cells filling in live, the chart, and the CSV export. */
export function SweepPage() {
  const params = SweepIdParams.safeParse(useParams());
  if (!params.success) return <ErrorNote error={new Error(params.error.issues[0]?.message ?? 'not a sweep id')} what="open this sweep" />;
  return <SweepDetail id={params.data.id} />;
}

function SweepDetail({ id }: { id: string }) {
  const query = useSweep(id);
  if (query.isLoading) return <LoadingNote>Loading the sweep…</LoadingNote>;
  if (query.isError) return <ErrorNote error={query.error} what="load this sweep" />;
  const view = query.data!;
  const { sweep } = view;
  const active = sweepIsActive(view);
  return (
    <article className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to="/sweeps" className="text-lichen-700 underline underline-offset-2">
          Sweeps
        </Link>
      </nav>
      <header className="flex flex-wrap items-start justify-between gap-4">
        <div className="space-y-1">
          <h1 className="font-display text-3xl font-semibold">{sweep.name}</h1>
          <p className="text-sm text-lichen-700">
            <span className="font-mono">
              {sweep.family} {sweep.rows.from}–{sweep.rows.to} × {sweep.cols.from}–{sweep.cols.to}
            </span>{' '}
            · {sweep.cellCount} cells, {sweep.runCount} runs · method {sweep.method}
            {sweep.timeLimitSeconds !== null ? `, ${sweep.timeLimitSeconds} s a run` : ''} · {sweep.visibility} · by {sweep.owner.login}, {formatWhen(sweep.createdAt)}
          </p>
        </div>
        <a href={sweepExportHref(sweep.id)} className={quietButtonClass} download>
          Download CSV
        </a>
      </header>
      <div className="flex flex-wrap items-center gap-4">
        <SweepProgress sweep={sweep} live />
        <p className="text-xs text-lichen-500" aria-live="polite">
          {active ? 'Cells fill in as their runs finish (checked every 2 s).' : 'Every run has finished.'}
        </p>
      </div>
      {view.cells.length === 0 ? (
        <EmptyNote>This sweep has no cells yet; they appear once its runs are queued.</EmptyNote>
      ) : (
        <>
          <section aria-labelledby="sweep-table-title" className="space-y-2">
            <h2 id="sweep-table-title" className="font-display text-xl font-semibold">
              Table
            </h2>
            <SweepTable view={view} />
          </section>
          <section aria-labelledby="sweep-chart-title" className="space-y-2">
            <h2 id="sweep-chart-title" className="font-display text-xl font-semibold">
              Chart
            </h2>
            <Suspense fallback={<LoadingNote>Drawing the chart…</LoadingNote>}>
              <SweepChart view={view} />
            </Suspense>
          </section>
        </>
      )}
    </article>
  );
}
