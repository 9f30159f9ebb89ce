import type { Config } from './config';
import type { Database } from './db/database';
import type { Logger } from './logger';
import type { Mailer } from './mail/mailer';

/** Where GitHub's OAuth web flow and user API answer: github.com, or the local fake provider. */
export interface SignInProvider {
  name: 'github' | 'local';
  clientID: string;
  clientSecret: string;
  authorizationURL: string;
  tokenURL: string;
  userProfileURL: string;
  userEmailURL: string;
}

/** What every router and service of the server works with, made once at start-up. */
export interface ServerContext {
  config: Config;
  db: Database;
  logger: Logger;
  mailer: Mailer;
  /** Undefined when neither GitHub credentials nor the local stand-ins are configured (no sign-in). */
  signIn: SignInProvider | undefined;
}
