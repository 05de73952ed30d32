import type { Knex } from 'knex';
import { nowIso } from '../db/knex.js';

// Invented stock for the demo shop: full sheets, a few offcuts from earlier racks, 2x4s and hardware.
const DEMO_STOCK = [
  { kind: 'sheet', material: 'pvc-rigid', description: 'Full sheet, 1/2 in, white', length_in: 96, width_in: 48, quantity: 14, offcut: false, location: 'sheet rack' },
  { kind: 'sheet', material: 'pvc-rigid', description: 'Offcut from a 6 x 2 rack', length_in: 60, width_in: 23.5, quantity: 1, offcut: true, location: 'offcut bin' },
  { kind: 'sheet', material: 'pvc-rigid', description: 'Offcut strips', length_in: 41, width_in: 23.5, quantity: 2, offcut: true, location: 'offcut bin' },
  { kind: 'sheet', material: 'plywood', description: '1/2 in sanded plywood', length_in: 96, width_in: 48, quantity: 3, offcut: false, location: 'sheet rack' },
  { kind: 'board', material: 'lumber-2x4', description: 'Kiln-dried stud', length_in: 96, width_in: null, quantity: 18, offcut: false, location: 'lumber wall' },
  { kind: 'hardware', material: 'Caster, 3 in', description: 'Two of four locking per rack', length_in: null, width_in: null, quantity: 24, offcut: false, location: 'bin 4' },
  { kind: 'hardware', material: 'Flat-head screw #8 x 1-1/4 in', description: '', length_in: null, width_in: null, quantity: 600, offcut: false, location: 'bin 1' },
  { kind: 'hardware', material: 'Dowel, 3/8 x 2 in', description: 'Two per section joint', length_in: null, width_in: null, quantity: 50, offcut: false, location: 'bin 2' },
  { kind: 'hardware', material: 'Heat tape, 11 in wide (feet)', description: '', length_in: null, width_in: null, quantity: 120, offcut: false, location: 'electrical shelf' },
  { kind: 'hardware', material: 'Thermostat, 500 W', description: '', length_in: null, width_in: null, quantity: 4, offcut: false, location: 'electrical shelf' },
] as const;

/** Stock on hand, and four sheets and the casters set aside for the order in assembly; does nothing when stock exists. */
export async function seedStockDemo(db: Knex): Promise<boolean> {
  const existing = (await db('stock_items').count({ n: '*' }).first()) as { n: number | string };
  if (Number(existing.n) > 0) return false;
  const now = nowIso();
  await db('stock_items').insert(DEMO_STOCK.map((s) => ({ ...s, created_at: now, updated_at: now })));
  const order = (await db('orders').where({ status: 'assembly' }).orderBy('id').first('id')) as { id: number } | undefined;
  if (!order) return true;
  const sheets = (await db('stock_items').where({ kind: 'sheet', material: 'pvc-rigid', offcut: false }).first('id')) as { id: number };
  const casters = (await db('stock_items').where({ material: 'Caster, 3 in' }).first('id')) as { id: number };
  const by = 'builder@demo.tubwright.test';
  await db('stock_reservations').insert([
    { stock_item_id: sheets.id, order_id: order.id, quantity: 4, created_by: by, created_at: now, updated_at: now },
    { stock_item_id: casters.id, order_id: order.id, quantity: 4, created_by: by, created_at: now, updated_at: now },
  ]);
  return true;
}
