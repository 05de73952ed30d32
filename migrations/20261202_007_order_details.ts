import type { Knex } from 'knex';

/**
 * Customer address and source, the doorway an order must pass, hosted checkout and refunds for
 * payments, and the shop's stock of sheets, boards and hardware with reservations per order.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('customers', (t) => {
    t.text('address').notNullable().defaultTo('');
    t.string('source').notNullable().defaultTo('walk-in');
  });
  await knex.schema.alterTable('orders', (t) => {
    // Inches; null when the customer has not measured it.
    t.double('doorway_height_in');
    t.integer('refunded_cents').notNullable().defaultTo(0);
  });
  await knex.schema.alterTable('payments', (t) => {
    t.string('via').notNullable().defaultTo('card');
    t.text('checkout_url');
    // For a checkout, the payment the customer's card made (refunds go against it).
    t.string('intent_id');
    t.integer('refunded_cents').notNullable().defaultTo(0);
  });
  await knex.schema.createTable('refunds', (t) => {
    t.increments('id');
    t.integer('order_id').notNullable().references('id').inTable('orders');
    t.integer('payment_id').notNullable().references('id').inTable('payments');
    t.string('provider_id').unique();
    t.integer('amount_cents').notNullable();
    t.string('currency', 3).notNullable();
    t.string('status').notNullable();
    t.text('reason').notNullable().defaultTo('');
    t.string('refunded_at');
    t.string('created_by').notNullable().defaultTo('');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.index(['order_id']);
  });
  await knex.schema.createTable('stock_items', (t) => {
    t.increments('id');
    t.string('kind').notNullable();
    // A material key of the price list for sheets and boards; a name for hardware.
    t.string('material').notNullable();
    t.string('description').notNullable().defaultTo('');
    // Inches; width is null for boards and hardware.
    t.double('length_in');
    t.double('width_in');
    t.integer('quantity').notNullable();
    t.boolean('offcut').notNullable().defaultTo(false);
    t.string('location').notNullable().defaultTo('');
    t.string('deleted_at');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.index(['kind', 'material']);
  });
  await knex.schema.createTable('stock_reservations', (t) => {
    t.increments('id');
    t.integer('stock_item_id').notNullable().references('id').inTable('stock_items');
    t.integer('order_id').notNullable().references('id').inTable('orders');
    t.integer('quantity').notNullable();
    t.string('created_by').notNullable().defaultTo('');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.unique(['stock_item_id', 'order_id']);
  });
}

/**
 * Knex drops a SQLite column by copying the table, which the foreign keys that point at customers
 * and orders refuse; SQLite (3.35 and later) and PostgreSQL both drop a plain column in place.
 */
async function dropColumns(knex: Knex, table: string, columns: string[]): Promise<void> {
  for (const column of columns) await knex.raw('ALTER TABLE ?? DROP COLUMN ??', [table, column]);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('stock_reservations');
  await knex.schema.dropTableIfExists('stock_items');
  await knex.schema.dropTableIfExists('refunds');
  await dropColumns(knex, 'payments', ['via', 'checkout_url', 'intent_id', 'refunded_cents']);
  await dropColumns(knex, 'orders', ['doorway_height_in', 'refunded_cents']);
  await dropColumns(knex, 'customers', ['address', 'source']);
}
