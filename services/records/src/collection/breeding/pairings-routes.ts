import { Router } from 'express';
import type { Knex } from 'knex';
import { CreateObservationRequest, CreatePairingRequest, PairingListQuery, UpdatePairingRequest } from '../../../../../shared/api/collection-breeding.js';
import { IdParams } from '../../../../../shared/api/common.js';
import type { PairingOutcomesResponse } from '../../../../../shared/api/genetics.js';
import { json } from '../../../../common/src/async-handler.js';
import { ConflictError, UnprocessableError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { insertId, nowIso } from '../../db/knex.js';
import type { CalculatorClient } from '../../lib/calculator-client.js';
import { KEEPERS } from '../shared/access.js';
import { assertNotFuture, assertRealDate } from '../shared/dates.js';
import { genesOf, outcomesRequest } from './genes-store.js';
import { findPairing, listPairings } from './pairings-store.js';

const PAIRING_PATH = '/api/v1/genetics/pairing-outcomes';

/** Pairings, what was seen (introductions, locks) and the outcome table of the pair. */
export function pairingsRoutes(db: Knex, calculator: CalculatorClient): Router {
  const router = Router();

  const checkParent = async (id: number, sex: 'male' | 'female', field: string) => {
    const animal = await db('animals').whereNull('deleted_at').where({ id }).first();
    if (!animal) throw new UnprocessableError(`No animal with id ${id}.`, field);
    if (animal.sex !== sex) throw new UnprocessableError(`${animal.code} is recorded as ${animal.sex}; the ${field === 'sireId' ? 'sire' : 'dam'} must be ${sex}.`, field);
    if (animal.status === 'sold' || animal.status === 'deceased') throw new UnprocessableError(`${animal.code} is ${animal.status}.`, field);
  };
  const checkDates = (body: { ovulationDate?: string | null; preLayShedDate?: string | null }) => {
    for (const field of ['ovulationDate', 'preLayShedDate'] as const) if (body[field]) assertNotFuture(body[field]!, field);
  };

  router.get('/api/v1/pairings', allow(...KEEPERS), json(async (req) => listPairings(db, parseOrThrow(PairingListQuery, req.query, 'query'))));
  router.get('/api/v1/pairings/:id', allow(...KEEPERS), json(async (req) => findPairing(db, parseOrThrow(IdParams, req.params).id)));

  router.post(
    '/api/v1/pairings',
    allow(...KEEPERS),
    json(async (req, res) => {
      const body = parseOrThrow(CreatePairingRequest, req.body);
      checkDates(body);
      await checkParent(body.sireId, 'male', 'sireId');
      await checkParent(body.damId, 'female', 'damId');
      const now = nowIso();
      const id = await insertId(db('pairings'), {
        sire_id: body.sireId, dam_id: body.damId, season: body.season, status: body.status,
        ovulation_date: body.ovulationDate, pre_lay_shed_date: body.preLayShedDate, notes: body.notes, created_at: now, updated_at: now,
      });
      await audit(db, req.identity, 'create', 'pairing', id!, body);
      res.status(201);
      return findPairing(db, id!);
    }),
  );

  router.patch(
    '/api/v1/pairings/:id',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdatePairingRequest, req.body);
      checkDates(body);
      await findPairing(db, id);
      const row: Record<string, unknown> = { updated_at: nowIso() };
      if (body.season !== undefined) row.season = body.season;
      if (body.status !== undefined) row.status = body.status;
      if (body.ovulationDate !== undefined) row.ovulation_date = body.ovulationDate;
      if (body.preLayShedDate !== undefined) row.pre_lay_shed_date = body.preLayShedDate;
      if (body.notes !== undefined) row.notes = body.notes;
      await db('pairings').where({ id }).update(row);
      await audit(db, req.identity, 'update', 'pairing', id, body);
      return findPairing(db, id);
    }),
  );

  router.delete(
    '/api/v1/pairings/:id',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await findPairing(db, id);
      if (await db('clutches').whereNull('deleted_at').where({ pairing_id: id }).first()) throw new ConflictError('The pairing has a clutch; close it instead.');
      await db('pairings').where({ id }).update({ deleted_at: nowIso(), updated_at: nowIso() });
      await audit(db, req.identity, 'delete', 'pairing', id);
      res.status(204).end();
    }),
  );

  router.post(
    '/api/v1/pairings/:id/observations',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(CreateObservationRequest, req.body);
      assertRealDate(body.observedOn, 'observedOn');
      assertNotFuture(body.observedOn, 'observedOn');
      const pairing = await findPairing(db, id);
      const now = nowIso();
      await db.transaction(async (trx) => {
        await trx('pairing_observations').insert({ pairing_id: id, kind: body.kind, observed_on: body.observedOn, notes: body.notes, created_at: now, updated_at: now });
        // The first introduction or lock moves a planned pairing along; later statuses are the keeper's.
        const next = body.kind === 'lock' ? 'locked' : body.kind === 'introduced' ? 'introduced' : null;
        const order = ['planned', 'introduced', 'locked'];
        if (next && order.includes(pairing.status) && order.indexOf(next) > order.indexOf(pairing.status)) await trx('pairings').where({ id }).update({ status: next, updated_at: now });
      });
      await audit(db, req.identity, 'observe', 'pairing', id, body);
      res.status(201);
      return findPairing(db, id);
    }),
  );

  router.get(
    '/api/v1/pairings/:id/outcomes',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const pairing = await findPairing(db, id);
      const genes = await genesOf(db, [pairing.sire.id, pairing.dam.id]);
      const request = outcomesRequest(genes.get(pairing.sire.id)!, genes.get(pairing.dam.id)!);
      if (!request) throw new UnprocessableError('Neither parent has recorded genes; the offspring all look normal.');
      return { pairingId: id, outcomes: await calculator.post<PairingOutcomesResponse>(PAIRING_PATH, request, req.identity) };
    }),
  );

  return router;
}
