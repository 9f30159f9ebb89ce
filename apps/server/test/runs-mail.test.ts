import type { RunShareResponse, RunView } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { startDevServices, type DevServices } from '../src/dev/dev-services';
import type { CaughtMail } from '../src/dev/mail-catcher';
import { createLogger } from '../src/logger';
import { createMailer, type Mailer } from '../src/mail/mailer';
import { notifyRunFinished } from '../src/mail/notifications';
import { api, startRunsHarness, waitForRun, type RunsHarness } from './runs-harness';
import { insertMemberWithKey } from './support/test-key';

// Run mail through real SMTP: the local mail catcher on loopback, the server's own mailer (nodemailer).
vi.setConfig({ testTimeout: 60_000, hookTimeout: 60_000 });

const PUBLIC_URL = 'http://127.0.0.1:4780';
let dev: DevServices;
let mailer: Mailer;
let h: RunsHarness;
let owner: { authorization: string; userId: string };
let quiet: { authorization: string; userId: string };

beforeAll(async () => {
  const logger = createLogger('silent');
  dev = await startDevServices('127.0.0.1', 0, 0, logger);
  mailer = createMailer({ host: '127.0.0.1', port: dev.smtpPort }, 'Cairn <cairn@cairn.invalid>', logger, { localCatcher: true });
  h = await startRunsHarness('runs_mail', { workers: true, mailer, env: { CAIRN_MAIL_AFTER_SECONDS: '0', CAIRN_PUBLIC_URL: PUBLIC_URL } });
  owner = await insertMemberWithKey(h.source, 'owner-mail', 'researcher');
  quiet = await insertMemberWithKey(h.source, 'quiet-mail', 'researcher');
  await h.source.query(`UPDATE users SET notify_on_finish = false WHERE id = $1`, [quiet.userId]);
});
afterAll(async () => {
  await h?.close();
  mailer?.close();
  await dev?.close();
});

/** The text body of a caught message, with quoted-printable soft breaks and escapes undone. */
function bodyOf(m: CaughtMail): string {
  const raw = m.raw.split(/\r?\n\r?\n/).slice(1).join('\n\n');
  return raw.replace(/=\r?\n/g, '').replace(/=([0-9A-F]{2})/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

async function mailTo(address: string, subject: string, timeoutMs = 10_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = dev.mail.messages().find((m) => m.to.includes(address) && m.subject === subject);
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail "${subject}" to ${address}; caught: ${JSON.stringify(dev.mail.messages().map((m) => [m.to, m.subject]))}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('run mail', () => {
  it('mails the owner when a run finishes, with the graph, the value and the link', async () => {
    const run = (await api<RunView>(h, 'POST', '/api/v1/runs', owner.authorization, { spec: 'path:10' })).body;
    await waitForRun(h, run.id, owner.authorization);
    const mail = await mailTo('owner-mail@members.example', 'Your run on path:10 has finished');
    const text = bodyOf(mail);
    expect(text).toContain('Your Cairn run on path:10 has finished after');
    // χr(P_10) = floor(log2 10) + 1 = 4 (Bodlaender et al., SIAM J. Discrete Math. 1998).
    expect(text).toMatch(/Rank number: 4 \(formula:/);
    expect(text).toContain(`${PUBLIC_URL}/runs/${run.id}`);
  });

  it('sends nothing to a member who turned the mail off, nor for a run shorter than the threshold', async () => {
    const quietRun = (await api<RunView>(h, 'POST', '/api/v1/runs', quiet.authorization, { spec: 'path:11' })).body;
    const loudRun = (await api<RunView>(h, 'POST', '/api/v1/runs', owner.authorization, { spec: 'path:12' })).body;
    await waitForRun(h, quietRun.id, quiet.authorization);
    await waitForRun(h, loudRun.id, owner.authorization);
    // The opted-in member's mail arrives (so mail was flowing), the other member's does not.
    await mailTo('owner-mail@members.example', 'Your run on path:12 has finished');
    expect(dev.mail.messages().filter((m) => m.to.includes('quiet-mail@members.example'))).toEqual([]);
    // With a threshold of an hour, a run of a few milliseconds sends nothing.
    const patient = { ...h.ctx, config: { ...h.ctx.config, mailAfterSeconds: 3600 } };
    expect(await notifyRunFinished(patient, h.source, loudRun.id)).toBe(false);
    expect(await notifyRunFinished(h.ctx, h.source, loudRun.id)).toBe(true);
  });

  it('mails "a run was shared with you" with a link that opens the run without signing in', async () => {
    const run = await waitForRun(h, (await api<RunView>(h, 'POST', '/api/v1/runs', owner.authorization, { spec: 'cycle:6' })).body.id, owner.authorization);
    const res = await api<RunShareResponse>(h, 'POST', `/api/v1/runs/${run.id}/share`, owner.authorization, { email: 'reader@elsewhere.example' });
    expect(res.status).toBe(200);
    expect(res.body.mailed).toBe(true);
    expect(res.body.run.visibility).toBe('link');
    expect(res.body.url).toMatch(new RegExp(`^${PUBLIC_URL}/shared/[A-Za-z0-9_-]{32}$`));
    const mail = await mailTo('reader@elsewhere.example', 'A run on cycle:6 was shared with you');
    const text = bodyOf(mail);
    expect(text).toContain('owner-mail shared a Cairn run with you: cycle:6.');
    expect(text).toContain(res.body.url);
    const token = res.body.url.split('/').pop()!;
    const shared = await api<RunView>(h, 'GET', `/api/v1/shared/${token}`);
    expect(shared.status).toBe(200);
    expect(shared.body.id).toBe(run.id);
    // Only the owner shares, and the address must be one.
    const other = await insertMemberWithKey(h.source, 'other-mail', 'admin');
    expect((await api(h, 'POST', `/api/v1/runs/${run.id}/share`, other.authorization, { email: 'x@elsewhere.example' })).status).toBe(403);
    const bad = await api<{ error: { message: string } }>(h, 'POST', `/api/v1/runs/${run.id}/share`, owner.authorization, { email: 'not an address' });
    expect(bad.body.error.message).toBe('body.email: email must be an e-mail address');
  });

  it('never fails a run when the mail cannot go out', async () => {
    // A mailer whose SMTP server is gone: sends fail (and are logged), nothing else does.
    const gone = await startDevServices('127.0.0.1', 0, 0, createLogger('silent'));
    const broken = createMailer({ host: '127.0.0.1', port: gone.smtpPort }, 'Cairn <cairn@cairn.invalid>', createLogger('silent'), { localCatcher: true });
    await gone.close();
    const working = h.ctx.mailer;
    h.ctx.mailer = broken;
    try {
      const run = await waitForRun(h, (await api<RunView>(h, 'POST', '/api/v1/runs', owner.authorization, { spec: 'path:13' })).body.id, owner.authorization);
      expect(run.status).toBe('done');
      const share = await api<RunShareResponse>(h, 'POST', `/api/v1/runs/${run.id}/share`, owner.authorization, { email: 'reader@elsewhere.example' });
      expect(share.status).toBe(200);
      expect(share.body).toMatchObject({ mailed: false, run: { visibility: 'link' } });
    } finally {
      h.ctx.mailer = working;
      broken.close();
    }
  });
});
