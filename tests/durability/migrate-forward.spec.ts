import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrationSource } from '../../migrations/index.js';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { migrateLatest, openDatabase } from '../../services/records/src/db/knex.js';
import { tempDataDir } from './records-process.js';

/*
 * Migrations run forward on a copy of the demo database without loss. For every k below the
 * number of migrations: a database migrated to the first k, filled with the demo rows that fit its
 * schema (the tables and columns it has), then migrated to the latest, must hold the same rows with
 * the same values in those columns, pass integrity_check and have no dangling foreign key.
 * The list comes from migrations/index.ts, so a new migration is covered without touching this file.
 * A migration that reshapes data on purpose (renames, backfills) will fail here: state the expected
 * change in this test when you write one.
 */

const SKIP = /^(sqlite_|knex_migrations)/;

let dir = '';
let demoFile = '';
let names: string[] = [];

beforeAll(async () => {
  dir = tempDataDir('migrate');
  demoFile = path.join(dir, 'demo.sqlite');
  await prepareDatabase(demoFile, { seed: true });
  names = await migrationSource.getMigrations([]);
}, 120_000);

afterAll(() => {
  if (dir) fs.rmSync(dir, { recursive: true, force: true });
});

function tables(db: Database.Database): string[] {
  return (db.prepare("select name from sqlite_master where type = 'table' order by name").pluck().all() as string[]).filter((t) => !SKIP.test(t));
}

function columns(db: Database.Database, table: string): string[] {
  return (db.pragma(`table_info("${table}")`) as { name: string }[]).map((c) => c.name);
}

type Rows = Record<string, unknown>[];

/** Every row of the given columns, in a stable order that does not depend on rowids (a rebuilt table may renumber them). */
function rowsOf(db: Database.Database, table: string, cols: string[]): Rows {
  const list = cols.map((c) => `"${c}"`).join(', ');
  const rows = db.prepare(`select ${list} from "${table}"`).all() as Rows;
  return rows.map((r) => [JSON.stringify(r), r] as const).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([, r]) => r);
}

/** Copies the demo rows that fit the schema of `target`: its tables, the columns both have. */
function fillFromDemo(target: Database.Database, demo: Database.Database): Map<string, string[]> {
  const demoTables = new Set(tables(demo));
  const copied = new Map<string, string[]>();
  target.transaction(() => {
    // Checked once at commit, so tables can be filled in any order.
    target.pragma('defer_foreign_keys = ON');
    for (const table of tables(target)) {
      if (!demoTables.has(table)) continue;
      const demoCols = new Set(columns(demo, table));
      const cols = columns(target, table).filter((c) => demoCols.has(c));
      // Rows a migration itself wrote are in the demo copy too.
      target.prepare(`delete from "${table}"`).run();
      const insert = target.prepare(`insert into "${table}" (${cols.map((c) => `"${c}"`).join(', ')}) values (${cols.map(() => '?').join(', ')})`);
      for (const row of demo.prepare(`select ${cols.map((c) => `"${c}"`).join(', ')} from "${table}"`).raw().all() as unknown[][]) insert.run(...row);
      copied.set(table, cols);
    }
  })();
  return copied;
}

describe('migrations forward on a copy of the demo database', () => {
  it('lists more than one migration, and the demo database is at the latest', () => {
    expect(names.length).toBeGreaterThan(1);
    const demo = new Database(demoFile, { readonly: true });
    expect(demo.prepare('select name from knex_migrations order by id').pluck().all()).toEqual(names);
    demo.close();
  });

  it('keeps every row and value from each earlier schema through to the latest', async () => {
    const demo = new Database(demoFile, { readonly: true });
    try {
      for (let k = 1; k < names.length; k++) {
        const file = path.join(dir, `at-${k}.sqlite`);
        const knex = openDatabase(file);
        try {
          for (let i = 0; i < k; i++) await knex.migrate.up({ migrationSource });
        } finally {
          await knex.destroy();
        }

        const early = new Database(file);
        let copied: Map<string, string[]>;
        const before = new Map<string, Rows>();
        try {
          expect(early.prepare('select name from knex_migrations order by id').pluck().all(), `at ${names[k - 1]}`).toEqual(names.slice(0, k));
          copied = fillFromDemo(early, demo);
          for (const [table, cols] of copied) before.set(table, rowsOf(early, table, cols));
        } finally {
          early.close();
        }
        const filled = [...before.values()].reduce((n, rows) => n + rows.length, 0);
        expect(filled, `demo rows that fit after ${names[k - 1]}`).toBeGreaterThan(0);

        const latest = openDatabase(file);
        try {
          expect(await migrateLatest(latest)).toEqual(names.slice(k));
        } finally {
          await latest.destroy();
        }

        const after = new Database(file, { readonly: true });
        try {
          expect(after.pragma('integrity_check', { simple: true })).toBe('ok');
          expect(after.pragma('foreign_key_check'), `dangling references after migrating from ${names[k - 1]}`).toEqual([]);
          for (const [table, cols] of copied) {
            const rows = rowsOf(after, table, cols);
            const label = `${table}, migrated from ${names[k - 1]} to the latest`;
            expect(rows.length, label).toBe(before.get(table)!.length);
            expect(rows, label).toEqual(before.get(table));
          }
        } finally {
          after.close();
        }
      }
    } finally {
      demo.close();
    }
  }, 180_000);
});
