import { migrateLatest, openDatabase } from '../../services/records/src/db/knex.js';
import { seedDemoData } from '../../services/records/src/seed/demo-seed.js';

/** Runs pending migrations and, on an empty database, seeds the demo scenario. `target` is a SQLite file or a database URL. */
export async function prepareDatabase(target: string, options: { seed: boolean }): Promise<{ applied: string[]; seeded: boolean }> {
  const db = openDatabase(target);
  try {
    const applied = await migrateLatest(db);
    const seeded = options.seed ? await seedDemoData(db) : false;
    return { applied, seeded };
  } finally {
    await db.destroy();
  }
}
