import type { Knex } from 'knex';

/**
 * Next document number of the year, e.g. Q-2026-0007. Called inside the transaction that inserts
 * the row, so numbers follow each other without gaps; the unique index catches a race.
 */
export async function nextNumber(trx: Knex, table: 'quotes' | 'orders' | 'invoices', prefix: 'Q' | 'O' | 'INV', year: number): Promise<string> {
  const head = `${prefix}-${year}-`;
  // PostgreSQL lets concurrent transactions read the same maximum; a lock held until this one
  // commits makes them take turns. (SQLite has one writer at a time already.)
  if (trx.client.config.client === 'pg') await trx.raw('select pg_advisory_xact_lock(hashtext(?))', [head]);
  const row = (await trx(table)
    .where('number', 'like', `${head}%`)
    .max({ n: trx.raw('CAST(SUBSTR(number, ?) AS INTEGER)', [head.length + 1]) })
    .first()) as { n: number | null } | undefined;
  const next = Number(row?.n ?? 0) + 1;
  return `${head}${String(next).padStart(4, '0')}`;
}
