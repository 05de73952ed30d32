import type { Knex } from 'knex';
import * as foundation from './20261202_001_foundation.js';

/**
 * Migrations are listed here rather than read from the folder, so tsx, vitest and compiled
 * output all record the same names. Append new ones; never edit one that has landed.
 */
const migrations: Record<string, Knex.Migration> = {
  '20261202_001_foundation': foundation,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name]!,
};
