import { createServer } from 'node:http';
import { createApp } from './app';
import { closeAuth } from './auth/install-auth';
import { signInProvider } from './auth/sign-in-provider';
import type { Config } from './config';
import type { ServerContext } from './context';
import { createDataSource } from './db/data-source';
import { Database } from './db/database';
import { startDevServices, type DevServices } from './dev/dev-services';
import { closeServer, listen } from './http/listen';
import { startJobs } from './jobs/jobs';
import type { Logger } from './logger';
import { createMailer } from './mail/mailer';
import { defaultWebDist } from './web-dist';

export interface RunningServer {
  url: string;
  db: Database;
  dev: DevServices | undefined;
  close(): Promise<void>;
}

/** Starts the API, its run workers (when configured) and the local stand-ins; the database may still be away. */
export async function startServer(config: Config, logger: Logger): Promise<RunningServer> {
  const db = new Database(createDataSource(config.databaseUrl), logger);
  const dev = config.devServices ? await startDevServices(config.host, config.devPort, config.smtpPort, logger) : undefined;
  const smtp = dev ? { host: config.host, port: dev.smtpPort } : config.smtp;
  const mailer = createMailer(smtp, config.mailFrom, logger, { localCatcher: Boolean(dev) });
  const ctx: ServerContext = { config, db, logger, mailer, signIn: signInProvider(config, dev?.url) };
  // The run queue (and ctx.config.runConcurrency run workers); it waits for the database if that is away.
  const jobs = startJobs(ctx);
  const app = createApp({ ...ctx, jobs, devMailbox: dev?.mail, webDist: config.webDist ?? defaultWebDist() });
  const server = createServer(app);
  let port: number;
  try {
    port = await listen(server, config.host, config.port, 'CAIRN_PORT');
  } catch (err) {
    await closeAuth(app);
    await jobs.close();
    mailer.close();
    await dev?.close();
    throw err;
  }
  db.connect().catch((err: unknown) => logger.warn({ err }, 'database not reachable yet; will retry on use'));
  return {
    url: `http://${config.host}:${port}`,
    db,
    dev,
    close: async () => {
      await closeServer(server);
      await closeAuth(app);
      await jobs.close();
      mailer.close();
      await dev?.close();
      await db.close();
    },
  };
}
