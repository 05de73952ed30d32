import fs from 'node:fs';
import path from 'node:path';
import knex, { type Knex } from 'knex';
import { migrationSource } from '../../../../migrations/index.js';

export type DatabaseKind = 'sqlite' | 'postgres';

export interface DatabaseOptions {
  /** Connection pool bounds; each driver has its own default when absent. */
  poolMin?: number | null;
  poolMax?: number | null;
  /** PostgreSQL only: the schema(s) unqualified names resolve to (tests use one schema each). */
  searchPath?: string[];
}

/** `postgres://…` or `postgresql://…` is PostgreSQL; `sqlite:path`, a plain path or `:memory:` is SQLite. */
export function databaseKind(target: string): DatabaseKind {
  return /^postgres(ql)?:\/\//i.test(target) ? 'postgres' : 'sqlite';
}

/** The SQLite file a target names (`sqlite:data/x.sqlite`, `sqlite:///abs/x.sqlite` or a plain path). */
export function sqliteFile(target: string): string {
  if (!target.startsWith('sqlite:')) return target;
  const rest = target.slice('sqlite:'.length);
  return rest.startsWith('//') ? rest.slice(2) : rest;
}

/**
 * Opens the records database through Knex: SQLite (WAL, foreign keys and a busy timeout on every
 * connection) or PostgreSQL, chosen by the target. The same migrations and queries run on both.
 */
export function openDatabase(target: string, options: DatabaseOptions = {}): Knex {
  return databaseKind(target) === 'postgres' ? openPostgres(target, options) : openSqlite(sqliteFile(target), options);
}

function openSqlite(file: string, options: DatabaseOptions): Knex {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(file), { recursive: true });
  return knex({
    client: 'better-sqlite3',
    connection: { filename: file },
    useNullAsDefault: true,
    pool: {
      // One connection: better-sqlite3 is synchronous, so a second connection waiting on SQLite's
      // write lock blocks the event loop that the first needs to commit (20 concurrent write
      // transactions on 4 connections: 19 failed with "database is locked"; on one: none).
      min: 1,
      max: 1,
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

// Type ids of PostgreSQL's bigint and numeric: count(*) and sum() answer them, and node-postgres
// hands them over as strings by default. The records never come near 2^53, so numbers they are, as on SQLite.
const PG_INT8 = 20;
const PG_NUMERIC = 1700;

interface PgConnection {
  setTypeParser: (oid: number, parse: (text: string) => unknown) => void;
}

function openPostgres(url: string, options: DatabaseOptions): Knex {
  return knex({
    client: 'pg',
    connection: url,
    ...(options.searchPath && { searchPath: options.searchPath }),
    pool: {
      min: options.poolMin ?? 0,
      max: options.poolMax ?? 10,
      afterCreate: (conn: PgConnection, done: (err: Error | null, conn: unknown) => void) => {
        conn.setTypeParser(PG_INT8, Number);
        conn.setTypeParser(PG_NUMERIC, Number);
        done(null, conn);
      },
    },
  });
}

export async function migrateLatest(db: Knex): Promise<string[]> {
  const [, applied] = (await db.migrate.latest({ migrationSource })) as [number, string[]];
  return applied;
}

/**
 * Inserts one row and answers its id. PostgreSQL tells a new id only through RETURNING (a bare
 * insert answers a row count there), and SQLite understands RETURNING too.
 */
export async function insertId(table: Knex.QueryBuilder, row: Record<string, unknown>): Promise<number> {
  const [inserted] = (await table.insert(row).returning('id')) as { id: number }[];
  return inserted!.id;
}

/** A unique index refused the row (SQLite and PostgreSQL word and code it differently). */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; message?: string };
  return e?.code === '23505' || e?.code === 'SQLITE_CONSTRAINT_UNIQUE' || /UNIQUE constraint failed/.test(String(e?.message));
}

export function nowIso(): string {
  return new Date().toISOString();
}
