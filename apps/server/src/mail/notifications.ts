import type { DataSource } from 'typeorm';
import type { ServerContext } from '../context';
import { loadRunRow, type RunRow } from '../services/run-row';
import { specTextOf } from '../services/run-spec';
import { runFinishedMessage } from './messages/run-finished';
import { runSharedMessage } from './messages/run-shared';

const outcomeOf = (row: RunRow) => ({
  status: row.status,
  rankNumber: row.rank_number,
  lower: row.lower,
  upper: row.upper,
  provenance: row.provenance?.value ?? null,
  error: row.error,
});

/**
 * "Run finished" to the owner of a finished (or failed) run that took longer than mailAfterSeconds, if
 * they want such mail and have an address. Called after the result is stored; a failed send is
 * logged by the mailer and never touches the run. Returns whether a mail went out.
 */
export async function notifyRunFinished(ctx: ServerContext, source: DataSource, runId: string): Promise<boolean> {
  try {
    const row = await loadRunRow(source, runId);
    if (!row || (row.status !== 'done' && row.status !== 'failed') || !row.started_at || !row.finished_at) return false;
    const seconds = (new Date(row.finished_at).getTime() - new Date(row.started_at).getTime()) / 1000;
    const threshold = ctx.config.mailAfterSeconds;
    if (threshold > 0 && seconds <= threshold) return false; // 0 mails every run
    const [owner] = (await source.query(`SELECT email, notify_on_finish FROM users WHERE id = $1`, [row.owner_id])) as { email: string | null; notify_on_finish: boolean }[];
    if (!owner?.email || !owner.notify_on_finish) return false;
    return await ctx.mailer.send(
      runFinishedMessage({
        ...outcomeOf(row),
        to: owner.email,
        specText: specTextOf(row.spec),
        seconds,
        url: `${ctx.config.publicUrl}/runs/${row.id}`,
        mailAfterSeconds: ctx.config.mailAfterSeconds,
      }),
    );
  } catch (err) {
    ctx.logger.warn({ err, run: runId }, 'the run-finished mail could not be prepared');
    return false;
  }
}

/** "A run was shared with you", with the share link. Returns whether the mail went out. */
export function notifyRunShared(ctx: ServerContext, row: RunRow, to: string, sharedBy: string, url: string): Promise<boolean> {
  return ctx.mailer.send(runSharedMessage({ ...outcomeOf(row), to, specText: specTextOf(row.spec), sharedBy, url }));
}
