import type { Knex } from 'knex';
import type { z } from 'zod';
import type { Quote, QuoteLine, QuoteSummary } from '../../../../shared/api/orders.js';
import { NotFoundError } from '../../../common/src/errors.js';
import { insertId, nowIso } from '../db/knex.js';
import { nextNumber } from './numbering.js';
import { bpToPercent, lineAmountCents, quoteTotals, type LineKind, type QuoteRates } from './quote-totals.js';

export type QuoteItem = z.output<typeof Quote>;
type QuoteSummaryItem = z.output<typeof QuoteSummary>;
type QuoteLineItem = z.output<typeof QuoteLine>;

/** A line with its price settled (rack lines priced by the calculator beforehand). */
export interface ResolvedLine {
  kind: LineKind;
  description: string;
  planId: number | null;
  spec: Record<string, unknown> | null;
  /** Item lines that sell an animal from the collection. */
  animalId?: number | null;
  quantity: number;
  unitPriceCents: number;
}

export interface QuoteHead {
  validUntil: string;
  currency: string;
  notes: string;
  rates: QuoteRates;
}

export const QUOTE_COLUMNS: Record<string, string> = {
  number: 'quotes.number',
  status: 'quotes.status',
  validUntil: 'quotes.valid_until',
  totalCents: 'quotes.total_cents',
  createdAt: 'quotes.created_at',
};

/** Quotes with their customer's name and the order made from them, if any. */
export function quotesQuery(db: Knex): Knex.QueryBuilder {
  return db('quotes')
    .join('customers', 'customers.id', 'quotes.customer_id')
    .leftJoin('orders', 'orders.quote_id', 'quotes.id')
    .whereNull('quotes.deleted_at')
    .select('quotes.*', 'customers.name as customer_name', 'orders.id as order_id');
}

export function toQuoteSummary(row: Record<string, any>): QuoteSummaryItem {
  return {
    id: row.id,
    number: row.number,
    customerId: row.customer_id,
    customerName: row.customer_name,
    status: row.status,
    validUntil: row.valid_until,
    currency: row.currency,
    taxRatePercent: bpToPercent(row.tax_rate_bp),
    discountPercent: bpToPercent(row.discount_bp),
    depositPercent: bpToPercent(row.deposit_bp),
    notes: row.notes,
    sentAt: row.sent_at ?? null,
    orderId: row.order_id ?? null,
    createdAt: row.created_at,
    itemsCents: row.items_cents,
    discountCents: row.discount_cents,
    taxCents: row.tax_cents,
    totalCents: row.total_cents,
    depositCents: row.deposit_cents,
  };
}

export function toQuoteLine(row: Record<string, any>): QuoteLineItem {
  return {
    id: row.id,
    position: row.position,
    kind: row.kind,
    description: row.description,
    planId: row.plan_id ?? null,
    spec: row.spec_json ? JSON.parse(row.spec_json) : null,
    animalId: row.animal_id ?? null,
    quantity: row.quantity,
    unitPriceCents: row.unit_price_cents,
    amountCents: row.amount_cents,
  };
}

export async function quoteLines(db: Knex, quoteId: number): Promise<QuoteLineItem[]> {
  return (await db('quote_lines').where({ quote_id: quoteId }).orderBy('position')).map(toQuoteLine);
}

export async function findQuote(db: Knex, id: number): Promise<QuoteItem> {
  const row = await quotesQuery(db).where('quotes.id', id).first();
  if (!row) throw new NotFoundError(`No quote with id ${id}.`);
  return { ...toQuoteSummary(row), lines: await quoteLines(db, id) };
}

function totalsColumns(lines: readonly ResolvedLine[], rates: QuoteRates) {
  const t = quoteTotals(lines, rates);
  return {
    tax_rate_bp: rates.taxRateBp,
    discount_bp: rates.discountBp,
    deposit_bp: rates.depositBp,
    items_cents: t.itemsCents,
    discount_cents: t.discountCents,
    tax_cents: t.taxCents,
    total_cents: t.totalCents,
    deposit_cents: t.depositCents,
  };
}

async function writeLines(trx: Knex, quoteId: number, lines: readonly ResolvedLine[], now: string): Promise<void> {
  await trx('quote_lines').where({ quote_id: quoteId }).delete();
  await trx('quote_lines').insert(
    lines.map((line, i) => ({
      quote_id: quoteId,
      position: i + 1,
      kind: line.kind,
      description: line.description,
      plan_id: line.planId,
      spec_json: line.spec ? JSON.stringify(line.spec) : null,
      animal_id: line.animalId ?? null,
      quantity: line.quantity,
      unit_price_cents: line.unitPriceCents,
      amount_cents: lineAmountCents(line),
      created_at: now,
      updated_at: now,
    })),
  );
}

export async function insertQuote(db: Knex, customerId: number, head: QuoteHead, lines: readonly ResolvedLine[], createdBy: string, status: 'draft' | 'sent' = 'draft'): Promise<number> {
  const now = nowIso();
  return db.transaction(async (trx) => {
    const number = await nextNumber(trx, 'quotes', 'Q', new Date(now).getUTCFullYear());
    const id = await insertId(trx('quotes'), {
      number,
      customer_id: customerId,
      status,
      valid_until: head.validUntil,
      currency: head.currency,
      notes: head.notes,
      ...totalsColumns(lines, head.rates),
      created_by: createdBy,
      created_at: now,
      updated_at: now,
    });
    await writeLines(trx, id!, lines, now);
    return id!;
  });
}

export async function updateDraftQuote(db: Knex, id: number, head: QuoteHead, lines: readonly ResolvedLine[]): Promise<void> {
  const now = nowIso();
  await db.transaction(async (trx) => {
    await trx('quotes')
      .where({ id })
      .update({ valid_until: head.validUntil, notes: head.notes, ...totalsColumns(lines, head.rates), updated_at: now });
    await writeLines(trx, id, lines, now);
  });
}

/** Today's date (UTC) plus days, as YYYY-MM-DD. */
export function isoDatePlusDays(days: number, from = new Date()): string {
  return new Date(from.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}

export function todayIso(): string {
  return new Date().toISOString().slice(0, 10);
}
