import type { Knex } from 'knex';
import { RACK_PLAN_EXAMPLE } from '../../../../shared/api/rack-plan.js';
import { nowIso } from '../db/knex.js';
import { nextNumber } from '../orders/numbering.js';
import { DEFAULT_ORDER_SETTINGS, readOrderSettings, writeOrderSettings } from '../orders/order-settings.js';
import { enterStage, orderFromQuote } from '../orders/orders-store.js';
import { insertQuote, isoDatePlusDays, type ResolvedLine } from '../orders/quotes-store.js';
import { percentToBp } from '../orders/quote-totals.js';

// Invented prices for the demo book; real quotes price racks through the calculator.
const rack = (levels: number, columns: number, priceCents: number): ResolvedLine => ({
  kind: 'rack',
  description: `Rack, ${levels} x ${columns} tubs, natural PVC`,
  planId: null,
  spec: { ...RACK_PLAN_EXAMPLE, layout: { levels, columns, dividers: 0 } },
  quantity: 1,
  unitPriceCents: priceCents,
});
const item = (description: string, quantity: number, unitPriceCents: number, kind: ResolvedLine['kind'] = 'item'): ResolvedLine => ({ kind, description, planId: null, spec: null, quantity, unitPriceCents });

interface DemoQuote {
  email: string;
  lines: ResolvedLine[];
  discountPercent?: number;
  notes?: string;
  /** How far the demo takes it. */
  state: 'draft' | 'sent' | 'declined' | 'awaiting_deposit' | 'assembly' | 'closed';
}

const DEMO_QUOTES: DemoQuote[] = [
  { email: 'priya.v@example.test', state: 'draft', lines: [rack(6, 2, 86500), item('Spare thermostat, 500 W', 1, 4500)], notes: 'Wants black sides if stock allows.' },
  { email: 'declan@example.test', state: 'sent', lines: [rack(9, 3, 148000), item('Delivery within 40 miles', 1, 7500, 'delivery')] },
  { email: 'mfeld@example.test', state: 'declined', lines: [rack(4, 1, 52000)] },
  { email: 'lena@scaled-acres.example.test', state: 'awaiting_deposit', discountPercent: 5, lines: [rack(9, 3, 148000), rack(9, 3, 148000), item('Assembly on site, hours', 3, 4000, 'labor')], notes: 'Repeat breeder: 5 % off.' },
  { email: 'ada@hollowlog.example.test', state: 'assembly', lines: [rack(7, 2, 99000), item('Delivery within 40 miles', 1, 7500, 'delivery')] },
  { email: 'priya.v@example.test', state: 'closed', lines: [rack(5, 1, 41000)] },
];

/** A few invented quotes and orders in different states for the seeded customers; does nothing when quotes exist. */
export async function seedOrdersDemo(db: Knex): Promise<boolean> {
  const existing = (await db('quotes').count({ n: '*' }).first()) as { n: number };
  if (Number(existing.n) > 0) return false;
  if (!(await db('settings').where({ key: 'orders' }).first())) {
    // An invented local sales tax for the demo shop.
    await writeOrderSettings(db, { ...DEFAULT_ORDER_SETTINGS, taxRatePercent: 6.5 });
  }
  const settings = await readOrderSettings(db);
  const by = 'sales@demo.tubwright.test';
  for (const demo of DEMO_QUOTES) {
    const customer = (await db('customers').where({ email: demo.email }).first()) as { id: number } | undefined;
    if (!customer) continue;
    const quoteId = await insertQuote(
      db,
      customer.id,
      {
        validUntil: isoDatePlusDays(settings.quoteValidDays),
        currency: settings.currency,
        notes: demo.notes ?? '',
        rates: { taxRateBp: percentToBp(settings.taxRatePercent), discountBp: percentToBp(demo.discountPercent ?? 0), depositBp: percentToBp(settings.depositPercent) },
      },
      demo.lines,
      by,
      demo.state === 'draft' ? 'draft' : 'sent',
    );
    const now = nowIso();
    if (demo.state !== 'draft') await db('quotes').where({ id: quoteId }).update({ sent_at: now });
    if (demo.state === 'declined') await db('quotes').where({ id: quoteId }).update({ status: 'declined', decided_at: now });
    if (demo.state === 'draft' || demo.state === 'sent' || demo.state === 'declined') continue;
    const orderId = await orderFromQuote(db, quoteId, { deliveryMethod: demo.state === 'closed' ? 'pickup' : 'delivery', deliveryDate: isoDatePlusDays(21), deliveryAddress: '', doorwayHeightIn: demo.state === 'assembly' ? 78 : null, notes: '' }, by);
    if (demo.state === 'awaiting_deposit') continue;
    await db.transaction(async (trx) => {
      const order = await trx('orders').where({ id: orderId }).first();
      const pay = async (kind: 'deposit' | 'balance', cents: number) => {
        await trx('payments').insert({ order_id: orderId, provider_id: `pi_demo_${orderId}_${kind}`, kind, amount_cents: cents, currency: order.currency, status: 'succeeded', paid_at: now, created_by: by, created_at: now, updated_at: now });
      };
      await pay('deposit', order.deposit_due_cents);
      let paid = order.deposit_due_cents;
      await enterStage(trx, orderId, 'deposit_paid', 'payments-webhook');
      const stages = demo.state === 'assembly' ? ['cutting', 'assembly'] : ['cutting', 'assembly', 'wiring', 'testing', 'ready', 'picked_up'];
      for (const stage of stages) await enterStage(trx, orderId, stage as 'cutting', stage === 'picked_up' ? by : 'builder@demo.tubwright.test');
      if (demo.state === 'closed') {
        await pay('balance', order.total_cents - paid);
        paid = order.total_cents;
        const quote = await trx('quotes').where({ id: quoteId }).first();
        await trx('invoices').insert({
          number: await nextNumber(trx, 'invoices', 'INV', new Date(now).getUTCFullYear()),
          order_id: orderId,
          issued_on: now.slice(0, 10),
          due_on: isoDatePlusDays(settings.invoiceDueDays),
          currency: order.currency,
          items_cents: quote.items_cents,
          discount_cents: quote.discount_cents,
          tax_cents: quote.tax_cents,
          total_cents: order.total_cents,
          paid_cents: paid,
          balance_cents: 0,
          status: 'paid',
          created_at: now,
          updated_at: now,
        });
        await enterStage(trx, orderId, 'closed', by);
      }
      await trx('orders').where({ id: orderId }).update({ paid_cents: paid, balance_cents: order.total_cents - paid });
    });
  }
  return true;
}
