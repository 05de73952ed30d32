import path from 'node:path';
import { parseArgs } from 'node:util';
import { loadConfig } from '../services/common/src/config.js';
import { backupDatabase, defaultBackupFile, liveDatabaseFile } from './lib/backup.js';

/** `npm run backup [-- --to file]`: an online copy of the records database, safe while the service runs. */
const { values } = parseArgs({ options: { to: { type: 'string' } } });
const config = loadConfig();
const target = values.to ? path.resolve(values.to) : defaultBackupFile(config.dataDir);
try {
  const source = liveDatabaseFile(config);
  const result = await backupDatabase(source, target);
  console.log(`Backed up ${source} to ${result.file} (${(result.bytes / 1024).toFixed(0)} KiB, ${result.tables} tables, integrity ok).`);
} catch (err) {
  console.error(`Backup failed: ${(err as Error).message}`);
  process.exit(1);
}
