import type { Knex } from 'knex';
import type { z } from 'zod';
import type { BulkFeedingRequest, CreateEventRequest, EventKind, HusbandryEvent } from '../../../../../shared/api/collection-husbandry.js';
import { ConflictError, NotFoundError } from '../../../../common/src/errors.js';
import { insertId, nowIso } from '../../db/knex.js';
import { eventPayload, rowToEvent, type EventRow } from './event-rules.js';

export const liveEvents = (db: Knex) =>
  db('events as e')
    .join('animals as a', 'a.id', 'e.animal_id')
    .whereNull('e.deleted_at')
    .select('e.id', 'e.animal_id', 'a.code as animal_code', 'e.kind', 'e.occurred_at', 'e.payload_json', 'e.batch_id', 'e.created_by', 'e.created_at');

/** The animal's weight column follows its latest recorded weight (also after an undo). */
export async function syncLatestWeight(db: Knex, animalId: number): Promise<void> {
  const latest = (await db('events')
    .where({ animal_id: animalId, kind: 'weight' })
    .whereNull('deleted_at')
    .orderBy([{ column: 'occurred_at', order: 'desc' }, { column: 'id', order: 'desc' }])
    .first()) as { payload_json: string } | undefined;
  if (!latest) return;
  const weightG = Math.round(JSON.parse(latest.payload_json).weightG as number);
  await db('animals').where({ id: animalId }).update({ weight_g: weightG, updated_at: nowIso() });
}

export async function insertEvent(db: Knex, animalId: number, event: CreateEventRequest & { occurredAt: string }, actor: string, batchId: number | null = null): Promise<number> {
  const now = nowIso();
  const id = await insertId(db('events'), {
    animal_id: animalId,
    kind: event.kind,
    occurred_at: event.occurredAt,
    payload_json: JSON.stringify(eventPayload(event)),
    batch_id: batchId,
    created_by: actor,
    created_at: now,
    updated_at: now,
  });
  return id!;
}

export async function findEvent(db: Knex, id: number): Promise<HusbandryEvent> {
  const row = (await liveEvents(db).where('e.id', id).first()) as EventRow | undefined;
  if (!row) throw new NotFoundError(`No event with id ${id}.`);
  return rowToEvent(row);
}

export async function listAnimalEvents(db: Knex, animalId: number, query: { kinds?: string; limit: number; offset: number; sort: string }) {
  let q = liveEvents(db).where('e.animal_id', animalId);
  if (query.kinds) q = q.whereIn('e.kind', query.kinds.split(',') as EventKind[]);
  const count = (await q.clone().clearSelect().count({ n: '*' }).first()) as { n: number };
  const order = query.sort.startsWith('-') ? 'desc' : 'asc';
  const rows = (await q.orderBy([{ column: 'e.occurred_at', order }, { column: 'e.id', order }]).limit(query.limit).offset(query.offset)) as EventRow[];
  return { items: rows.map(rowToEvent), total: Number(count.n), limit: query.limit, offset: query.offset };
}

export async function weightPoints(db: Knex, animalId: number) {
  const rows = (await db('events')
    .where({ animal_id: animalId, kind: 'weight' })
    .whereNull('deleted_at')
    .orderBy([{ column: 'occurred_at' }, { column: 'id' }])
    .select('occurred_at', 'payload_json')) as { occurred_at: string; payload_json: string }[];
  return rows.map((r) => ({ occurredAt: r.occurred_at, weightG: JSON.parse(r.payload_json).weightG as number }));
}

export async function removeEvent(db: Knex, id: number): Promise<HusbandryEvent> {
  const event = await findEvent(db, id);
  await db.transaction(async (trx) => {
    await trx('events').where({ id }).update({ deleted_at: nowIso(), updated_at: nowIso() });
    if (event.kind === 'weight') await syncLatestWeight(trx, event.animalId);
  });
  return event;
}

export async function findBatch(db: Knex, id: number) {
  const batch = await db('event_batches').where({ id }).first();
  if (!batch) throw new NotFoundError(`No bulk entry with id ${id}.`);
  const rows = (await db('events as e')
    .join('animals as a', 'a.id', 'e.animal_id')
    .where('e.batch_id', id)
    .select('e.id', 'e.animal_id', 'a.code as animal_code', 'e.kind', 'e.occurred_at', 'e.payload_json', 'e.batch_id', 'e.created_by', 'e.created_at')
    .orderBy('e.id')) as EventRow[];
  return {
    id: batch.id as number,
    rackId: batch.rack_id as number,
    kind: batch.kind as EventKind,
    occurredAt: batch.occurred_at as string,
    eventCount: rows.length,
    undoneAt: (batch.undone_at as string | null) ?? null,
    events: rows.map(rowToEvent),
  };
}

/** Undo of a whole bulk entry: its events are soft-deleted together; a second undo is a conflict. */
export async function undoBatch(db: Knex, id: number) {
  const batch = await findBatch(db, id);
  if (batch.undoneAt) throw new ConflictError(`Bulk entry ${id} was undone at ${batch.undoneAt}.`);
  const now = nowIso();
  await db.transaction(async (trx) => {
    await trx('events').where({ batch_id: id }).whereNull('deleted_at').update({ deleted_at: now, updated_at: now });
    await trx('event_batches').where({ id }).update({ undone_at: now, updated_at: now });
  });
  return findBatch(db, id);
}

/** One event per tub of a feeding-day entry, with the entry itself, in one transaction. */
export function writeFeedingBatch(
  db: Knex,
  rackId: number,
  occurredAt: string,
  actor: string,
  body: z.infer<typeof BulkFeedingRequest>,
  occupantByTub: ReadonlyMap<number, number | null>,
): Promise<number> {
  return db.transaction(async (trx) => {
    const now = nowIso();
    const batchId = await insertId(trx('event_batches'), { rack_id: rackId, kind: 'feeding', occurred_at: occurredAt, created_by: actor, created_at: now, updated_at: now });
    for (const entry of body.entries) {
      const preySize = entry.preySize ?? body.preySize;
      await insertEvent(
        trx,
        occupantByTub.get(entry.tubId)!,
        {
          kind: 'feeding',
          occurredAt,
          preyKind: entry.preyKind ?? body.preyKind,
          ...(preySize && { preySize }),
          ...(entry.preyMassG !== undefined && { preyMassG: entry.preyMassG }),
          result: entry.result,
          note: entry.note ?? '',
        },
        actor,
        batchId!,
      );
    }
    return batchId!;
  });
}
