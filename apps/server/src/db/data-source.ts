import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { User } from '../entities/user.entity';
import { CreateUsers1764633600000 } from '../migrations/1764633600000-create-users';

/** Entity and migration classes are listed by hand: the bundlers emit no decorator metadata and no globs. */
export const entities = [User];
export const migrations = [CreateUsers1764633600000];

export function createDataSource(databaseUrl: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url: databaseUrl,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    logging: false,
    // A database that does not answer must give a prompt error, not a request that hangs.
    extra: { connectionTimeoutMillis: 3000, max: 10 },
  });
}
