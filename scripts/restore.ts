import path from 'node:path';
import { parseArgs } from 'node:util';
import { loadConfig } from '../services/common/src/config.js';
import { liveDatabaseFile, recordsAnswers, restoreDatabase } from './lib/backup.js';

/**
 * `npm run restore -- <backup file> [--force]`: replaces the records database with a backup that
 * passes integrity_check, keeping the replaced one beside it. Refuses while the records service
 * listens, since its open requests would mix the two; stop it first (or pass --force, then restart it).
 */
const { values, positionals } = parseArgs({ options: { force: { type: 'boolean', default: false } }, allowPositionals: true });
if (positionals.length !== 1) {
  console.error('Usage: npm run restore -- <backup file> [--force]');
  process.exit(2);
}
const config = loadConfig();
const backup = path.resolve(positionals[0]!);
if (!values.force && (await recordsAnswers(config.host, config.recordsPort))) {
  console.error(`The records service is running on ${config.host}:${config.recordsPort}; stop it (Ctrl-C in npm start) before restoring, or pass --force and restart it after.`);
  process.exit(1);
}
try {
  const target = liveDatabaseFile(config);
  const { keptAs } = await restoreDatabase(backup, target);
  console.log(`Restored ${target} from ${backup} (integrity ok).`);
  if (keptAs) console.log(`The database it replaced is kept at ${keptAs}.`);
  console.log('Start the product again (npm start); pending migrations run on start.');
} catch (err) {
  console.error(`Restore failed: ${(err as Error).message}`);
  process.exit(1);
}
