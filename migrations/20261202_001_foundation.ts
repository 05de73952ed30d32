import type { Knex } from 'knex';

/** Times are ISO 8601 strings with `Z`, written by the application (SQLite's own clock has no zone). */
function timestamps(t: Knex.CreateTableBuilder): void {
  t.string('created_at').notNullable();
  t.string('updated_at').notNullable();
}

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id');
    t.string('email').notNullable().unique();
    t.string('name').notNullable();
    t.string('role').notNullable();
    t.string('password_hash').notNullable();
    t.boolean('active').notNullable().defaultTo(true);
    timestamps(t);
  });

  await knex.schema.createTable('settings', (t) => {
    t.string('key').primary();
    t.text('value_json').notNullable();
    timestamps(t);
  });

  await knex.schema.createTable('tub_models', (t) => {
    t.increments('id');
    t.string('name').notNullable();
    t.string('maker').notNullable().defaultTo('');
    t.double('length_in').notNullable();
    t.double('width_in').notNullable();
    t.double('height_in').notNullable();
    t.double('volume_qt');
    t.text('notes').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
  });

  await knex.schema.createTable('animals', (t) => {
    t.increments('id');
    t.string('code').notNullable().unique();
    t.string('name').notNullable().defaultTo('');
    t.string('species').notNullable();
    t.string('morph').notNullable().defaultTo('');
    t.string('sex').notNullable().defaultTo('unknown');
    t.string('hatch_date');
    t.integer('weight_g');
    t.string('status').notNullable().defaultTo('active');
    t.string('location').notNullable().defaultTo('');
    t.text('notes').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
  });

  await knex.schema.createTable('customers', (t) => {
    t.increments('id');
    t.string('name').notNullable();
    t.string('email').notNullable();
    t.string('phone').notNullable().defaultTo('');
    t.string('city').notNullable().defaultTo('');
    t.string('region').notNullable().defaultTo('');
    t.text('notes').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
  });

  await knex.schema.createTable('audit_log', (t) => {
    t.increments('id');
    t.string('at').notNullable();
    t.string('actor').notNullable();
    t.string('action').notNullable();
    t.string('entity').notNullable();
    t.string('entity_id');
    t.text('detail_json').notNullable().defaultTo('{}');
    t.index(['entity', 'entity_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['audit_log', 'customers', 'animals', 'tub_models', 'settings', 'users']) {
    await knex.schema.dropTableIfExists(table);
  }
}
