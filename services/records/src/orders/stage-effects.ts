import type { Knex } from 'knex';
import type { OrderStatus } from '../../../../shared/api/orders.js';
import { removeFromTub } from '../collection/racks/racks-store.js';
import { nowIso } from '../db/knex.js';

/**
 * What an order's stage does to the rest of the shop, applied wherever the stage is entered (the
 * stage route, the payment webhook, the demo seed), inside the caller's transaction.
 */
export async function applyStageEffects(trx: Knex, orderId: number, stage: OrderStatus): Promise<void> {
  await settleReservations(trx, orderId, stage);
  if (stage === 'delivered' || stage === 'picked_up') {
    const order = (await trx('orders').where({ id: orderId }).first('quote_id')) as { quote_id: number };
    await handOverAnimals(trx, order.quote_id);
  }
  // A cancelled order's unpaid invoice keeps its number (no gaps) and is voided.
  if (stage === 'cancelled') await trx('invoices').where({ order_id: orderId, status: 'open' }).update({ status: 'void', updated_at: nowIso() });
}

/**
 * Stock set aside for an order stops being held once the order is finished: a cancelled order's
 * pieces go back to free stock; a handed-over order used them, so they leave the stock count.
 */
async function settleReservations(trx: Knex, orderId: number, stage: OrderStatus): Promise<void> {
  if (stage !== 'cancelled' && stage !== 'delivered' && stage !== 'picked_up') return;
  const held = (await trx('stock_reservations').where({ order_id: orderId })) as { stock_item_id: number; quantity: number }[];
  if (stage !== 'cancelled') {
    for (const r of held) await trx('stock_items').where({ id: r.stock_item_id }).update({ quantity: trx.raw('CASE WHEN quantity > ? THEN quantity - ? ELSE 0 END', [r.quantity, r.quantity]), updated_at: nowIso() });
  }
  await trx('stock_reservations').where({ order_id: orderId }).delete();
}

/** Animals sold on the order leave the collection when it is handed over: sold, off the for-sale list, out of their tubs (history kept). */
async function handOverAnimals(trx: Knex, quoteId: number): Promise<void> {
  const lines = (await trx('quote_lines').where({ quote_id: quoteId }).whereNotNull('animal_id').select('animal_id')) as { animal_id: number }[];
  const now = nowIso();
  for (const { animal_id: animalId } of lines) {
    await trx('animals').where({ id: animalId }).update({ status: 'sold', for_sale: false, updated_at: now });
    await removeFromTub(trx, animalId, now);
  }
}
