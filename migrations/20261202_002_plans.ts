import type { Knex } from 'knex';

/** Times are ISO 8601 strings with `Z`, written by the application. */
function timestamps(t: Knex.CreateTableBuilder): void {
  t.string('created_at').notNullable();
  t.string('updated_at').notNullable();
}

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('plans', (t) => {
    t.increments('id');
    t.string('name').notNullable();
    t.text('notes').notNullable().defaultTo('');
    t.integer('tub_model_id').nullable().references('id').inTable('tub_models');
    t.text('spec_json').notNullable();
    // The last computed result, and its key figures so lists need not parse every result.
    t.text('result_json').notNullable();
    t.text('summary_json').notNullable();
    t.string('unit').notNullable();
    t.string('status').notNullable().defaultTo('active');
    t.integer('version').notNullable().defaultTo(1);
    // A user id without a foreign key: API keys and the gateway may write too.
    t.integer('created_by').nullable();
    t.string('deleted_at');
    timestamps(t);
    t.index(['status']);
    t.index(['tub_model_id']);
  });

  await knex.schema.createTable('plan_versions', (t) => {
    t.increments('id');
    t.integer('plan_id').notNullable().references('id').inTable('plans');
    t.integer('version').notNullable();
    t.string('name').notNullable();
    t.string('unit').notNullable();
    t.text('spec_json').notNullable();
    t.text('result_json').notNullable();
    t.text('summary_json').notNullable();
    t.integer('created_by').nullable();
    t.string('created_at').notNullable();
    t.unique(['plan_id', 'version']);
  });

  await knex.schema.createTable('price_list', (t) => {
    t.string('key').primary();
    t.string('label').notNullable();
    t.string('unit').notNullable();
    t.double('price').notNullable();
    t.string('category').notNullable();
    t.text('notes').notNullable().defaultTo('');
    timestamps(t);
  });

  await knex.schema.createTable('materials', (t) => {
    t.increments('id');
    t.string('key').notNullable().unique();
    t.string('label').notNullable();
    t.string('kind').notNullable();
    t.double('thickness_in').notNullable();
    t.double('density_kg_m3').notNullable();
    t.double('modulus_mpa').notNullable();
    t.double('heated_modulus_mpa').nullable();
    t.text('source').notNullable().defaultTo('');
    t.double('price_per_sheet').notNullable();
    t.double('sheet_length_in').notNullable();
    t.double('sheet_width_in').notNullable();
    timestamps(t);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['materials', 'price_list', 'plan_versions', 'plans']) await knex.schema.dropTableIfExists(table);
}
