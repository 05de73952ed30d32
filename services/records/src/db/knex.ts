import fs from 'node:fs';
import path from 'node:path';
import knex, { type Knex } from 'knex';
import { migrationSource } from '../../../../migrations/index.js';

/** Opens the SQLite file through Knex with WAL, foreign keys and a busy timeout on every connection. */
export function openDatabase(file: string): Knex {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(file), { recursive: true });
  return knex({
    client: 'better-sqlite3',
    connection: { filename: file },
    useNullAsDefault: true,
    pool: {
      // A :memory: database lives in one connection; a file may have a few readers.
      min: 1,
      max: file === ':memory:' ? 1 : 4,
      afterCreate: (conn: { pragma: (s: string) => unknown }, done: (err: Error | null, conn: unknown) => void) => {
        try {
          conn.pragma('journal_mode = WAL');
          conn.pragma('foreign_keys = ON');
          conn.pragma('busy_timeout = 5000');
          done(null, conn);
        } catch (err) {
          done(err as Error, conn);
        }
      },
    },
  });
}

export async function migrateLatest(db: Knex): Promise<string[]> {
  const [, applied] = (await db.migrate.latest({ migrationSource })) as [number, string[]];
  return applied;
}

export function nowIso(): string {
  return new Date().toISOString();
}
