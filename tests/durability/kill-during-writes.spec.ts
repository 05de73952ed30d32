import fs from 'node:fs';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { call, exited, recordsEnv, startRecords, tempDataDir, type RecordsProcess } from './records-process.js';

/*
 * SIGKILL the records service while writers are busy: the SQLite file must open, pass
 * `PRAGMA integrity_check`, and hold every write that got a 2xx answer; a feeding entry for a rack
 * is all or nothing. This covers a crashed or killed process (the OS keeps what was written to the
 * WAL), not a power cut.
 */

const WRITERS = 8;
/** Kill once this many writes were acknowledged, so the burst is well under way. */
const KILL_AFTER_ACKS = 120;

let dataDir = '';
let records: RecordsProcess | undefined;
let restarted: RecordsProcess | undefined;
let setup: Awaited<ReturnType<typeof recordsEnv>>;

interface Rack {
  id: number;
  tubs: { id: number; occupant: { animalId: number } | null }[];
}

const acked = { eventIds: [] as number[], batches: [] as { id: number; rackId: number; eventIds: number[] }[] };
const failures: string[] = [];
let racks: Rack[] = [];
let maxBatchBefore = 0;

beforeAll(async () => {
  dataDir = tempDataDir('kill');
  setup = await recordsEnv(dataDir);
  await prepareDatabase(setup.config.databaseFile, { seed: true });
  records = await startRecords(setup.config, setup.env);
  const list = await call(records.baseUrl, 'GET', '/api/v1/racks?limit=50', 'keeper');
  expect(list.status, JSON.stringify(list.body)).toBe(200);
  for (const item of list.body.items as { id: number }[]) {
    const rack = await call(records.baseUrl, 'GET', `/api/v1/racks/${item.id}`, 'keeper');
    racks.push(rack.body as Rack);
  }
  racks = racks.filter((r) => r.tubs.some((t) => t.occupant));
  const db = new Database(setup.config.databaseFile, { readonly: true });
  maxBatchBefore = (db.prepare('select coalesce(max(id), 0) as n from event_batches').get() as { n: number }).n;
  db.close();
}, 120_000);

afterAll(async () => {
  await records?.stop();
  await restarted?.stop();
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
});

/** One writer: single feedings and whole-rack feeding entries in turn, until the service stops answering. */
async function writer(n: number, baseUrl: string, stopped: () => boolean): Promise<void> {
  for (let i = 0; !stopped(); i++) {
    const rack = racks[(n + i) % racks.length]!;
    const occupied = rack.tubs.filter((t) => t.occupant);
    const occurredAt = new Date(Date.now() - 3600_000).toISOString();
    try {
      if (i % 2 === 0) {
        const animalId = occupied[(n * 7 + i) % occupied.length]!.occupant!.animalId;
        const res = await call(baseUrl, 'POST', `/api/v1/animals/${animalId}/events`, 'keeper', { kind: 'feeding', occurredAt, preyKind: 'rat', preySize: 'small', result: 'accepted', note: `writer ${n} #${i}` });
        if (res.status >= 200 && res.status < 300) acked.eventIds.push(res.body.id);
        else failures.push(`${res.status} ${JSON.stringify(res.body)}`);
      } else {
        const entries = occupied.map((t, k) => ({ tubId: t.id, result: k % 5 === 0 ? 'refused' : 'accepted' }));
        const res = await call(baseUrl, 'POST', `/api/v1/racks/${rack.id}/feeding`, 'keeper', { occurredAt, preyKind: 'mouse', entries });
        if (res.status >= 200 && res.status < 300) acked.batches.push({ id: res.body.id, rackId: rack.id, eventIds: res.body.events.map((e: { id: number }) => e.id) });
        else failures.push(`${res.status} ${JSON.stringify(res.body)}`);
      }
    } catch {
      return; // the connection broke: the process is gone, and this write was never acknowledged
    }
  }
}

describe('records killed with SIGKILL during a burst of writes', () => {
  it('leaves a database that opens, passes integrity_check and holds every acknowledged write', async () => {
    expect(racks.length).toBeGreaterThan(0);
    const proc = records!;
    let killed = false;
    const writers = Array.from({ length: WRITERS }, (_, n) => writer(n, proc.baseUrl, () => killed));
    const ackCount = () => acked.eventIds.length + acked.batches.length;
    const deadline = Date.now() + 60_000;
    while (ackCount() < KILL_AFTER_ACKS && Date.now() < deadline && failures.length === 0) await new Promise((r) => setTimeout(r, 5));
    expect(failures, 'writes refused before the kill').toEqual([]);
    expect(ackCount(), `acknowledged writes before the deadline\n${proc.output()}`).toBeGreaterThanOrEqual(KILL_AFTER_ACKS);
    // Mid-burst: every writer has a request in flight at this moment.
    proc.child.kill('SIGKILL');
    await exited(proc.child);
    killed = true;
    await Promise.all(writers);
    expect(proc.child.signalCode).toBe('SIGKILL');

    // Opened read-write, as the service would on its next start (a WAL left behind is recovered).
    const db = new Database(setup.config.databaseFile, { fileMustExist: true });
    try {
      expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(db.pragma('foreign_key_check')).toEqual([]);

      const eventIds = [...acked.eventIds, ...acked.batches.flatMap((b) => b.eventIds)];
      const present = new Set((db.prepare(`select id from events where id in (${eventIds.map(() => '?').join(',')})`).pluck().all(...eventIds)) as number[]);
      const missing = eventIds.filter((id) => !present.has(id));
      expect(missing, `${missing.length} of ${eventIds.length} acknowledged events missing`).toEqual([]);
      expect(present.size).toBe(eventIds.length);

      const batchIds = acked.batches.map((b) => b.id);
      const storedBatches = db.prepare(`select count(*) from event_batches where id in (${batchIds.map(() => '?').join(',')})`).pluck().get(...batchIds);
      expect(storedBatches).toBe(batchIds.length);

      // All or nothing: each feeding entry written in the burst (acknowledged or not) has one event per occupied tub.
      const perRack = new Map(racks.map((r) => [r.id, r.tubs.filter((t) => t.occupant).length]));
      const written = db
        .prepare('select b.id, b.rack_id as rackId, count(e.id) as events from event_batches b left join events e on e.batch_id = b.id where b.id > ? group by b.id')
        .all(maxBatchBefore) as { id: number; rackId: number; events: number }[];
      expect(written.length).toBeGreaterThanOrEqual(batchIds.length);
      for (const batch of written) expect(batch.events, `feeding entry ${batch.id}`).toBe(perRack.get(batch.rackId));
    } finally {
      db.close();
    }
  }, 120_000);

  it('starts again on the same file and serves the acknowledged writes', async () => {
    restarted = await startRecords(setup.config, setup.env);
    const event = acked.eventIds.at(-1)!;
    const animal = new Database(setup.config.databaseFile, { readonly: true });
    const animalId = animal.prepare('select animal_id from events where id = ?').pluck().get(event) as number;
    animal.close();
    const list = await call(restarted.baseUrl, 'GET', `/api/v1/animals/${animalId}/events?kinds=feeding&limit=200`, 'keeper');
    expect(list.status).toBe(200);
    expect(list.body.items.map((e: { id: number }) => e.id)).toContain(event);
    // and it takes new writes
    const more = await call(restarted.baseUrl, 'POST', `/api/v1/animals/${animalId}/events`, 'keeper', { kind: 'cleaning', occurredAt: new Date(Date.now() - 60_000).toISOString() });
    expect(more.status).toBe(201);
  }, 120_000);
});
