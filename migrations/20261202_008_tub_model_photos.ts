import type { Knex } from 'knex';

/**
 * An optional photo per tub model. Replaced and removed photos stay as soft-deleted rows (their
 * files too), so a removal can be undone by hand; `tub_models.photo_id` points at the current one.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('tub_model_photos', (t) => {
    t.increments('id');
    t.integer('tub_model_id').notNullable().references('id').inTable('tub_models');
    t.string('file_name').notNullable();
    t.string('content_type').notNullable();
    t.integer('size_bytes').notNullable();
    // A small copy made by the client; null when none was sent (the original is served instead).
    t.string('thumbnail_file_name');
    t.string('thumbnail_content_type');
    t.string('deleted_at');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
    t.index(['tub_model_id']);
  });
  // No foreign key: adding one to an existing SQLite table rebuilds it; the routes keep the link.
  await knex.schema.alterTable('tub_models', (t) => {
    t.integer('photo_id');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('tub_models', (t) => {
    t.dropColumn('photo_id');
  });
  await knex.schema.dropTableIfExists('tub_model_photos');
}
