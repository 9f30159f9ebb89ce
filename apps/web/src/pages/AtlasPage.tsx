import { useSearchParams } from 'react-router';
import { MATRIX_MAX_SIDE, useAtlasMatrix } from '../api/atlas';
import { AtlasMatrix } from '../components/atlas/AtlasMatrix';
import { AtlasTable } from '../components/atlas/AtlasTable';
import { ATLAS_FAMILIES, isMatrixFamily } from '../components/atlas/entries';
import { EmptyNote, ErrorNote, inputClass, LoadingNote } from '../components/sweep/states';

/**
 * /atlas, open to everyone: the best Cairn knows of each graph. Grids, cylinders and tori are drawn as a
 * matrix of sizes; every family has the table. The family and the view live in the address, so a link to
 * "the torus table" stays one.
 */
export function AtlasPage() {
  const [params, setParams] = useSearchParams();
  const family = params.get('family') ?? 'grid';
  const matrixFamily = isMatrixFamily(family);
  const view = matrixFamily && params.get('view') !== 'table' ? 'matrix' : 'table';
  const set = (key: string, value: string | null) =>
    setParams(
      (p) => {
        const next = new URLSearchParams(p);
        if (value === null) next.delete(key);
        else next.set(key, value);
        return next;
      },
      { replace: true },
    );

  return (
    <section className="space-y-6">
      <header className="space-y-2">
        <h1 className="font-display text-3xl font-semibold">Atlas</h1>
        <p className="max-w-2xl text-lichen-700">
          Every rank number Cairn has established, with how each side is known and the runs that prove it. The darker a cell, the tighter its value is pinned down.
        </p>
      </header>
      <div className="flex flex-wrap items-end gap-4">
        <div>
          <label htmlFor="atlas-family" className="mb-1 block text-sm font-medium">
            Family
          </label>
          <select id="atlas-family" className={`${inputClass} w-48`} value={family} onChange={(e) => set('family', e.target.value)}>
            {ATLAS_FAMILIES.map((f) => (
              <option key={f} value={f}>
                {f}
                {isMatrixFamily(f) ? '' : ' (table)'}
              </option>
            ))}
            <option value="all">all families (table)</option>
          </select>
        </div>
        {matrixFamily && (
          <div role="radiogroup" aria-label="View" className="inline-flex overflow-hidden rounded-md border border-stone-200">
            {(['matrix', 'table'] as const).map((v) => (
              <button
                key={v}
                type="button"
                role="radio"
                aria-checked={view === v}
                onClick={() => set('view', v === 'matrix' ? null : 'table')}
                className={`px-3 py-1.5 text-sm ${view === v ? 'bg-slate-ink text-stone-50' : 'bg-stone-50 text-slate-ink hover:bg-stone-100'}`}
              >
                {v === 'matrix' ? 'Matrix' : 'Table'}
              </button>
            ))}
          </div>
        )}
      </div>
      {view === 'matrix' ? <MatrixView family={family} /> : <AtlasTable key={family} family={family === 'all' ? undefined : family} />}
    </section>
  );
}

function MatrixView({ family }: { family: string }) {
  const query = useAtlasMatrix(family);
  if (query.isLoading) return <LoadingNote>Loading the {family} atlas…</LoadingNote>;
  if (query.isError) return <ErrorNote error={query.error} what="load the atlas" />;
  const { entries, total } = query.data!;
  if (entries.length === 0) return <EmptyNote>No {family} values are in the atlas yet. A run or a sweep of this family puts them here.</EmptyNote>;
  return (
    <div className="space-y-2">
      <p className="text-sm text-lichen-500">
        Sizes up to {MATRIX_MAX_SIDE} × {MATRIX_MAX_SIDE}
        {total > entries.length ? ` (the first ${entries.length} of ${total} entries)` : ''}; larger graphs are in the table.
      </p>
      <AtlasMatrix family={family} entries={entries} />
    </div>
  );
}
