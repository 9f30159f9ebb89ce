import type { ApiKeyInfo } from '@cairn/schema';
import { createColumnHelper, getCoreRowModel, getFilteredRowModel, getPaginationRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { useApiKeys, useRevokeKey } from '../../api/admin';
import { EmptyNote, ErrorNote, formatWhen, LoadingNote, quietButtonClass } from '../sweep/states';
import { KeyCreateForm } from './KeyCreateForm';
import { DataTable } from '../table/DataTable';
import { Pager } from '../table/Pager';

const column = createColumnHelper<ApiKeyInfo>();

/** API keys: make one, list them all by prefix, revoke after saying so twice. */
export function KeysPanel() {
  const keys = useApiKeys();
  const revoke = useRevokeKey();
  const [confirming, setConfirming] = useState<ApiKeyInfo | null>(null);
  const [hideRevoked, setHideRevoked] = useState(false);

  const data = useMemo(() => (keys.data?.keys ?? []).filter((k) => !hideRevoked || k.revokedAt === null), [keys.data, hideRevoked]);
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name', cell: (c) => <span className="font-medium">{c.getValue()}</span> }),
      column.accessor('prefix', { header: 'Prefix', cell: (c) => <span className="font-mono text-xs">{c.getValue()}…</span> }),
      column.accessor((k) => k.owner.login, { id: 'owner', header: 'Owner' }),
      column.accessor('scopes', {
        header: 'Scopes',
        cell: (c) => (
          <span className="flex flex-wrap gap-1">
            {c.getValue().map((s) => (
              <span key={s} className="rounded bg-stone-200 px-1.5 py-0.5 font-mono text-[11px]">
                {s}
              </span>
            ))}
          </span>
        ),
      }),
      column.accessor('createdAt', { header: 'Created', cell: (c) => <span className="whitespace-nowrap text-xs">{formatWhen(c.getValue())}</span> }),
      column.accessor('lastUsedAt', { header: 'Last used', cell: (c) => <span className="whitespace-nowrap text-xs">{c.getValue() ? formatWhen(c.getValue()) : 'never'}</span> }),
      column.display({
        id: 'state',
        header: 'State',
        cell: ({ row }) =>
          row.original.revokedAt ? (
            <span className="whitespace-nowrap text-xs text-alarm-600">revoked {formatWhen(row.original.revokedAt)}</span>
          ) : (
            <button
              type="button"
              className="rounded-md border border-alarm-600/50 px-2 py-1 text-xs text-alarm-600 hover:bg-alarm-600/10 focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500"
              onClick={() => {
                revoke.reset();
                setConfirming(row.original);
              }}
              aria-label={`Revoke ${row.original.name} (${row.original.prefix})`}
            >
              Revoke
            </button>
          ),
      }),
    ],
    [revoke],
  );
  const table = useReactTable({
    data,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageIndex: 0, pageSize: 20 } },
    getRowId: (k) => k.id,
  });

  return (
    <section className="space-y-6" aria-labelledby="keys-title">
      <h2 id="keys-title" className="font-display text-xl font-semibold">
        API keys
      </h2>
      <p className="max-w-2xl text-sm text-lichen-700">
        Scripts send a key as <code className="font-mono text-xs">Authorization: Bearer cairn_…</code>. A key acts for one member, within the scopes ticked here.
      </p>
      <KeyCreateForm />

      {confirming && (
        <div role="alertdialog" aria-labelledby="revoke-title" aria-describedby="revoke-body" className="space-y-3 rounded-lg border-2 border-alarm-600/60 bg-stone-50 p-4" data-testid="revoke-confirm">
          <h3 id="revoke-title" className="font-display text-lg font-semibold">
            Revoke &ldquo;{confirming.name}&rdquo;?
          </h3>
          <p id="revoke-body" className="text-sm">
            Key <span className="font-mono">{confirming.prefix}…</span> of {confirming.owner.login} stops working at once; scripts using it are refused. This cannot be undone.
          </p>
          {revoke.isError && <ErrorNote error={revoke.error} what="revoke the key" />}
          <div className="flex gap-3">
            <button
              type="button"
              className="inline-flex items-center justify-center rounded-md bg-alarm-600 px-3 py-1.5 text-sm font-medium text-stone-50 hover:bg-alarm-600/85 focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500 disabled:opacity-50"
              disabled={revoke.isPending}
              onClick={() => revoke.mutate(confirming.id, { onSuccess: () => setConfirming(null) })}
            >
              {revoke.isPending ? 'Revoking…' : 'Revoke key'}
            </button>
            <button type="button" className={quietButtonClass} autoFocus onClick={() => setConfirming(null)}>
              Keep it
            </button>
          </div>
        </div>
      )}

      {keys.isLoading ? (
        <LoadingNote>Loading keys…</LoadingNote>
      ) : keys.isError ? (
        <ErrorNote error={keys.error} what="load the keys" />
      ) : (keys.data?.keys.length ?? 0) === 0 ? (
        <EmptyNote>No API keys yet. Make one above for a member whose scripts talk to Cairn.</EmptyNote>
      ) : (
        <div className="space-y-3">
          <label className="inline-flex items-center gap-2 text-sm">
            <input type="checkbox" checked={hideRevoked} onChange={(e) => setHideRevoked(e.target.checked)} /> hide revoked keys
          </label>
          <DataTable
            table={table}
            testId="keys-table"
            classes={{ table: 'w-full min-w-[48rem] text-left text-sm' }}
            rowClass={(row) => (row.original.revokedAt ? 'text-lichen-500' : '')}
            rowTestId="key-row"
          />
          <Pager table={table} label="Key pages" />
        </div>
      )}
    </section>
  );
}
