import type { RunShareResponse, RunView, Visibility } from '@cairn/schema';
import type { DataSource } from 'typeorm';
import type { ServerContext } from '../context';
import { HttpError } from '../http/errors';
import { notifyRunShared } from '../mail/notifications';
import type { MemberActor } from './graphs';
import { findOwnRun } from './run-access';
import { loadRunRow, queryRows, type RunRow } from './run-row';
import { newShareToken } from './run-share-token';
import { sharedRunUrl, toRunView } from './run-view';

/**
 * Sets who may see a run. `link` (and `public`) keep or make a share token; `private` drops it, so links
 * handed out before stop working.
 */
async function applyVisibility(source: DataSource, id: string, visibility: Visibility): Promise<RunRow> {
  await source.query(
    `UPDATE runs SET visibility = $2,
       share_token = CASE WHEN $2 = 'private' THEN NULL ELSE COALESCE(share_token, $3) END,
       updated_at = now()
     WHERE id = $1`,
    [id, visibility, newShareToken()],
  );
  return (await loadRunRow(source, id))!;
}

/** PATCH /api/v1/runs/:id { visibility } (owner or admin). */
export async function setRunVisibility(source: DataSource, actor: MemberActor, id: string, visibility: Visibility, publicUrl: string): Promise<RunView> {
  await findOwnRun(source, actor, id, 'change who sees it');
  return toRunView(await applyVisibility(source, id, visibility), publicUrl);
}

/**
 * POST /api/v1/runs/:id/share { email } (owner): the run becomes at least `link` (a public run stays
 * public) and the address gets "a run was shared with you" with the link. The mail is best effort: the
 * answer says whether it went out, and the link works either way.
 */
export async function shareRun(ctx: ServerContext, source: DataSource, actor: MemberActor, id: string, email: string): Promise<RunShareResponse> {
  const row = await findOwnRun(source, actor, id, 'share it', false);
  const shared = await applyVisibility(source, id, row.visibility === 'public' ? 'public' : 'link');
  if (!shared.share_token) throw new HttpError(500, 'internal', 'the share token was not stored');
  const url = sharedRunUrl(ctx.config.publicUrl, shared.share_token);
  const mailed = await notifyRunShared(ctx, shared, email, actor.user.login, url);
  return { run: toRunView(shared, ctx.config.publicUrl), url, mailed };
}

/** GET /api/v1/shared/:token: the run to anyone holding its link (404 once it is private again). */
export async function findSharedRun(source: DataSource, token: string): Promise<RunRow> {
  const [hit] = await queryRows<{ id: string }>(source, `SELECT id FROM runs WHERE share_token = $1 AND visibility <> 'private'`, [token]);
  const row = hit && (await loadRunRow(source, hit.id));
  if (!row) throw new HttpError(404, 'not_found', 'no run is shared under this link (it may have been made private)');
  return row;
}
