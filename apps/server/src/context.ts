import type { Config } from './config';
import type { Database } from './db/database';
import type { Logger } from './logger';
import type { Mailer } from './mail/mailer';

/** What every router and service of the server works with, made once at start-up. */
export interface ServerContext {
  config: Config;
  db: Database;
  logger: Logger;
  mailer: Mailer;
}
