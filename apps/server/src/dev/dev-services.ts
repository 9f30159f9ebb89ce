import { createServer } from 'node:http';
import express from 'express';
import type { Logger } from '../logger';
import { closeServer, listen } from '../http/listen';
import { demoIdentities } from './demo-identities';
import { createFakeGithub } from './fake-github';
import { startMailCatcher, type MailCatcher } from './mail-catcher';

export const LOCAL_CLIENT_ID = 'cairn-local';
export const LOCAL_CLIENT_SECRET = 'cairn-local-secret';

export interface DevServices {
  /** Where the fake GitHub and the mailbox answer, e.g. http://127.0.0.1:4781 */
  url: string;
  smtpPort: number;
  mail: MailCatcher;
  close(): Promise<void>;
}

/**
 * The local stand-ins for hosted services: a fake GitHub sign-in provider and a mail catcher with a
 * mailbox to read (GET /mail). Both listen on loopback only.
 */
export async function startDevServices(host: string, httpPort: number, smtpPort: number, logger: Logger): Promise<DevServices> {
  const mail = await startMailCatcher(host, smtpPort, logger);
  const app = express();
  app.disable('x-powered-by');
  app.get('/mail', (_req, res) => {
    res.json(mail.messages().map(({ raw: _raw, ...summary }) => summary));
  });
  app.get('/mail/:id', (req, res) => {
    const found = mail.messages().find((m) => String(m.id) === req.params.id);
    if (!found) return res.status(404).json({ error: { code: 'not_found', message: `no caught mail ${req.params.id}` } });
    res.type('message/rfc822').send(found.raw);
  });
  app.use(createFakeGithub({ identities: demoIdentities, clientId: LOCAL_CLIENT_ID, clientSecret: LOCAL_CLIENT_SECRET }));
  const server = createServer(app);
  let port: number;
  try {
    port = await listen(server, host, httpPort, 'CAIRN_DEV_PORT');
  } catch (err) {
    await mail.close();
    throw err;
  }
  return {
    url: `http://${host}:${port}`,
    smtpPort: mail.port,
    mail,
    close: async () => {
      await closeServer(server);
      await mail.close();
    },
  };
}
