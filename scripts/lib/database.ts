import { migrateLatest, openDatabase } from '../../services/records/src/db/knex.js';
import { seedDemoData } from '../../services/records/src/seed/demo-seed.js';

/** Runs pending migrations and, on an empty database, seeds the demo scenario. */
export async function prepareDatabase(file: string, options: { seed: boolean }): Promise<{ applied: string[]; seeded: boolean }> {
  const db = openDatabase(file);
  try {
    const applied = await migrateLatest(db);
    const seeded = options.seed ? await seedDemoData(db) : false;
    return { applied, seeded };
  } finally {
    await db.destroy();
  }
}
