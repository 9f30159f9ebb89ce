import type { DataSource } from 'typeorm';
import { demoIdentities } from '../dev/demo-identities';
import { ApiKey } from '../entities/api-key.entity';
import { User } from '../entities/user.entity';
import { hashKeySecret, KEY_PREFIX_LENGTH } from '../services/api-keys';
import { DEMO_API_KEY, DEMO_API_KEY_OWNER } from './demo-key';

/**
 * Loads the invented demo members and the demo researcher's API key; running it again changes nothing
 * (upsert on the GitHub id; the key is found by its hash).
 */
export async function loadDemoData(source: DataSource): Promise<{ users: number; apiKey: string }> {
  const rows = demoIdentities.map((i) => ({ githubId: String(i.githubId), login: i.login, displayName: i.name, email: i.email, role: i.role }));
  await source.getRepository(User).upsert(rows, { conflictPaths: ['githubId'], skipUpdateIfNoValuesChanged: true });
  const owner = await source.getRepository(User).findOneByOrFail({ login: DEMO_API_KEY_OWNER });
  const keys = source.getRepository(ApiKey);
  const secretHash = hashKeySecret(DEMO_API_KEY);
  if (!(await keys.existsBy({ secretHash }))) {
    await keys.insert({
      userId: owner.id,
      name: 'demo key (README examples)',
      prefix: DEMO_API_KEY.slice(0, KEY_PREFIX_LENGTH),
      secretHash,
      scopes: ['runs:read', 'runs:write', 'atlas:read'],
      createdBy: null,
    });
  }
  return { users: rows.length, apiKey: DEMO_API_KEY };
}
