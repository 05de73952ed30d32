import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('api_keys', (t) => {
    t.increments('id');
    t.string('name').notNullable();
    t.string('kind').notNullable(); // publishable | secret
    // The first characters, shown in lists so an owner can tell keys apart; the key itself is never stored.
    t.string('prefix').notNullable();
    t.string('key_hash').notNullable().unique();
    t.text('scopes_json').notNullable();
    t.text('origins_json').notNullable().defaultTo('[]');
    t.integer('created_by');
    t.string('last_used_at');
    t.string('revoked_at');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('api_keys');
}
