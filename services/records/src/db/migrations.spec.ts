import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrationSource } from '../../../../migrations/index.js';
import { databaseKind, insertId, isUniqueViolation, nowIso, sqliteFile } from './knex.js';
import { openTestDatabase, type TestDatabase } from './test-database.js';

// Runs on SQLite, and on PostgreSQL when TEST_POSTGRES_URL is set (CI's second pass).
let database: TestDatabase;
beforeAll(async () => {
  database = await openTestDatabase();
});
afterAll(() => database.dispose());

const stamp = () => ({ created_at: nowIso(), updated_at: nowIso() });

describe('database targets', () => {
  it('tells PostgreSQL URLs from SQLite files', () => {
    expect(databaseKind('postgres://u@127.0.0.1/tw')).toBe('postgres');
    expect(databaseKind('postgresql://u@db.example.test:5432/tw')).toBe('postgres');
    expect(databaseKind('sqlite:data/tubwright.sqlite')).toBe('sqlite');
    expect(databaseKind('data/tubwright.sqlite')).toBe('sqlite');
    expect(sqliteFile('sqlite:data/tubwright.sqlite')).toBe('data/tubwright.sqlite');
    expect(sqliteFile('sqlite:///var/lib/tw.sqlite')).toBe('/var/lib/tw.sqlite');
    expect(sqliteFile(':memory:')).toBe(':memory:');
  });
});

describe('migrations, forward one at a time', () => {
  it('applies each migration in order on an empty database', async () => {
    const { db } = database;
    const names = await migrationSource.getMigrations([]);
    expect(names.length).toBeGreaterThan(0);
    for (const name of names) {
      const [, applied] = (await db.migrate.up({ migrationSource })) as [number, string[]];
      expect(applied).toEqual([name]);
    }
    const [, none] = (await db.migrate.latest({ migrationSource })) as [number, string[]];
    expect(none).toEqual([]);
    for (const table of ['users', 'animals', 'plans', 'placements', 'quotes', 'orders', 'payments', 'api_keys']) {
      expect(await db.schema.hasTable(table), table).toBe(true);
    }
  });

  it('gives the same column behaviour on both databases', async () => {
    const { db } = database;
    // Doubles, not PostgreSQL's 4-byte real: a third survives the round trip exactly.
    const animalId = await insertId(db('animals'), { code: 'MIG-1', species: 'Python regius', ...stamp() });
    const traitId = await insertId(db('traits'), { name: 'mig-trait', mode: 'recessive', ...stamp() });
    await db('animal_genes').insert({ animal_id: animalId, trait_id: traitId, state: 'het', het_probability: 1 / 3, ...stamp() });
    expect((await db('animal_genes').where({ animal_id: animalId }).first()).het_probability).toBe(1 / 3);
    // Text longer than a varchar(255), as a quote line's description may be (up to 300).
    const customerId = await insertId(db('customers'), { name: 'C', email: 'c@example.test', ...stamp() });
    const quoteId = await insertId(db('quotes'), {
      number: 'Q-MIG-1', customer_id: customerId, valid_until: '2027-01-01', currency: 'USD', tax_rate_bp: 0, deposit_bp: 0,
      items_cents: 0, discount_cents: 0, tax_cents: 0, total_cents: 0, deposit_cents: 0, ...stamp(),
    });
    const description = 'x'.repeat(300);
    await db('quote_lines').insert({ quote_id: quoteId, position: 1, kind: 'item', description, quantity: 1, unit_price_cents: 1, amount_cents: 1, ...stamp() });
    expect((await db('quote_lines').where({ quote_id: quoteId }).first()).description).toBe(description);
    // Counts are numbers, not PostgreSQL's bigint strings.
    expect((await db('animals').count({ n: '*' }).first())!.n).toBe(1);
    // Ids keep counting after an insert.
    expect(await insertId(db('animals'), { code: 'MIG-2', species: 'Python regius', ...stamp() })).toBe(animalId + 1);
  });

  it('refuses a second open placement in one tub through the partial unique index', async () => {
    const { db } = database;
    const rackId = await insertId(db('racks'), { name: 'MIG rack', levels: 1, columns: 1, ...stamp() });
    const tubId = await insertId(db('tubs'), { rack_id: rackId, level: 1, column: 1, label: 'M1', ...stamp() });
    const [first, second] = (await db('animals').orderBy('id').pluck('id')) as number[];
    await db('placements').insert({ animal_id: first, tub_id: tubId, placed_at: nowIso(), ...stamp() });
    const clash = await db('placements').insert({ animal_id: second, tub_id: tubId, placed_at: nowIso(), ...stamp() }).then(
      () => null,
      (err: unknown) => err,
    );
    expect(isUniqueViolation(clash)).toBe(true);
    // A closed placement frees the tub.
    await db('placements').where({ tub_id: tubId }).update({ removed_at: nowIso() });
    await db('placements').insert({ animal_id: second, tub_id: tubId, placed_at: nowIso(), ...stamp() });
  });

  it('rolls every migration back and applies them again', async () => {
    const { db } = database;
    await db.migrate.rollback({ migrationSource }, true);
    expect(await db.schema.hasTable('users')).toBe(false);
    const [, applied] = (await db.migrate.latest({ migrationSource })) as [number, string[]];
    expect(applied).toEqual(await migrationSource.getMigrations([]));
  });
});
