import type { Knex } from 'knex';

/** Times are ISO 8601 strings with `Z`, written by the application (SQLite's own clock has no zone). */
function timestamps(t: Knex.CreateTableBuilder): void {
  t.string('created_at').notNullable();
  t.string('updated_at').notNullable();
}

const TABLES = ['animal_photos', 'environment_readings', 'clutches', 'pairing_observations', 'pairings', 'events', 'event_batches', 'animal_genes', 'traits', 'placements', 'tubs', 'racks'];
const ANIMAL_COLUMNS = ['origin', 'acquired_from', 'sire_id', 'dam_id', 'clutch_id', 'feeding_interval_days', 'for_sale'];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('racks', (t) => {
    t.increments('id');
    t.string('name').notNullable();
    t.integer('levels').notNullable();
    t.integer('columns').notNullable();
    // Plans belong to another area; a rack keeps the id it was built from, without a hard link.
    t.integer('plan_id');
    t.string('location').notNullable().defaultTo('');
    t.text('notes').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
  });

  await knex.schema.createTable('tubs', (t) => {
    t.increments('id');
    t.integer('rack_id').notNullable().references('id').inTable('racks');
    t.integer('level').notNullable();
    t.integer('column').notNullable();
    t.string('label').notNullable();
    timestamps(t);
    t.unique(['rack_id', 'level', 'column']);
  });

  await knex.schema.createTable('placements', (t) => {
    t.increments('id');
    t.integer('animal_id').notNullable().references('id').inTable('animals');
    t.integer('tub_id').notNullable().references('id').inTable('tubs');
    t.string('placed_at').notNullable();
    t.string('removed_at');
    t.string('placed_by').notNullable().defaultTo('');
    timestamps(t);
    t.index(['animal_id']);
  });
  // The database itself refuses two animals in one tub, or one animal in two tubs.
  await knex.raw('CREATE UNIQUE INDEX placements_open_tub ON placements (tub_id) WHERE removed_at IS NULL');
  await knex.raw('CREATE UNIQUE INDEX placements_open_animal ON placements (animal_id) WHERE removed_at IS NULL');

  await knex.schema.createTable('traits', (t) => {
    t.increments('id');
    t.string('name').notNullable().unique();
    t.string('mode').notNullable();
    t.text('notes').notNullable().defaultTo('');
    timestamps(t);
  });

  await knex.schema.createTable('animal_genes', (t) => {
    t.increments('id');
    t.integer('animal_id').notNullable().references('id').inTable('animals');
    t.integer('trait_id').notNullable().references('id').inTable('traits');
    t.string('state').notNullable();
    t.double('het_probability');
    timestamps(t);
    t.unique(['animal_id', 'trait_id']);
  });

  await knex.schema.createTable('event_batches', (t) => {
    t.increments('id');
    t.integer('rack_id').notNullable().references('id').inTable('racks');
    t.string('kind').notNullable();
    t.string('occurred_at').notNullable();
    t.string('created_by').notNullable().defaultTo('');
    t.string('undone_at');
    timestamps(t);
  });

  await knex.schema.createTable('events', (t) => {
    t.increments('id');
    t.integer('animal_id').notNullable().references('id').inTable('animals');
    t.string('kind').notNullable();
    t.string('occurred_at').notNullable();
    t.text('payload_json').notNullable().defaultTo('{}');
    t.integer('batch_id').references('id').inTable('event_batches');
    t.string('created_by').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
    t.index(['animal_id', 'kind', 'occurred_at']);
  });

  await knex.schema.createTable('pairings', (t) => {
    t.increments('id');
    t.integer('sire_id').notNullable().references('id').inTable('animals');
    t.integer('dam_id').notNullable().references('id').inTable('animals');
    t.string('season').notNullable();
    t.string('status').notNullable().defaultTo('planned');
    t.string('ovulation_date');
    t.string('pre_lay_shed_date');
    t.text('notes').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
  });

  // Introductions, locks and separations as dated rows of their pairing.
  await knex.schema.createTable('pairing_observations', (t) => {
    t.increments('id');
    t.integer('pairing_id').notNullable().references('id').inTable('pairings');
    t.string('kind').notNullable();
    t.string('observed_on').notNullable();
    t.text('notes').notNullable().defaultTo('');
    timestamps(t);
  });

  await knex.schema.createTable('clutches', (t) => {
    t.increments('id');
    t.integer('pairing_id').notNullable().references('id').inTable('pairings');
    t.string('laid_on').notNullable();
    t.integer('fertile_eggs').notNullable();
    t.integer('slugs').notNullable().defaultTo(0);
    t.double('incubation_temp_f');
    t.double('humidity_pct');
    t.string('expected_hatch_from').notNullable();
    t.string('expected_hatch_to').notNullable();
    t.string('hatched_on');
    t.integer('hatchling_count');
    t.text('notes').notNullable().defaultTo('');
    t.string('deleted_at');
    timestamps(t);
  });

  await knex.schema.createTable('environment_readings', (t) => {
    t.increments('id');
    t.integer('rack_id').notNullable().references('id').inTable('racks');
    t.string('taken_at').notNullable();
    t.double('temp_f');
    t.double('humidity_pct');
    t.string('probe').notNullable();
    t.string('source').notNullable().defaultTo('manual');
    t.string('created_by').notNullable().defaultTo('');
    timestamps(t);
    t.index(['rack_id', 'taken_at']);
  });

  await knex.schema.createTable('animal_photos', (t) => {
    t.increments('id');
    t.integer('animal_id').notNullable().references('id').inTable('animals');
    t.string('file_name').notNullable();
    t.string('content_type').notNullable();
    t.integer('size_bytes').notNullable();
    t.string('deleted_at');
    timestamps(t);
  });

  await knex.schema.alterTable('animals', (t) => {
    t.string('origin').notNullable().defaultTo('unknown');
    t.string('acquired_from').notNullable().defaultTo('');
    t.integer('sire_id');
    t.integer('dam_id');
    t.integer('clutch_id');
    t.integer('feeding_interval_days');
    t.boolean('for_sale').notNullable().defaultTo(false);
  });
}

export async function down(knex: Knex): Promise<void> {
  // Tables that point at animals go first: SQLite drops a column by rebuilding the table, which
  // its foreign-key check refuses while rows still point at it.
  for (const table of TABLES) await knex.schema.dropTableIfExists(table);
  await knex.schema.alterTable('animals', (t) => {
    for (const column of ANIMAL_COLUMNS) t.dropColumn(column);
  });
}
