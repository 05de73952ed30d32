import type { Knex } from 'knex';

/** A quote line may sell an animal from the collection; handing the order over marks it sold. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('quote_lines', (t) => {
    // No foreign key, like plan_id: SQLite cannot drop a column that has one, and animals are only soft-deleted.
    t.integer('animal_id');
  });
}

export async function down(knex: Knex): Promise<void> {
  // Dropped in place: knex would copy the table on SQLite (see 007).
  await knex.raw('ALTER TABLE ?? DROP COLUMN ??', ['quote_lines', 'animal_id']);
}
