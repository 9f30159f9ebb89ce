import type { ReactNode } from 'react';
import { useLocation } from 'react-router';
import { signInHref } from '../../api/me';

// The loading, empty, error and sign-in notes shared by the sweep, atlas, verify and admin pages.

export function LoadingNote({ children = 'Loading…' }: { children?: ReactNode }) {
  return (
    <p role="status" className="text-lichen-500">
      {children}
    </p>
  );
}

/** The server's own sentence when it sent one (fetchJson puts it in the message). */
export function ErrorNote({ error, what }: { error: unknown; what: string }) {
  const message = error instanceof Error ? error.message : String(error);
  return (
    <p role="alert" className="rounded-md border border-alarm-600/40 bg-alarm-600/5 px-3 py-2 text-sm text-alarm-600">
      Could not {what}: {message}
    </p>
  );
}

export function EmptyNote({ children }: { children: ReactNode }) {
  return <p className="rounded-md border border-dashed border-stone-200 px-4 py-6 text-center text-lichen-700">{children}</p>;
}

/** For a page that needs a permission the visitor does not hold: sign in, or ask for the right role. */
export function PermissionNote({ signedIn, needs }: { signedIn: boolean; needs: string }) {
  const location = useLocation();
  return (
    <div className="space-y-3 rounded-md border border-stone-200 bg-stone-100/60 px-4 py-5">
      <p className="text-slate-ink">{signedIn ? `Your role does not allow ${needs}; an admin can change it.` : `Sign in to see ${needs}.`}</p>
      {!signedIn && (
        <a className="inline-block rounded-md bg-slate-ink px-3 py-1.5 text-sm font-medium text-stone-50 hover:bg-lichen-700" href={signInHref(location.pathname + location.search)}>
          Sign in
        </a>
      )}
    </div>
  );
}

export const inputClass =
  'w-full rounded-md border border-stone-200 bg-white/70 px-2 py-1.5 text-sm text-slate-ink focus:border-lichen-500 focus:outline-none focus:ring-2 focus:ring-lichen-300 aria-[invalid=true]:border-alarm-600';
export const buttonClass =
  'inline-flex items-center justify-center rounded-md bg-slate-ink px-3 py-1.5 text-sm font-medium text-stone-50 hover:bg-lichen-700 focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500 disabled:cursor-not-allowed disabled:opacity-50';
export const quietButtonClass =
  'inline-flex items-center justify-center rounded-md border border-stone-200 px-3 py-1.5 text-sm text-slate-ink hover:bg-stone-100 focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500 disabled:cursor-not-allowed disabled:opacity-50';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
export const formatWhen = (iso: string | null | undefined) => (iso ? dateFormat.format(new Date(iso)) : '—');

/** Server field problems name body fields (`body.rows.to`); forms name them without the prefix. */
export const formFieldOf = (field: string) => field.replace(/^(body|query)\./, '');
