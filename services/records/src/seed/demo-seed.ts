import type { Knex } from 'knex';
import { nowIso } from '../db/knex.js';
import { hashPassword } from '../users/passwords.js';
import { seedCollectionDemo } from './collection-demo.js';
import { seedOrdersDemo } from './orders-demo.js';
import { seedPlansDemo } from './plans-demo.js';
import { seedStockDemo } from './stock-demo.js';
import { DEMO_CUSTOMERS, DEMO_PASSWORD, DEMO_SHOP, DEMO_TUB_MODELS, DEMO_USERS, demoAnimals } from './demo-data.js';

const toRow = (o: Record<string, unknown>) =>
  Object.fromEntries(Object.entries(o).map(([k, v]) => [k.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`), v]));

/** Fills an empty database with the invented demo scenario; does nothing when users exist. */
export async function seedDemoData(db: Knex): Promise<boolean> {
  const existing = (await db('users').count({ n: '*' }).first()) as { n: number };
  if (Number(existing.n) > 0) return false;
  const now = nowIso();
  const stamp = { created_at: now, updated_at: now };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (trx) => {
    await trx('users').insert(DEMO_USERS.map((u) => ({ ...u, password_hash: passwordHash, active: true, ...stamp })));
    await trx('settings').insert({ key: 'shop', value_json: JSON.stringify(DEMO_SHOP), ...stamp });
    await trx('tub_models').insert(DEMO_TUB_MODELS.map((t) => ({ ...toRow(t), ...stamp })));
    await trx('animals').insert(demoAnimals().map((a) => ({ ...toRow(a), ...stamp })));
    await trx('customers').insert(DEMO_CUSTOMERS.map((c) => ({ notes: '', address: '', source: 'walk-in', ...toRow(c), ...stamp })));
  });
  // Each area seeds its own invented records on top of the people, tubs, animals and customers.
  await seedPlansDemo(db);
  await seedCollectionDemo(db);
  await seedOrdersDemo(db);
  await seedStockDemo(db);
  return true;
}
