import { CaughtMailList } from '@cairn/schema';
import { Router } from 'express';
import type { AppContext } from '../app';
import { requirePermission } from '../auth/require';
import { HttpError } from '../http/errors';
import { documentRoute } from '../openapi/route-docs';

/** The plain-text body of a raw message: what follows the blank line after the headers. */
function textBody(raw: string): string {
  const at = raw.search(/\r?\n\r?\n/);
  const body = at < 0 ? '' : raw.slice(at).replace(/^\r?\n\r?\n/, '');
  // nodemailer sends plain text as quoted-printable when lines are long or not ASCII.
  if (/^content-transfer-encoding:\s*quoted-printable/im.test(raw.slice(0, at < 0 ? raw.length : at))) {
    const bytes = body.replace(/=\r?\n/g, '').replace(/=([0-9A-F]{2})/g, (_, h: string) => String.fromCharCode(parseInt(h, 16)));
    return Buffer.from(bytes, 'latin1').toString('utf8');
  }
  return body;
}

/** GET /api/v1/dev/mail: the local mail catcher's messages, for admins, while the local stand-ins run. */
export function devMailRouter(ctx: AppContext): Router {
  const router = Router();
  documentRoute({
    method: 'get',
    path: '/api/v1/dev/mail',
    tag: 'development',
    summary: "The local mail catcher's messages (only while the local stand-ins run)",
    needs: 'admin',
    response: CaughtMailList,
  });
  router.get('/dev/mail', requirePermission('admin'), (_req, res) => {
    if (!ctx.devMailbox) throw new HttpError(404, 'not_found', 'no local mail catcher runs here; mail goes to the configured SMTP service');
    const messages = [...ctx.devMailbox.messages()].reverse().map(({ raw, ...m }) => ({ ...m, text: textBody(raw) }));
    res.json({ messages });
  });
  return router;
}
