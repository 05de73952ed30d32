import type { Knex } from 'knex';
import { WidgetSettings } from '../../../../shared/api/quote-requests.js';
import { nowIso } from '../db/knex.js';

const KEY = 'widget';

/** Used until the owner saves settings: a calculator that hides its price sells little, so prices show. */
export const DEFAULT_WIDGET_SETTINGS: WidgetSettings = { showPrices: true };

export async function readWidgetSettings(db: Knex): Promise<WidgetSettings> {
  const row = (await db('settings').where({ key: KEY }).first()) as { value_json: string } | undefined;
  if (!row) return DEFAULT_WIDGET_SETTINGS;
  const parsed = WidgetSettings.partial().safeParse(JSON.parse(row.value_json));
  return { ...DEFAULT_WIDGET_SETTINGS, ...(parsed.success ? parsed.data : {}) };
}

export async function writeWidgetSettings(db: Knex, settings: WidgetSettings): Promise<void> {
  const now = nowIso();
  await db('settings')
    .insert({ key: KEY, value_json: JSON.stringify(settings), created_at: now, updated_at: now })
    .onConflict('key')
    .merge({ value_json: JSON.stringify(settings), updated_at: now });
}

/** Where quote requests are announced: the shop's own address, else the address the shop mails from. */
export async function shopEmail(db: Knex, fallback: string): Promise<string> {
  const row = (await db('settings').where({ key: 'shop' }).first()) as { value_json: string } | undefined;
  const email = row ? (JSON.parse(row.value_json) as { email?: unknown }).email : undefined;
  return typeof email === 'string' && email ? email : fallback;
}
