import { SMTPServer } from 'smtp-server';
import type { Logger } from '../logger';
import { listen } from '../http/listen';

/** One message the catcher received, kept in memory for the developer and the tests to read. */
export interface CaughtMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  receivedAt: string;
  raw: string;
}

export interface MailCatcher {
  port: number;
  messages(): readonly CaughtMail[];
  close(): Promise<void>;
}

const KEEP = 500;

/** The value of one header of a raw message, with folded lines joined (RFC 5322 unfolding). */
function header(raw: string, name: string): string {
  const head = raw.split(/\r?\n\r?\n/, 1)[0] ?? '';
  const unfolded = head.replace(/\r?\n[ \t]+/g, ' ');
  const re = new RegExp(`^${name}:\\s*(.*)$`, 'im');
  return re.exec(unfolded)?.[1]?.trim() ?? '';
}

/**
 * A local SMTP server that accepts every message and keeps the newest ones in memory; it stands in for
 * the mail service in development and tests. No TLS: smtp-server's bundled certificate has expired.
 */
export async function startMailCatcher(host: string, port: number, logger: Logger): Promise<MailCatcher> {
  const caught: CaughtMail[] = [];
  let nextId = 1;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Cairn local mail catcher',
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const raw = Buffer.concat(chunks).toString('utf8');
        const mail: CaughtMail = {
          id: nextId++,
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: header(raw, 'Subject'),
          receivedAt: new Date().toISOString(),
          raw,
        };
        caught.push(mail);
        if (caught.length > KEEP) caught.shift();
        logger.info({ mail: { id: mail.id, to: mail.to, subject: mail.subject } }, 'mail caught');
        callback();
      });
    },
  });
  // smtp-server re-emits its socket's errors; a listener here keeps them from being thrown, and
  // listen() below turns a taken port into a PortTakenError.
  server.on('error', (err) => logger.warn({ err }, 'mail catcher error'));
  const bound = await listen(server.server, host, port, 'CAIRN_SMTP_PORT');
  return {
    port: bound,
    messages: () => caught,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
