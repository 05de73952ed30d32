import type { Knex } from 'knex';
import * as foundation from './20261202_001_foundation.js';
import * as plans from './20261202_002_plans.js';
import * as collection from './20261202_003_collection.js';
import * as orders from './20261202_004_orders.js';
import * as apiKeys from './20261202_005_api_keys.js';
import * as sessions from './20261202_006_sessions.js';
import * as orderDetails from './20261202_007_order_details.js';
import * as tubModelPhotos from './20261202_008_tub_model_photos.js';
import * as animalSales from './20261202_009_animal_sales.js';

/**
 * Migrations are listed here rather than read from the folder, so tsx, vitest and compiled
 * output all record the same names. Append new ones; never edit one that has landed.
 */
const migrations: Record<string, Knex.Migration> = {
  '20261202_001_foundation': foundation,
  '20261202_002_plans': plans,
  '20261202_003_collection': collection,
  '20261202_004_orders': orders,
  '20261202_005_api_keys': apiKeys,
  '20261202_006_sessions': sessions,
  '20261202_007_order_details': orderDetails,
  '20261202_008_tub_model_photos': tubModelPhotos,
  '20261202_009_animal_sales': animalSales,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name]!,
};
