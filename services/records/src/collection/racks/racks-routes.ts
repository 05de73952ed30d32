import { Router } from 'express';
import type { Knex } from 'knex';
import { CreateRackRequest, EmptyTubsQuery, PlaceAnimalRequest, RackListQuery, UpdateRackRequest } from '../../../../../shared/api/collection-racks.js';
import { IdParams } from '../../../../../shared/api/common.js';
import { json } from '../../../../common/src/async-handler.js';
import { NotFoundError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { nowIso } from '../../db/knex.js';
import { KEEPERS, actorOf } from '../shared/access.js';
import { liveAnimal } from '../shared/animals-lookup.js';
import { assertNotFuture, toUtcIso } from '../shared/dates.js';
import { createRack, emptyTubs, findRack, listRacks, placeAnimal, placementHistory, rackTubs, removeFromTub, removeRack, updateRack } from './racks-store.js';

/** Installed racks, their tub maps, and where each animal lives. */
export function racksRoutes(db: Knex): Router {
  const router = Router();
  const rackMap = async (id: number) => ({ ...(await findRack(db, id)), tubs: await rackTubs(db, id) });

  router.get('/api/v1/racks', allow(...KEEPERS), json(async (req) => listRacks(db, parseOrThrow(RackListQuery, req.query, 'query'))));

  router.get('/api/v1/racks/:id', allow(...KEEPERS), json(async (req) => rackMap(parseOrThrow(IdParams, req.params).id)));

  router.post(
    '/api/v1/racks',
    allow(...KEEPERS),
    json(async (req, res) => {
      const body = parseOrThrow(CreateRackRequest, req.body);
      const id = await createRack(db, body);
      await audit(db, req.identity, 'create', 'rack', id, body);
      res.status(201);
      return rackMap(id);
    }),
  );

  router.patch(
    '/api/v1/racks/:id',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdateRackRequest, req.body);
      await updateRack(db, id, body);
      await audit(db, req.identity, 'update', 'rack', id, body);
      return rackMap(id);
    }),
  );

  router.delete(
    '/api/v1/racks/:id',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await removeRack(db, id);
      await audit(db, req.identity, 'delete', 'rack', id);
      res.status(204).end();
    }),
  );

  router.get(
    '/api/v1/tubs/empty',
    allow(...KEEPERS),
    json(async (req) => {
      const { rackId } = parseOrThrow(EmptyTubsQuery, req.query, 'query');
      if (rackId) await findRack(db, rackId);
      const items = await emptyTubs(db, rackId);
      return { items, total: items.length };
    }),
  );

  router.get(
    '/api/v1/animals/:id/placements',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await liveAnimal(db, id);
      return placementHistory(db, id);
    }),
  );

  router.put(
    '/api/v1/animals/:id/tub',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(PlaceAnimalRequest, req.body);
      if (body.at) assertNotFuture(body.at, 'at');
      const at = body.at ? toUtcIso(body.at) : nowIso();
      const moved = await placeAnimal(db, id, body.tubId, at, actorOf(req.identity));
      await audit(db, req.identity, 'move', 'animal', id, { tubId: body.tubId, fromTubId: moved.from, at });
      return placementHistory(db, id);
    }),
  );

  router.delete(
    '/api/v1/animals/:id/tub',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await liveAnimal(db, id);
      if (!(await removeFromTub(db, id, nowIso()))) throw new NotFoundError('The animal is in no tub.');
      await audit(db, req.identity, 'unplace', 'animal', id);
      res.status(204).end();
    }),
  );

  return router;
}
