import type { AppContext } from '../../src/app';
import { loadConfig } from '../../src/config';
import type { Database } from '../../src/db/database';
import { createLogger } from '../../src/logger';
import type { MailMessage, Mailer } from '../../src/mail/mailer';

/** A mailer that keeps what it is given, for tests that check which mail a change sends. */
export function recordingMailer(): Mailer & { sent: MailMessage[] } {
  const sent: MailMessage[] = [];
  return {
    sent,
    send: async (m) => {
      sent.push(m);
      return true;
    },
    close: () => {},
  };
}

/** The context of an app under test: the given database, silent logs, no run workers unless given. */
export function testContext(db: Database, overrides: Partial<AppContext> = {}, env: Record<string, string> = {}): AppContext {
  return {
    config: loadConfig({ CAIRN_PORT: '0', CAIRN_DEV_PORT: '0', CAIRN_SMTP_PORT: '0', CAIRN_LOG_LEVEL: 'silent', ...env }),
    db,
    logger: createLogger('silent'),
    mailer: recordingMailer(),
    signIn: undefined,
    jobs: { close: async () => {} },
    ...overrides,
  };
}
