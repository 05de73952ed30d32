import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { call, recordsEnv, startRecords, tempDataDir, type RecordsProcess } from './records-process.js';

/*
 * Twenty keepers entering a feeding day at the same moment, against the records service as it
 * starts by default. better-sqlite3 is synchronous: if two pooled connections each hold a write
 * transaction open across awaits, the second waits for the lock inside the busy timeout while
 * blocking the event loop the first needs to commit, and fails with "database is locked" (or
 * every request stalls). One connection per SQLite file queues transactions in the pool instead.
 */

const KEEPERS = 20;

let dataDir = '';
let records: RecordsProcess | undefined;
let racks: { id: number; tubs: { id: number; occupant: unknown }[] }[] = [];

beforeAll(async () => {
  dataDir = tempDataDir('concurrent');
  const setup = await recordsEnv(dataDir);
  await prepareDatabase(setup.config.databaseFile, { seed: true });
  records = await startRecords(setup.config, setup.env);
  const list = await call(records.baseUrl, 'GET', '/api/v1/racks?limit=50', 'keeper');
  for (const item of list.body.items as { id: number }[]) racks.push((await call(records.baseUrl, 'GET', `/api/v1/racks/${item.id}`, 'keeper')).body);
  racks = racks.filter((r) => r.tubs.some((t) => t.occupant));
}, 120_000);

afterAll(async () => {
  await records?.stop();
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
});

/** Status and error message, or status 0 when no answer came within the call's 20 s. */
async function answer(send: () => ReturnType<typeof call>): Promise<{ status: number; error?: string }> {
  try {
    const res = await send();
    return { status: res.status, error: res.body?.error?.message };
  } catch (err) {
    return { status: 0, error: String(err) };
  }
}

describe('concurrent writers', () => {
  it('answers twenty simultaneous new racks (a rack and its tubs in one transaction) with 201', async () => {
    const answers = await Promise.all(
      Array.from({ length: KEEPERS }, async (_, k) => {
        return answer(() => call(records!.baseUrl, 'POST', '/api/v1/racks', 'keeper', { name: `C${k + 1}`, levels: 6, columns: 5 }));
      }),
    );
    expect(answers.filter((a) => a.status !== 201), 'refused racks').toEqual([]);
  }, 180_000);

  it('answers twenty simultaneous feeding entries with 201', async () => {
    expect(racks.length).toBeGreaterThan(0);
    const occurredAt = new Date(Date.now() - 3600_000).toISOString();
    const answers = await Promise.all(
      Array.from({ length: KEEPERS }, async (_, k) => {
        const rack = racks[k % racks.length]!;
        const entries = rack.tubs.filter((t) => t.occupant).map((t) => ({ tubId: t.id, result: 'accepted' }));
        return answer(() => call(records!.baseUrl, 'POST', `/api/v1/racks/${rack.id}/feeding`, 'keeper', { occurredAt, preyKind: 'rat', entries }));
      }),
    );
    expect(answers.filter((a) => a.status !== 201), 'refused entries').toEqual([]);
  }, 180_000);
});
