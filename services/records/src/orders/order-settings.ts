import type { Knex } from 'knex';
import { OrderSettings } from '../../../../shared/api/orders.js';
import { nowIso } from '../db/knex.js';

const KEY = 'orders';

/** Used until the owner saves settings: deposit 50 % (common practice); tax 0 because it depends on where the shop is. */
export const DEFAULT_ORDER_SETTINGS: OrderSettings = {
  currency: 'usd',
  taxRatePercent: 0,
  depositPercent: 50,
  deliveryFeeCents: 7500,
  quoteValidDays: 30,
  invoiceDueDays: 14,
};

export async function readOrderSettings(db: Knex): Promise<OrderSettings> {
  const row = (await db('settings').where({ key: KEY }).first()) as { value_json: string } | undefined;
  if (!row) return DEFAULT_ORDER_SETTINGS;
  // A row written by an older version may lack newer keys: defaults fill them.
  const parsed = OrderSettings.partial().safeParse(JSON.parse(row.value_json));
  return { ...DEFAULT_ORDER_SETTINGS, ...(parsed.success ? parsed.data : {}) };
}

export async function writeOrderSettings(db: Knex, settings: OrderSettings): Promise<void> {
  const now = nowIso();
  await db('settings')
    .insert({ key: KEY, value_json: JSON.stringify(settings), created_at: now, updated_at: now })
    .onConflict('key')
    .merge({ value_json: JSON.stringify(settings), updated_at: now });
}
