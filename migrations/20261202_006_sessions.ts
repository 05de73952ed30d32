import type { Knex } from 'knex';

/** Server-side sessions (refresh rotation and sign-out), login lockout and single-use password resets. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('auth_sessions', (t) => {
    // Random, never sequential: the id travels inside the refresh token.
    t.string('id').primary();
    t.integer('user_id').notNullable().references('id').inTable('users');
    // Every rotation of one sign-in shares a family; reuse of a spent token revokes the whole family.
    t.string('family').notNullable().index();
    t.string('expires_at').notNullable();
    t.string('revoked_at');
    t.string('replaced_by');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
  });
  await knex.schema.alterTable('users', (t) => {
    t.integer('failed_logins').notNullable().defaultTo(0);
    t.string('locked_until');
  });
  await knex.schema.createTable('password_resets', (t) => {
    t.increments('id');
    t.integer('user_id').notNullable().references('id').inTable('users');
    // Only a hash of the mailed token is kept, as with passwords.
    t.string('token_hash').notNullable().unique();
    t.string('expires_at').notNullable();
    t.string('used_at');
    t.string('created_at').notNullable();
    t.string('updated_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('password_resets');
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('locked_until');
    t.dropColumn('failed_logins');
  });
  await knex.schema.dropTableIfExists('auth_sessions');
}
