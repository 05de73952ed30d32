import { Router } from 'express';
import type { Knex } from 'knex';
import { BulkFeedingRequest, CreateEventRequest, EventListQuery } from '../../../../../shared/api/collection-husbandry.js';
import { IdParams } from '../../../../../shared/api/common.js';
import { json } from '../../../../common/src/async-handler.js';
import { UnprocessableError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { idempotent } from '../../orders/idempotency.js';
import { findRack, rackTubs } from '../racks/racks-store.js';
import { suggestedPreyMassG } from '../schedules/feeding-schedule.js';
import { KEEPERS, actorOf } from '../shared/access.js';
import { liveAnimal } from '../shared/animals-lookup.js';
import { assertNotFuture, toUtcIso } from '../shared/dates.js';
import { checkBulkEntries } from './event-rules.js';
import { findBatch, findEvent, insertEvent, listAnimalEvents, removeEvent, syncLatestWeight, undoBatch, weightPoints, writeFeedingBatch } from './events-store.js';

/** Feeding, weights, sheds, cleaning, health and notes; one at a time or a rack at a time. */
export function husbandryRoutes(db: Knex): Router {
  const router = Router();

  router.post(
    '/api/v1/animals/:id/events',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(CreateEventRequest, req.body);
      assertNotFuture(body.occurredAt, 'occurredAt');
      await liveAnimal(db, id);
      const eventId = await db.transaction(async (trx) => {
        const created = await insertEvent(trx, id, { ...body, occurredAt: toUtcIso(body.occurredAt) }, actorOf(req.identity));
        if (body.kind === 'weight') await syncLatestWeight(trx, id);
        return created;
      });
      await audit(db, req.identity, 'create', 'event', eventId, { animalId: id, kind: body.kind });
      res.status(201);
      return findEvent(db, eventId);
    }),
  );

  router.get(
    '/api/v1/animals/:id/events',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const query = parseOrThrow(EventListQuery, req.query, 'query');
      await liveAnimal(db, id);
      return listAnimalEvents(db, id, query);
    }),
  );

  router.get(
    '/api/v1/animals/:id/weights',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await liveAnimal(db, id);
      const points = await weightPoints(db, id);
      const latestWeightG = points.at(-1)?.weightG ?? null;
      return { animalId: id, points, latestWeightG, suggestedPreyMassG: suggestedPreyMassG(latestWeightG) };
    }),
  );

  router.delete(
    '/api/v1/events/:id',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await removeEvent(db, id);
      await audit(db, req.identity, 'delete', 'event', id);
      res.status(204).end();
    }),
  );

  router.post(
    '/api/v1/racks/:id/feeding',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id: rackId } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(BulkFeedingRequest, req.body);
      assertNotFuture(body.occurredAt, 'occurredAt');
      await findRack(db, rackId);
      const tubs = await rackTubs(db, rackId);
      const occupantByTub = new Map(tubs.map((t) => [t.id, t.occupant?.animalId ?? null]));
      const problem = checkBulkEntries(body.entries, occupantByTub);
      if (problem) throw new UnprocessableError(`${problem.field}: ${problem.message}`, problem.field);
      const occurredAt = toUtcIso(body.occurredAt);
      const actor = actorOf(req.identity);
      // Feeding day runs on a phone in the snake room: a retry with the same Idempotency-Key writes once.
      return idempotent(db, req, res, async () => {
        const batchId = await writeFeedingBatch(db, rackId, occurredAt, actor, body, occupantByTub);
        await audit(db, req.identity, 'create', 'event_batch', batchId, { rackId, entries: body.entries.length });
        return { status: 201, body: await findBatch(db, batchId) };
      });
    }),
  );

  router.delete(
    '/api/v1/event-batches/:id',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const batch = await undoBatch(db, id);
      await audit(db, req.identity, 'undo', 'event_batch', id);
      return batch;
    }),
  );

  return router;
}
