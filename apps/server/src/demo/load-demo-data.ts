import type { DataSource } from 'typeorm';
import { demoIdentities } from '../dev/demo-identities';
import { User } from '../entities/user.entity';

/** Loads the invented demo members; running it again changes nothing (upsert on the GitHub id). */
export async function loadDemoData(source: DataSource): Promise<{ users: number }> {
  const rows = demoIdentities.map((i) => ({ githubId: String(i.githubId), login: i.login, displayName: i.name, email: i.email, role: i.role }));
  await source.getRepository(User).upsert(rows, { conflictPaths: ['githubId'], skipUpdateIfNoValuesChanged: true });
  return { users: rows.length };
}
