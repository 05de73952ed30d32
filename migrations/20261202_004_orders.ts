import type { Knex } from 'knex';

/** Times are ISO 8601 strings with `Z` written by the application; money is integer cents. */
function timestamps(t: Knex.CreateTableBuilder): void {
  t.string('created_at').notNullable();
  t.string('updated_at').notNullable();
}

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('quotes', (t) => {
    t.increments('id');
    t.string('number').notNullable().unique();
    t.integer('customer_id').notNullable().references('id').inTable('customers');
    t.string('status').notNullable().defaultTo('draft');
    t.string('valid_until').notNullable();
    t.string('currency', 3).notNullable();
    t.text('notes').notNullable().defaultTo('');
    // Rates are kept on the quote so a later change of the shop settings does not reprice it.
    t.integer('tax_rate_bp').notNullable();
    t.integer('discount_bp').notNullable().defaultTo(0);
    t.integer('deposit_bp').notNullable();
    t.integer('items_cents').notNullable();
    t.integer('discount_cents').notNullable();
    t.integer('tax_cents').notNullable();
    t.integer('total_cents').notNullable();
    t.integer('deposit_cents').notNullable();
    t.string('sent_at');
    t.string('decided_at');
    t.string('created_by').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
    t.index(['customer_id']);
    t.index(['status']);
  });

  await knex.schema.createTable('quote_lines', (t) => {
    t.increments('id');
    t.integer('quote_id').notNullable().references('id').inTable('quotes').onDelete('CASCADE');
    t.integer('position').notNullable();
    t.string('kind').notNullable();
    t.text('description').notNullable();
    t.integer('plan_id');
    t.text('spec_json');
    t.integer('quantity').notNullable();
    t.integer('unit_price_cents').notNullable();
    // Signed: discount lines are negative.
    t.integer('amount_cents').notNullable();
    timestamps(t);
    t.index(['quote_id']);
  });

  await knex.schema.createTable('orders', (t) => {
    t.increments('id');
    t.string('number').notNullable().unique();
    t.integer('quote_id').notNullable().unique().references('id').inTable('quotes');
    t.integer('customer_id').notNullable().references('id').inTable('customers');
    t.string('status').notNullable();
    t.string('currency', 3).notNullable();
    t.integer('total_cents').notNullable();
    t.integer('deposit_due_cents').notNullable();
    t.integer('paid_cents').notNullable().defaultTo(0);
    t.integer('balance_cents').notNullable();
    t.string('delivery_method').notNullable().defaultTo('pickup');
    t.string('delivery_date');
    t.text('delivery_address').notNullable().defaultTo('');
    t.text('notes').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
    t.index(['customer_id']);
    t.index(['status']);
  });

  await knex.schema.createTable('order_stages', (t) => {
    t.increments('id');
    t.integer('order_id').notNullable().references('id').inTable('orders');
    t.string('stage').notNullable();
    t.string('started_at').notNullable();
    t.string('finished_at');
    t.string('by').notNullable();
    t.text('note').notNullable().defaultTo('');
    timestamps(t);
    t.index(['order_id']);
  });

  await knex.schema.createTable('payments', (t) => {
    t.increments('id');
    t.integer('order_id').notNullable().references('id').inTable('orders');
    t.string('provider_id').unique();
    t.string('kind').notNullable();
    t.integer('amount_cents').notNullable();
    t.string('currency', 3).notNullable();
    t.string('status').notNullable();
    t.text('failure_message');
    t.string('paid_at');
    t.text('raw_event_json');
    t.string('created_by').notNullable().defaultTo('');
    timestamps(t);
    t.index(['order_id']);
  });

  // Provider events already applied: the same event delivered twice has one effect.
  await knex.schema.createTable('payment_events', (t) => {
    t.string('event_id').primary();
    t.string('type').notNullable();
    t.string('provider_id');
    t.string('received_at').notNullable();
  });

  await knex.schema.createTable('invoices', (t) => {
    t.increments('id');
    t.string('number').notNullable().unique();
    t.integer('order_id').notNullable().references('id').inTable('orders');
    t.string('issued_on').notNullable();
    t.string('due_on').notNullable();
    t.string('currency', 3).notNullable();
    t.integer('items_cents').notNullable();
    t.integer('discount_cents').notNullable();
    t.integer('tax_cents').notNullable();
    t.integer('total_cents').notNullable();
    t.integer('paid_cents').notNullable();
    t.integer('balance_cents').notNullable();
    t.string('status').notNullable();
    timestamps(t);
    t.index(['order_id']);
  });

  await knex.schema.createTable('mail_log', (t) => {
    t.increments('id');
    t.string('to').notNullable();
    t.text('subject').notNullable();
    t.string('kind').notNullable();
    t.integer('customer_id');
    t.string('entity').notNullable();
    t.integer('entity_id').notNullable();
    t.string('message_id');
    t.string('sent_at').notNullable();
    t.string('status').notNullable();
    t.text('error');
    timestamps(t);
    t.index(['customer_id']);
    t.index(['entity', 'entity_id']);
  });

  await knex.schema.createTable('idempotency_keys', (t) => {
    t.string('key').notNullable();
    t.string('route').notNullable();
    t.string('actor').notNullable();
    t.string('request_hash').notNullable();
    t.integer('status_code').notNullable();
    t.text('response_json').notNullable();
    t.string('created_at').notNullable();
    t.primary(['key', 'route', 'actor']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['idempotency_keys', 'mail_log', 'invoices', 'payment_events', 'payments', 'order_stages', 'orders', 'quote_lines', 'quotes']) {
    await knex.schema.dropTableIfExists(table);
  }
}
