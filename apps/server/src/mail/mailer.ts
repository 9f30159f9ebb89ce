import nodemailer from 'nodemailer';
import type { Logger } from '../logger';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

/** Sends mail; a failure is logged and reported to the caller, never thrown into a request or a run. */
export interface Mailer {
  send(message: MailMessage): Promise<boolean>;
  close(): void;
}

/**
 * Mail through nodemailer over SMTP: the local catcher in development and the tests (whose built-in
 * certificate has expired, so TLS is not attempted there), a real relay in production.
 */
export function createMailer(smtp: { host: string; port: number }, from: string, logger: Logger, opts: { localCatcher: boolean }): Mailer {
  const transport = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: false,
    ignoreTLS: opts.localCatcher,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10_000,
  });
  return {
    async send(message) {
      try {
        await transport.sendMail({ from, ...message });
        logger.info({ to: message.to, subject: message.subject }, 'mail sent');
        return true;
      } catch (err) {
        logger.warn({ err, to: message.to, subject: message.subject }, 'mail could not be sent');
        return false;
      }
    },
    close: () => transport.close(),
  };
}
