import type { DataSource } from 'typeorm';
import type { Logger } from '../logger';

/**
 * The server's handle on PostgreSQL. The server starts even while the database is away: every use
 * (re)connects on demand, so a database that comes back later is picked up without a restart.
 */
export class Database {
  private connecting: Promise<DataSource> | undefined;

  constructor(
    readonly source: DataSource,
    private readonly logger: Logger,
  ) {}

  /** The initialised data source; a failed attempt is forgotten so the next call tries again. */
  connect(): Promise<DataSource> {
    if (this.source.isInitialized) return Promise.resolve(this.source);
    this.connecting ??= this.source.initialize().catch((err: unknown) => {
      this.connecting = undefined;
      throw err;
    });
    return this.connecting;
  }

  /** Runs a real query; rejects with the reason when the database does not answer in time. */
  async ping(timeoutMs = 2000): Promise<void> {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs);
    });
    try {
      await Promise.race([this.connect().then((s) => s.query('SELECT 1')), timeout]);
    } finally {
      clearTimeout(timer);
    }
  }

  async runMigrations(): Promise<string[]> {
    const source = await this.connect();
    const applied = await source.runMigrations({ transaction: 'each' });
    for (const m of applied) this.logger.info({ migration: m.name }, 'migration applied');
    return applied.map((m) => m.name);
  }

  async close(): Promise<void> {
    if (this.source.isInitialized) await this.source.destroy();
  }
}
