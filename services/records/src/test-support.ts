import type { Knex } from 'knex';
import { IDENTITY_HEADER, signIdentity, type Identity } from '../../common/src/internal-identity.js';
import { createApp } from './app.js';
import { migrateLatest, openDatabase } from './db/knex.js';
import { seedDemoData } from './seed/demo-seed.js';

export const TEST_INTERNAL_SECRET = 'records-test-secret';

/** A records app on a fresh in-memory database, migrated and optionally seeded with the demo data. */
export async function recordsTestApp(options: { seed?: boolean } = {}) {
  const db: Knex = openDatabase(':memory:');
  await migrateLatest(db);
  if (options.seed) await seedDemoData(db);
  const app = createApp({ db, internalSecret: TEST_INTERNAL_SECRET });
  return { app, db };
}

/** The header the gateway would add for a signed-in user of this role. */
export function asRole(role: Identity['role'], sub = '1'): Record<string, string> {
  return { [IDENTITY_HEADER]: signIdentity({ kind: 'user', sub, role, email: `${role}@example.test` }, TEST_INTERNAL_SECRET) };
}
