import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { ROOT } from '../../scripts/lib/processes.js';
import { call, recordsEnv, startRecords, tempDataDir, type RecordsProcess } from './records-process.js';

/*
 * Round trip of `npm run backup` and `npm run restore` on the seeded demo database: the backup is
 * taken while writes go on, more writes follow, the restore brings back exactly the backup's rows.
 * The scripts run as child processes with the same environment as the service, as a user runs them.
 */

let dataDir = '';
let setup: Awaited<ReturnType<typeof recordsEnv>>;
let records: RecordsProcess | undefined;
let animalIds: number[] = [];

beforeAll(async () => {
  dataDir = tempDataDir('backup');
  setup = await recordsEnv(dataDir);
  await prepareDatabase(setup.config.databaseFile, { seed: true });
  records = await startRecords(setup.config, setup.env);
  const db = new Database(setup.config.databaseFile, { readonly: true });
  animalIds = db.prepare("select id from animals where status = 'active' order by id limit 10").pluck().all() as number[];
  db.close();
}, 120_000);

afterAll(async () => {
  await records?.stop();
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
});

function runScript(script: string, args: string[], env: NodeJS.ProcessEnv = {}): Promise<{ code: number; output: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['--import', 'tsx', script, ...args], { cwd: ROOT, env: { ...setup.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
    let output = '';
    child.stdout!.on('data', (d: Buffer) => (output += d));
    child.stderr!.on('data', (d: Buffer) => (output += d));
    child.on('close', (code) => resolve({ code: code ?? 1, output }));
  });
}

/** Writers that record feedings until told to stop; returns the ids the service acknowledged. */
function startWriters(count: number) {
  const ids: number[] = [];
  const errors: string[] = [];
  let stop = false;
  const loops = Array.from({ length: count }, async (_, n) => {
    for (let i = 0; !stop; i++) {
      const animalId = animalIds[(n + i) % animalIds.length]!;
      const res = await call(records!.baseUrl, 'POST', `/api/v1/animals/${animalId}/events`, 'keeper', {
        kind: 'feeding', occurredAt: new Date(Date.now() - 3600_000).toISOString(), preyKind: 'rat', result: 'accepted', note: `w${n}-${i}`,
      });
      if (res.status === 201) ids.push(res.body.id);
      else errors.push(`${res.status} ${JSON.stringify(res.body)}`);
    }
  });
  return { ids, errors, stop: async () => ((stop = true), await Promise.all(loops)) };
}

const ids = (file: string, table: string) => {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    return db.prepare(`select id from ${table} order by id`).pluck().all() as number[];
  } finally {
    db.close();
  }
};

/** Row count of every table: the fingerprint a restore must reproduce. */
const counts = (file: string) => {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const tables = db.prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%' order by name").pluck().all() as string[];
    return Object.fromEntries(tables.map((t) => [t, db.prepare(`select count(*) from "${t}"`).pluck().get() as number]));
  } finally {
    db.close();
  }
};

describe('backup and restore, round trip', () => {
  let backupFile = '';
  let beforeBackup: number[] = [];
  let afterBackup: number[] = [];

  it('backs up the live database while writes go on, into data/backups by default', async () => {
    const writers = startWriters(3);
    while (writers.ids.length < 30 && writers.errors.length === 0) await new Promise((r) => setTimeout(r, 10));
    beforeBackup = [...writers.ids];
    const result = await runScript('scripts/backup.ts', []);
    const duringCount = writers.ids.length;
    await writers.stop();
    expect(writers.errors).toEqual([]);
    expect(result.code, result.output).toBe(0);
    expect(duringCount, 'writes acknowledged while the backup ran').toBeGreaterThan(beforeBackup.length);

    const made = fs.readdirSync(path.join(dataDir, 'backups'));
    expect(made).toHaveLength(1);
    expect(made[0]).toMatch(/^tubwright-\d{4}-\d\d-\d\dT\d\d-\d\d-\d\d-\d{3}Z\.sqlite$/);
    backupFile = path.join(dataDir, 'backups', made[0]!);
    expect(result.output).toContain(backupFile);

    const inBackup = new Set(ids(backupFile, 'events'));
    expect(beforeBackup.filter((id) => !inBackup.has(id)), 'writes acknowledged before the backup started').toEqual([]);
    const check = new Database(backupFile, { readonly: true });
    expect(check.pragma('integrity_check', { simple: true })).toBe('ok');
    expect(check.pragma('journal_mode', { simple: true }), 'one self-contained file').toBe('delete');
    check.close();
    expect(fs.existsSync(`${backupFile}-wal`)).toBe(false);
  }, 120_000);

  it('refuses a second backup onto an existing file, and a PostgreSQL database', async () => {
    const again = await runScript('scripts/backup.ts', ['--to', backupFile]);
    expect(again.code).toBe(1);
    expect(again.output).toContain('exists already');
    const postgres = await runScript('scripts/backup.ts', [], { DATABASE_URL: 'postgres://tubwright@127.0.0.1:5432/tubwright' });
    expect(postgres.code).toBe(1);
    expect(postgres.output).toContain('pg_dump');
  }, 60_000);

  it('refuses to restore while the records service runs, or from a file that is not a sound database', async () => {
    const writers = startWriters(2);
    while (writers.ids.length < 20 && writers.errors.length === 0) await new Promise((r) => setTimeout(r, 10));
    await writers.stop();
    expect(writers.errors).toEqual([]);
    afterBackup = writers.ids;
    const live = counts(setup.config.databaseFile);

    const refused = await runScript('scripts/restore.ts', [backupFile]);
    expect(refused.code).toBe(1);
    expect(refused.output).toMatch(/records service is running/);

    await records!.stop();
    const garbage = path.join(dataDir, 'not-a-backup.sqlite');
    fs.writeFileSync(garbage, 'SQLite format 3\0 but not really'.repeat(200));
    const bad = await runScript('scripts/restore.ts', [garbage]);
    expect(bad.code).toBe(1);
    expect(bad.output).toMatch(/not a SQLite database|integrity_check/);
    expect(counts(setup.config.databaseFile)).toEqual(live);
    expect(fs.readdirSync(dataDir).filter((f) => f.includes('before-restore'))).toEqual([]);
  }, 120_000);

  it('restores the backup once the service is stopped, keeping the replaced database', async () => {
    const replaced = counts(setup.config.databaseFile);
    const result = await runScript('scripts/restore.ts', [backupFile]);
    expect(result.code, result.output).toBe(0);

    const live = new Database(setup.config.databaseFile, { readonly: true });
    expect(live.pragma('integrity_check', { simple: true })).toBe('ok');
    live.close();
    expect(counts(setup.config.databaseFile)).toEqual(counts(backupFile));
    expect(ids(setup.config.databaseFile, 'events')).toEqual(ids(backupFile, 'events'));
    const restored = new Set(ids(setup.config.databaseFile, 'events'));
    expect(afterBackup.filter((id) => restored.has(id)), 'writes made after the backup are gone').toEqual([]);

    const kept = fs.readdirSync(dataDir).filter((f) => f.endsWith('.before-restore'));
    expect(kept).toHaveLength(1);
    expect(result.output).toContain(kept[0]);
    expect(counts(path.join(dataDir, kept[0]!))).toEqual(replaced);
    const keptIds = new Set(ids(path.join(dataDir, kept[0]!), 'events'));
    expect(afterBackup.filter((id) => !keptIds.has(id))).toEqual([]);
  }, 120_000);

  it('serves the restored data after a restart', async () => {
    records = await startRecords(setup.config, setup.env);
    const eventId = beforeBackup[0]!;
    const db = new Database(setup.config.databaseFile, { readonly: true });
    const animalId = db.prepare('select animal_id from events where id = ?').pluck().get(eventId) as number;
    db.close();
    const list = await call(records.baseUrl, 'GET', `/api/v1/animals/${animalId}/events?kinds=feeding&limit=200`, 'keeper');
    expect(list.status).toBe(200);
    expect(list.body.items.map((e: { id: number }) => e.id)).toContain(eventId);
    const more = await call(records.baseUrl, 'POST', `/api/v1/animals/${animalId}/events`, 'keeper', { kind: 'cleaning', occurredAt: new Date(Date.now() - 60_000).toISOString() });
    expect(more.status).toBe(201);
  }, 120_000);
});
