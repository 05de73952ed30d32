import type { Knex } from 'knex';
import { migrationSource } from '../../../../migrations/index.js';
import { migrateLatest } from './knex.js';

/** Knex's own bookkeeping: the target's copy is written by its migrations, not copied. */
const KNEX_TABLES = new Set(['knex_migrations', 'knex_migrations_lock']);
const PAGE_ROWS = 2000;

export interface CopyReport {
  tables: { table: string; rows: number }[];
  totalRows: number;
}

function isPostgres(db: Knex): boolean {
  return db.client.config.client === 'pg';
}

/** The tables of the records schema, without SQLite's and Knex's own. */
export async function listTables(db: Knex): Promise<string[]> {
  const names = isPostgres(db)
    ? ((await db('information_schema.tables').where({ table_type: 'BASE TABLE' }).whereRaw('table_schema = current_schema()').pluck('table_name')) as string[])
    : ((await db('sqlite_master').where({ type: 'table' }).whereNot('name', 'like', 'sqlite_%').pluck('name')) as string[]);
  return names.filter((n) => !KNEX_TABLES.has(n)).sort();
}

/** Each table with the tables its foreign keys point at. */
async function foreignKeyParents(db: Knex, tables: string[]): Promise<Map<string, Set<string>>> {
  const parents = new Map(tables.map((t) => [t, new Set<string>()]));
  if (isPostgres(db)) {
    const rows = (await db.raw(`
      select child.relname as child, parent.relname as parent
      from pg_constraint c
      join pg_class child on child.oid = c.conrelid
      join pg_class parent on parent.oid = c.confrelid
      where c.contype = 'f' and child.relnamespace = current_schema()::regnamespace`)) as { rows: { child: string; parent: string }[] };
    for (const r of rows.rows) parents.get(r.child)?.add(r.parent);
  } else {
    for (const table of tables) {
      const rows = (await db.raw('select "table" from pragma_foreign_key_list(?)', [table])) as { table: string }[];
      for (const r of rows) parents.get(table)!.add(r.table);
    }
  }
  return parents;
}

/** Parents before children, so every row's foreign keys already have their row; alphabetical among equals. */
export function dependencyOrder(parents: Map<string, Set<string>>): string[] {
  const order: string[] = [];
  const done = new Set<string>();
  const visiting = new Set<string>();
  const visit = (table: string, path: string[]) => {
    if (done.has(table)) return;
    if (visiting.has(table)) throw new Error(`Foreign keys form a cycle: ${[...path, table].join(' -> ')}`);
    visiting.add(table);
    for (const parent of [...(parents.get(table) ?? [])].sort()) if (parent !== table && parents.has(parent)) visit(parent, [...path, table]);
    visiting.delete(table);
    done.add(table);
    order.push(table);
  };
  for (const table of [...parents.keys()].sort()) visit(table, []);
  return order;
}

async function countRows(db: Knex, table: string): Promise<number> {
  const row = (await db(table).count({ n: '*' }).first()) as { n: number | string } | undefined;
  return Number(row?.n ?? 0);
}

async function appliedMigrations(db: Knex): Promise<string[]> {
  if (!(await db.schema.hasTable('knex_migrations'))) return [];
  return (await db('knex_migrations').orderBy('id').pluck('name')) as string[];
}

/**
 * Copies every records table from `source` to `target` (SQLite or PostgreSQL, either way round).
 * The target gets the schema from the same migrations, must hold no rows, and is written in one
 * transaction that checks each table's row count before it commits; PostgreSQL's id sequences
 * then continue after the copied ids. The source is only read.
 */
export async function copyDatabase(source: Knex, target: Knex, log: (line: string) => void = () => {}): Promise<CopyReport> {
  const expected = await migrationSource.getMigrations([]);
  const sourceApplied = await appliedMigrations(source);
  if (sourceApplied.join() !== expected.join()) {
    throw new Error(`The source is not at the latest migration (${sourceApplied.length} of ${expected.length} applied); run \`npm run migrate\` on it first.`);
  }

  // Refuse before touching the target: it may hold a shop's data.
  for (const table of await listTables(target)) {
    const rows = await countRows(target, table);
    if (rows > 0) throw new Error(`The target is not empty: ${table} has ${rows} row(s). Copy into a new, empty database.`);
  }
  const applied = await migrateLatest(target);
  if (applied.length) log(`Target schema: applied ${applied.length} migration(s).`);

  const tables = await listTables(source);
  const targetTables = new Set(await listTables(target));
  const missing = tables.filter((t) => !targetTables.has(t));
  if (missing.length) throw new Error(`The target lacks table(s) ${missing.join(', ')} after migrating.`);
  const order = dependencyOrder(await foreignKeyParents(source, tables));

  const report: CopyReport = { tables: [], totalRows: 0 };
  // One read transaction on the source, so the copy is one consistent moment even if someone writes
  // meanwhile (PostgreSQL needs repeatable read for that; a SQLite transaction is a snapshot already).
  await source.transaction(async (from) => {
    await target.transaction(async (to) => {
      for (const table of order) {
        const columns = Object.keys(await from(table).columnInfo());
        const targetColumns = new Set(Object.keys(await to(table).columnInfo()));
        const lacking = columns.filter((c) => !targetColumns.has(c));
        if (lacking.length) throw new Error(`The target's ${table} lacks column(s) ${lacking.join(', ')}.`);
        // Both databases cap the values of one statement (SQLite 32766, PostgreSQL 65535).
        const chunk = Math.max(1, Math.floor(30000 / columns.length));
        const pageById = columns.includes('id');
        let copied = 0;
        let lastId: unknown = undefined;
        for (;;) {
          let page = from(table).select(columns);
          if (pageById) {
            page = page.orderBy('id').limit(PAGE_ROWS);
            if (lastId !== undefined) page = page.where('id', '>', lastId as Knex.Value);
          }
          const rows = (await page) as Record<string, unknown>[];
          for (let i = 0; i < rows.length; i += chunk) await to(table).insert(rows.slice(i, i + chunk));
          copied += rows.length;
          if (!pageById || rows.length < PAGE_ROWS) break;
          lastId = rows[rows.length - 1]!.id;
        }
        const [fromCount, toCount] = [await countRows(from, table), await countRows(to, table)];
        if (fromCount !== toCount || copied !== fromCount) {
          throw new Error(`Row counts differ for ${table}: source ${fromCount}, copied ${copied}, target ${toCount}. Nothing was written.`);
        }
        if (pageById && isPostgres(target) && (await integerId(to, table))) {
          // Explicit ids do not move a serial's sequence; without this the next insert would reuse id 1.
          await to.raw(`select setval(pg_get_serial_sequence(?, 'id'), coalesce((select max(id) from ??), 0) + 1, false)`, [table, table]);
        }
        report.tables.push({ table, rows: toCount });
        report.totalRows += toCount;
        log(`${table.padEnd(24)} ${String(toCount).padStart(8)} rows`);
      }
    });
  }, isPostgres(source) ? { isolationLevel: 'repeatable read' } : {});
  return report;
}

/** Whether `id` is a serial integer (auth sessions, for one, use random text ids). */
async function integerId(db: Knex, table: string): Promise<boolean> {
  const info = await db(table).columnInfo('id');
  return /int/i.test(String((info as { type?: string }).type));
}
