import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import Database from 'better-sqlite3';
import type { Config } from '../../services/common/src/config.js';
import { databaseKind, sqliteFile } from '../../services/records/src/db/knex.js';

/*
 * Online backup and restore of the records database through SQLite's backup API, so both are
 * consistent while the records service has the file open (WAL mode: readers never block writers).
 */

/** Copies every page in one step: stepping a few pages at a time would restart on each write the service makes meanwhile. */
const ALL_PAGES = 0x7fffffff;

/** The SQLite file the records service uses; PostgreSQL has its own tools. */
export function liveDatabaseFile(config: Config): string {
  if (databaseKind(config.databaseUrl) === 'postgres') {
    throw new Error('The records database is PostgreSQL (DATABASE_URL); use pg_dump and pg_restore for it.');
  }
  return path.resolve(sqliteFile(config.databaseUrl));
}

export interface BackupResult {
  file: string;
  bytes: number;
  tables: number;
}

/** data/backups/tubwright-2026-12-02T09-30-00-000Z.sqlite (no colons, so it is a valid name everywhere). */
export function defaultBackupFile(dataDir: string, now = new Date()): string {
  return path.join(dataDir, 'backups', `tubwright-${now.toISOString().replace(/[:.]/g, '-')}.sqlite`);
}

/** What `PRAGMA integrity_check` says about a file: 'ok' or the problems it lists. */
export function integrityOf(file: string): string {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const rows = db.pragma('integrity_check', { simple: false }) as { integrity_check: string }[];
    return rows.map((r) => r.integrity_check).join('; ');
  } finally {
    db.close();
  }
}

function tableCount(db: Database.Database): number {
  return db.prepare("select count(*) from sqlite_master where type = 'table' and name not like 'sqlite_%'").pluck().get() as number;
}

/**
 * Backs up a live database into `target` (which must not exist), then makes the copy a single
 * self-contained file (rollback journal instead of WAL) and checks it.
 */
export async function backupDatabase(source: string, target: string): Promise<BackupResult> {
  if (!fs.existsSync(source)) throw new Error(`There is no database at ${source}.`);
  if (fs.existsSync(target)) throw new Error(`${target} exists already; choose another name.`);
  fs.mkdirSync(path.dirname(target), { recursive: true });
  const live = new Database(source, { readonly: true, fileMustExist: true });
  try {
    await live.backup(target, { progress: () => ALL_PAGES });
  } finally {
    live.close();
  }
  const copy = new Database(target, { fileMustExist: true });
  let tables: number;
  try {
    copy.pragma('journal_mode = DELETE');
    tables = tableCount(copy);
  } finally {
    copy.close();
  }
  const integrity = integrityOf(target);
  if (integrity !== 'ok') throw new Error(`The backup ${target} fails integrity_check: ${integrity}`);
  return { file: target, bytes: fs.statSync(target).size, tables };
}

export interface RestoreResult {
  /** Where the replaced database was kept, when there was one. */
  keptAs: string | null;
}

/** Checks that a file is a sound Tubwright database before anything is replaced with it. */
export function checkRestorable(backup: string): void {
  if (!fs.existsSync(backup)) throw new Error(`There is no backup at ${backup}.`);
  let integrity: string;
  try {
    integrity = integrityOf(backup);
  } catch (err) {
    throw new Error(`${backup} is not a SQLite database: ${(err as Error).message}`);
  }
  if (integrity !== 'ok') throw new Error(`${backup} fails integrity_check, so it is not restored: ${integrity}`);
  const db = new Database(backup, { readonly: true, fileMustExist: true });
  try {
    const migrations = db.prepare("select count(*) from sqlite_master where type = 'table' and name = 'knex_migrations'").pluck().get();
    if (!migrations) throw new Error(`${backup} is not a Tubwright database (no knex_migrations table).`);
  } finally {
    db.close();
  }
}

/**
 * Replaces the database at `target` with `backup`. The current database is first backed up beside
 * it as `<target>.<time>.before-restore`; the restore itself writes through SQLite (not a file
 * copy), so a WAL file left beside the target can never be replayed over the restored pages.
 */
export async function restoreDatabase(backup: string, target: string, now = new Date()): Promise<RestoreResult> {
  checkRestorable(backup);
  let keptAs: string | null = null;
  if (fs.existsSync(target)) {
    keptAs = `${target}.${now.toISOString().replace(/[:.]/g, '-')}.before-restore`;
    await backupDatabase(target, keptAs);
  } else {
    fs.mkdirSync(path.dirname(target), { recursive: true });
  }
  const source = new Database(backup, { readonly: true, fileMustExist: true });
  try {
    await source.backup(target, { progress: () => ALL_PAGES });
  } finally {
    source.close();
  }
  const restored = new Database(target, { fileMustExist: true });
  try {
    restored.pragma('journal_mode = WAL');
  } finally {
    restored.close();
  }
  const integrity = integrityOf(target);
  if (integrity !== 'ok') throw new Error(`The restored database fails integrity_check: ${integrity}${keptAs ? `; the previous one is at ${keptAs}` : ''}`);
  return { keptAs };
}

/** True when anything accepts a connection on the records port: the service, or something in its place. */
export function recordsAnswers(host: string, port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host, port });
    const done = (up: boolean) => {
      socket.destroy();
      resolve(up);
    };
    socket.setTimeout(1500, () => done(false));
    socket.once('connect', () => done(true));
    socket.once('error', () => done(false));
  });
}
