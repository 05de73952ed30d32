import { Router } from 'express';
import type { Knex } from 'knex';
import { CreateTraitRequest, SetGenesRequest, TraitListQuery, UpdateTraitRequest } from '../../../../../shared/api/collection-breeding.js';
import { IdParams } from '../../../../../shared/api/common.js';
import { json } from '../../../../common/src/async-handler.js';
import { ConflictError, NotFoundError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { insertId, nowIso } from '../../db/knex.js';
import { listPage } from '../../lib/list.js';
import { KEEPERS, KEEPERS_AND_SALES } from '../shared/access.js';
import { liveAnimal } from '../shared/animals-lookup.js';
import { genesOf, setGenes } from './genes-store.js';

type TraitRow = { id: number; name: string; mode: string; notes: string; created_at: string };
const toTrait = (r: TraitRow) => ({ id: r.id, name: r.name, mode: r.mode, notes: r.notes, createdAt: r.created_at });

/** The shop's trait list (sales read it to describe animals for sale) and each animal's genes. */
export function traitsRoutes(db: Knex): Router {
  const router = Router();
  const find = async (id: number) => {
    const row = (await db('traits').where({ id }).first()) as TraitRow | undefined;
    if (!row) throw new NotFoundError(`No trait with id ${id}.`);
    return toTrait(row);
  };

  router.get(
    '/api/v1/traits',
    allow(...KEEPERS_AND_SALES),
    json(async (req) => {
      const query = parseOrThrow(TraitListQuery, req.query, 'query');
      let rows = db('traits');
      if (query.mode) rows = rows.where({ mode: query.mode });
      return listPage(rows, query, { columns: { name: 'name', mode: 'mode' }, searchColumns: ['name', 'notes'], defaultSort: 'name', toItem: toTrait });
    }),
  );

  router.get('/api/v1/traits/:id', allow(...KEEPERS_AND_SALES), json(async (req) => find(parseOrThrow(IdParams, req.params).id)));

  router.post(
    '/api/v1/traits',
    allow(...KEEPERS),
    json(async (req, res) => {
      const body = parseOrThrow(CreateTraitRequest, req.body);
      if (await db('traits').whereRaw('lower(name) = lower(?)', [body.name]).first()) throw new ConflictError(`The trait ${body.name} is on the list already.`, 'name');
      const now = nowIso();
      const id = await insertId(db('traits'), { ...body, created_at: now, updated_at: now });
      await audit(db, req.identity, 'create', 'trait', id!, body);
      res.status(201);
      return find(id!);
    }),
  );

  router.patch(
    '/api/v1/traits/:id',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdateTraitRequest, req.body);
      const trait = await find(id);
      if (body.name !== undefined && (await db('traits').whereRaw('lower(name) = lower(?)', [body.name]).whereNot({ id }).first())) {
        throw new ConflictError(`The trait ${body.name} is on the list already.`, 'name');
      }
      // Recessive genes are het/visual, the others single/super: a carried trait keeps its family.
      if (body.mode !== undefined && (body.mode === 'recessive') !== (trait.mode === 'recessive') && (await db('animal_genes').where({ trait_id: id }).first())) {
        throw new ConflictError(`Animals carry ${trait.name} as ${trait.mode}; change their genes first, or add a new trait.`, 'mode');
      }
      await db('traits').where({ id }).update({ ...body, updated_at: nowIso() });
      await audit(db, req.identity, 'update', 'trait', id, body);
      return find(id);
    }),
  );

  // Removed for good only while no animal carries it: genes are history.
  router.delete(
    '/api/v1/traits/:id',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const trait = await find(id);
      if (await db('animal_genes').where({ trait_id: id }).first()) throw new ConflictError(`Animals carry ${trait.name}; it stays on the list.`);
      await db('traits').where({ id }).delete();
      await audit(db, req.identity, 'delete', 'trait', id, { name: trait.name });
      res.status(204).end();
    }),
  );

  router.get(
    '/api/v1/animals/:id/genes',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await liveAnimal(db, id);
      return { animalId: id, genes: (await genesOf(db, [id])).get(id)! };
    }),
  );

  router.put(
    '/api/v1/animals/:id/genes',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(SetGenesRequest, req.body);
      await liveAnimal(db, id);
      await setGenes(db, id, body.genes);
      await audit(db, req.identity, 'set_genes', 'animal', id, body);
      return { animalId: id, genes: (await genesOf(db, [id])).get(id)! };
    }),
  );

  return router;
}
