import { createServer } from 'node:http';
import { createApp } from './app';
import type { Config } from './config';
import { createDataSource } from './db/data-source';
import { Database } from './db/database';
import { startDevServices, type DevServices } from './dev/dev-services';
import { closeServer, listen } from './http/listen';
import type { Logger } from './logger';
import { defaultWebDist } from './web-dist';

export interface RunningServer {
  url: string;
  db: Database;
  dev: DevServices | undefined;
  close(): Promise<void>;
}

/** Starts the API (and the local stand-ins when configured); the database may still be away. */
export async function startServer(config: Config, logger: Logger): Promise<RunningServer> {
  const db = new Database(createDataSource(config.databaseUrl), logger);
  const dev = config.devServices ? await startDevServices(config.host, config.devPort, config.smtpPort, logger) : undefined;
  const app = createApp({ db, logger, webDist: config.webDist ?? defaultWebDist() });
  const server = createServer(app);
  let port: number;
  try {
    port = await listen(server, config.host, config.port, 'CAIRN_PORT');
  } catch (err) {
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
      await dev?.close();
      await db.close();
    },
  };
}
