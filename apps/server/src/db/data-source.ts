import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ApiKey } from '../entities/api-key.entity';
import { AtlasEntry } from '../entities/atlas-entry.entity';
import { Run } from '../entities/run.entity';
import { StoredGraph } from '../entities/stored-graph.entity';
import { Sweep } from '../entities/sweep.entity';
import { User } from '../entities/user.entity';
import { CreateUsers1764633600000 } from '../migrations/1764633600000-create-users';
import { CreateRunsKeysGraphs1764720000000 } from '../migrations/1764720000000-create-runs-keys-graphs';
import { RunQueueColumns1764810000000 } from '../migrations/1764810000000-run-queue-columns';
import { ActiveRunsIndex1764900000000 } from '../migrations/1764900000000-active-runs-index';

/** Entity and migration classes are listed by hand: the bundlers emit no decorator metadata and no globs. */
export const entities = [User, ApiKey, StoredGraph, Run, Sweep, AtlasEntry];
export const migrations = [CreateUsers1764633600000, CreateRunsKeysGraphs1764720000000, RunQueueColumns1764810000000, ActiveRunsIndex1764900000000];

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
