import crypto from 'node:crypto';
import type { Knex } from 'knex';
import { openDatabase } from './knex.js';

/**
 * Tests run on an in-memory SQLite database, or on the PostgreSQL server TEST_POSTGRES_URL names
 * (CI's second pass). Test code, so it reads the variable itself rather than through the config.
 */
export const TEST_POSTGRES_URL = process.env.TEST_POSTGRES_URL || '';

export interface TestDatabase {
  db: Knex;
  kind: 'sqlite' | 'postgres';
  /** Closes the connections and, on PostgreSQL, drops the test's schema. */
  dispose: () => Promise<void>;
}

/**
 * A fresh, empty database for one test app. On PostgreSQL each gets a schema of its own (the
 * search path points there), so test files running side by side never see each other's rows.
 */
export async function openTestDatabase(): Promise<TestDatabase> {
  if (!TEST_POSTGRES_URL) {
    const db = openDatabase(':memory:');
    return { db, kind: 'sqlite', dispose: () => db.destroy() };
  }
  const schema = `test_${process.pid}_${crypto.randomBytes(4).toString('hex')}`;
  const admin = openDatabase(TEST_POSTGRES_URL, { poolMin: 0, poolMax: 1 });
  try {
    await admin.raw('create schema ??', [schema]);
  } finally {
    await admin.destroy();
  }
  const db = openDatabase(TEST_POSTGRES_URL, { searchPath: [schema], poolMin: 0, poolMax: 4 });
  const dispose = async () => {
    await db.raw('drop schema ?? cascade', [schema]);
    await db.destroy();
  };
  return { db, kind: 'postgres', dispose };
}
