import fs from 'node:fs';
import { parseArgs } from 'node:util';
import { copyDatabase } from '../services/records/src/db/copy-database.js';
import { databaseKind, openDatabase, sqliteFile } from '../services/records/src/db/knex.js';

/**
 * `npm run db:copy -- --from sqlite:data/tubwright.sqlite --to postgres://user@host/db`: moves a
 * shop's records to another database (either direction). Stop the services first, so nothing is
 * written to the source meanwhile; the target must be empty.
 */
const USAGE = 'Usage: npm run db:copy -- --from <sqlite:file | postgres://…> --to <sqlite:file | postgres://…>';

const hide = (target: string) => target.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:***@');

async function main(): Promise<number> {
  let values: { from?: string; to?: string };
  try {
    ({ values } = parseArgs({ options: { from: { type: 'string' }, to: { type: 'string' } }, strict: true }));
  } catch (err) {
    console.error(`${(err as Error).message}\n${USAGE}`);
    return 2;
  }
  const { from, to } = values;
  if (!from || !to) {
    console.error(USAGE);
    return 2;
  }
  if (from === to) {
    console.error('--from and --to name the same database.');
    return 2;
  }
  if (databaseKind(from) === 'sqlite' && !fs.existsSync(sqliteFile(from))) {
    console.error(`No SQLite file at ${sqliteFile(from)}.`);
    return 2;
  }
  console.log(`Copying ${hide(from)} -> ${hide(to)}`);
  const source = openDatabase(from);
  const target = openDatabase(to);
  try {
    const report = await copyDatabase(source, target, (line) => console.log(`  ${line}`));
    console.log(`Copied ${report.totalRows} rows in ${report.tables.length} tables; every count matches.`);
    return 0;
  } catch (err) {
    console.error(`Not copied: ${(err as Error).message}`);
    return 1;
  } finally {
    await Promise.all([source.destroy(), target.destroy()]);
  }
}

process.exit(await main());
