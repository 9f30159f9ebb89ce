import { Role, type MemberRow } from '@cairn/schema';
import { createColumnHelper, getCoreRowModel, getFilteredRowModel, getPaginationRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { useChangeRole, useMembers } from '../../api/admin';
import { useMe } from '../../api/me';
import { EmptyNote, ErrorNote, formatWhen, inputClass, LoadingNote } from '../sweep/states';
import { DataTable } from '../table/DataTable';
import { Pager } from '../table/Pager';

const ROLE_WORDS: Record<Role, string> = {
  admin: 'admin — also manages members and keys',
  researcher: 'researcher — computes and shares',
  viewer: 'viewer — reads only',
};

const column = createColumnHelper<MemberRow>();

/** Every member with their role, which an admin changes in place; the server keeps at least one admin. */
export function MembersPanel() {
  const members = useMembers();
  const me = useMe();
  const change = useChangeRole();
  const [problem, setProblem] = useState<{ login: string; message: string } | null>(null);
  const [search, setSearch] = useState('');

  const columns = useMemo(
    () => [
      column.accessor('login', {
        header: 'Member',
        cell: ({ row }) => (
          <span>
            <span className="font-medium">{row.original.displayName ?? row.original.login}</span>
            <span className="block font-mono text-xs text-lichen-500">
              {row.original.login}
              {row.original.id === me.data?.user?.id ? ' (you)' : ''}
            </span>
          </span>
        ),
      }),
      column.accessor((m) => m.email ?? '', { id: 'email', header: 'E-mail', cell: (c) => c.getValue() || <span className="text-lichen-500">none</span> }),
      column.accessor('role', {
        header: 'Role',
        enableGlobalFilter: false,
        cell: ({ row }) => {
          const m = row.original;
          const busy = change.isPending && change.variables?.id === m.id;
          return (
            <>
              <label htmlFor={`role-${m.id}`} className="sr-only">
                Role of {m.login}
              </label>
              {/* Controlled by the server's answer: a refused change springs back to the stored role. */}
              <select
                id={`role-${m.id}`}
                className={`${inputClass} w-auto`}
                value={m.role}
                disabled={busy}
                onChange={(e) => {
                  setProblem(null);
                  change.mutate(
                    { id: m.id, role: e.target.value as Role },
                    { onError: (err) => setProblem({ login: m.login, message: err instanceof Error ? err.message : String(err) }) },
                  );
                }}
              >
                {Role.options.map((r) => (
                  <option key={r} value={r}>
                    {ROLE_WORDS[r]}
                  </option>
                ))}
              </select>
            </>
          );
        },
      }),
      column.accessor('createdAt', { header: 'Joined', enableGlobalFilter: false, cell: (c) => <span className="whitespace-nowrap">{formatWhen(c.getValue())}</span> }),
    ],
    [change, me.data?.user?.id],
  );

  const table = useReactTable({
    data: members.data?.users ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    state: { globalFilter: search },
    onGlobalFilterChange: setSearch,
    initialState: { pagination: { pageIndex: 0, pageSize: 20 } },
    getRowId: (m) => m.id,
  });

  if (members.isLoading) return <LoadingNote>Loading members…</LoadingNote>;
  if (members.isError) return <ErrorNote error={members.error} what="load the members" />;
  if ((members.data?.users.length ?? 0) === 0) return <EmptyNote>No members yet. People appear here after they first sign in.</EmptyNote>;

  return (
    <section className="space-y-3" aria-labelledby="members-title">
      <h2 id="members-title" className="font-display text-xl font-semibold">
        Members
      </h2>
      <div className="max-w-xs">
        <label htmlFor="members-search" className="mb-1 block text-sm">
          Find a member
        </label>
        <input id="members-search" type="search" className={inputClass} placeholder="login, name or e-mail" value={search} onChange={(e) => setSearch(e.target.value)} />
      </div>
      {problem && (
        <p role="alert" className="rounded-md border border-alarm-600/40 bg-alarm-600/5 px-3 py-2 text-sm text-alarm-600">
          {problem.login}&rsquo;s role stays as it was: {problem.message}
        </p>
      )}
      <DataTable
        table={table}
        testId="members-table"
        classes={{ table: 'w-full min-w-[36rem] text-left text-sm' }}
        empty={<EmptyNote>No member matches &ldquo;{search}&rdquo;.</EmptyNote>}
      />
      <Pager table={table} label="Member pages" />
    </section>
  );
}
