import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoData } from '../seed/demo-seed.js';
import { copyDatabase, dependencyOrder, listTables } from './copy-database.js';
import { insertId, migrateLatest, nowIso, openDatabase } from './knex.js';
import { openTestDatabase, type TestDatabase } from './test-database.js';

// The target is PostgreSQL on CI's second pass (TEST_POSTGRES_URL), in-memory SQLite otherwise.
let source: Knex;
let target: TestDatabase;
let back: Knex;
let report: Awaited<ReturnType<typeof copyDatabase>>;

async function counts(db: Knex): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of await listTables(db)) out[table] = Number(((await db(table).count({ n: '*' }).first()) as { n: number }).n);
  return out;
}

async function allRows(db: Knex, table: string): Promise<unknown[]> {
  const columns = Object.keys(await db(table).columnInfo());
  return db(table).select(columns).orderBy(columns.includes('id') ? 'id' : columns[0]!);
}

beforeAll(async () => {
  source = openDatabase(':memory:');
  await migrateLatest(source);
  await seedDemoData(source);
  target = await openTestDatabase();
  report = await copyDatabase(source, target.db);
  back = openDatabase(':memory:');
  await copyDatabase(target.db, back);
}, 60_000);
afterAll(async () => {
  await Promise.all([source.destroy(), back.destroy(), target.dispose()]);
});

describe(`copying the records to another database (${process.env.TEST_POSTGRES_URL ? 'SQLite to PostgreSQL' : 'SQLite to SQLite'})`, () => {
  it('copies every table of the demo data with equal row counts', async () => {
    const expected = await counts(source);
    expect(await counts(target.db)).toEqual(expected);
    expect(Object.fromEntries(report.tables.map((t) => [t.table, t.rows]))).toEqual(expected);
    // The demo data fills the main areas, so this is a real copy and not one of empty tables.
    for (const table of ['users', 'animals', 'events', 'plans', 'quotes', 'orders', 'payments']) expect(expected[table], table).toBeGreaterThan(0);
  });

  it('keeps the rows themselves: users, animals with genes, plans, orders', async () => {
    const owner = await source('users').where({ role: 'owner' }).first();
    const copiedOwner = await target.db('users').where({ email: owner.email }).first();
    expect({ ...copiedOwner, active: Boolean(copiedOwner.active) }).toEqual({ ...owner, active: Boolean(owner.active) });

    const gene = await source('animal_genes').whereNotNull('het_probability').orderBy('id').first();
    if (gene) expect(await target.db('animal_genes').where({ id: gene.id }).first()).toEqual(gene);
    const forSale = (await source('animals').where({ for_sale: true }).orderBy('id').pluck('code')) as string[];
    expect(forSale.length).toBeGreaterThan(0);
    expect(await target.db('animals').where({ for_sale: true }).orderBy('id').pluck('code')).toEqual(forSale);

    const plan = await source('plans').orderBy('id').first();
    const copiedPlan = await target.db('plans').where({ id: plan.id }).first();
    expect(JSON.parse(copiedPlan.result_json)).toEqual(JSON.parse(plan.result_json));
    const order = await source('orders').orderBy('id').first();
    expect(await target.db('orders').where({ id: order.id }).first()).toEqual(order);
  });

  it('comes back to SQLite row for row', async () => {
    for (const table of await listTables(source)) expect(await allRows(back, table), table).toEqual(await allRows(source, table));
  });

  it('continues ids after the copied ones', async () => {
    const max = Number(((await target.db('animals').max({ m: 'id' }).first()) as { m: number }).m);
    const id = await insertId(target.db('animals'), { code: 'COPY-NEXT', species: 'Python regius', created_at: nowIso(), updated_at: nowIso() });
    expect(id).toBe(max + 1);
    await target.db('animals').where({ id }).delete();
  });

  it('refuses a target that holds rows, and leaves it as it was', async () => {
    const before = await counts(target.db);
    await expect(copyDatabase(source, target.db)).rejects.toThrow(/not empty/);
    expect(await counts(target.db)).toEqual(before);
  });

  it('refuses a source that is behind on its migrations', async () => {
    const old = openDatabase(':memory:');
    const fresh = openDatabase(':memory:');
    try {
      await migrateLatest(old);
      await old('knex_migrations').where({ name: (await old('knex_migrations').max({ name: 'name' }).first())!.name }).delete();
      await expect(copyDatabase(old, fresh)).rejects.toThrow(/latest migration/);
    } finally {
      await Promise.all([old.destroy(), fresh.destroy()]);
    }
  });
});

describe('dependency order', () => {
  it('puts parents before children and refuses a cycle', () => {
    const order = dependencyOrder(
      new Map([
        ['quote_lines', new Set(['quotes'])],
        ['quotes', new Set(['customers'])],
        ['customers', new Set<string>()],
        ['orders', new Set(['quotes', 'customers'])],
      ]),
    );
    expect(order.indexOf('customers')).toBeLessThan(order.indexOf('quotes'));
    expect(order.indexOf('quotes')).toBeLessThan(order.indexOf('quote_lines'));
    expect(order.indexOf('quotes')).toBeLessThan(order.indexOf('orders'));
    expect(() => dependencyOrder(new Map([['a', new Set(['b'])], ['b', new Set(['a'])]]))).toThrow(/cycle/);
  });
});

describe('npm run db:copy', () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tw-db-copy-'));
  const run = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'scripts/db-copy.ts', ...args], { encoding: 'utf8', timeout: 60_000 });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it('copies one SQLite file into a new one, then refuses to copy into it again', async () => {
    const from = path.join(dir, 'shop.sqlite');
    const to = path.join(dir, 'moved.sqlite');
    const db = openDatabase(from);
    await migrateLatest(db);
    await seedDemoData(db);
    const expected = await counts(db);
    await db.destroy();

    const first = run('--from', `sqlite:${from}`, '--to', `sqlite:${to}`);
    expect(first.stderr).toBe('');
    expect(first.status).toBe(0);
    expect(first.stdout).toMatch(/every count matches/);
    const moved = openDatabase(to);
    try {
      expect(await counts(moved)).toEqual(expected);
    } finally {
      await moved.destroy();
    }

    const again = run('--from', `sqlite:${from}`, '--to', `sqlite:${to}`);
    expect(again.status).toBe(1);
    expect(again.stderr).toMatch(/not empty/);
  }, 60_000);
});
