import type { RunStatus } from '@cairn/schema';
import { STATUS_WORDS } from './words';

const STATUS_TONE: Record<RunStatus, string> = {
  queued: 'bg-stone-200 text-slate-ink',
  running: 'bg-ochre-500 text-slate-ink',
  done: 'bg-lichen-700 text-stone-50',
  failed: 'bg-alarm-600 text-stone-50',
  cancelled: 'bg-stone-100 text-lichen-700 ring-1 ring-stone-200',
};

/** A run's status as a pill, the status word and what it means. */
export function StatusBadge({ status }: { status: RunStatus }) {
  return (
    <span className={`inline-flex items-center rounded-full px-2 py-0.5 text-xs font-medium ${STATUS_TONE[status]}`} title={STATUS_WORDS[status]} data-testid="run-status">
      {status}
    </span>
  );
}

/** An error from the server, in its own words. */
export function ErrorNote({ error, what }: { error: unknown; what?: string }) {
  const message = error instanceof Error ? error.message : String(error);
  return (
    <p role="alert" className="rounded-md border border-alarm-600/40 bg-alarm-600/10 px-3 py-2 text-sm text-alarm-600">
      {what ? `${what}: ` : ''}
      {message}
    </p>
  );
}

export function Loading({ what }: { what: string }) {
  return (
    <p className="text-sm text-lichen-500" role="status">
      Loading {what}…
    </p>
  );
}

export const inputClass =
  'block w-full rounded-md border border-stone-200 bg-white px-2 py-1.5 text-sm focus:border-lichen-500 focus:outline-none focus:ring-2 focus:ring-lichen-300 aria-[invalid=true]:border-alarm-600';
export const buttonClass =
  'inline-flex items-center justify-center gap-1 rounded-md bg-slate-ink px-3 py-1.5 text-sm font-medium text-stone-50 hover:bg-lichen-700 focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500 disabled:cursor-not-allowed disabled:opacity-50';
export const quietButtonClass =
  'inline-flex items-center justify-center gap-1 rounded-md border border-stone-200 bg-stone-50 px-3 py-1.5 text-sm hover:bg-stone-100 focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500 disabled:cursor-not-allowed disabled:opacity-50';
export const linkClass = 'text-ochre-700 underline underline-offset-2 hover:text-slate-ink';
