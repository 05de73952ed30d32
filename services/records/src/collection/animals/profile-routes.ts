import { Router } from 'express';
import type { Knex } from 'knex';
import { Animal } from '../../../../../shared/api/animals.js';
import { UpdateProfileRequest } from '../../../../../shared/api/collection-animals.js';
import { IdParams } from '../../../../../shared/api/common.js';
import { json } from '../../../../common/src/async-handler.js';
import { UnprocessableError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { nowIso } from '../../db/knex.js';
import { rowToItem } from '../../lib/resource-routes.js';
import { genesOf } from '../breeding/genes-store.js';
import { placementHistory } from '../racks/racks-store.js';
import { KEEPERS, KEEPERS_AND_SALES } from '../shared/access.js';
import { liveAnimal } from '../shared/animals-lookup.js';

const ANIMAL_FIELDS = Object.keys(Animal.shape);

/** What the collection keeps about an animal beyond the foundation's record, and the for-sale list. */
export function profileRoutes(db: Knex): Router {
  const router = Router();

  const profile = async (id: number) => {
    const row = await liveAnimal(db, id);
    return {
      animal: rowToItem(row, ANIMAL_FIELDS),
      origin: row.origin,
      acquiredFrom: row.acquired_from,
      sireId: row.sire_id,
      damId: row.dam_id,
      clutchId: row.clutch_id,
      feedingIntervalDays: row.feeding_interval_days,
      forSale: Boolean(row.for_sale),
      currentTub: (await placementHistory(db, id)).current,
      genes: (await genesOf(db, [id])).get(id)!,
    };
  };

  router.get('/api/v1/animals/:id/profile', allow(...KEEPERS), json(async (req) => profile(parseOrThrow(IdParams, req.params).id)));

  router.patch(
    '/api/v1/animals/:id/profile',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdateProfileRequest, req.body);
      const animal = await liveAnimal(db, id);
      for (const [field, sex] of [['sireId', 'male'], ['damId', 'female']] as const) {
        const parentId = body[field];
        if (parentId === undefined || parentId === null) continue;
        if (parentId === id) throw new UnprocessableError('An animal cannot be its own parent.', field);
        const parent = await db('animals').where({ id: parentId }).first();
        if (!parent) throw new UnprocessableError(`No animal with id ${parentId}.`, field);
        if (parent.sex !== sex) throw new UnprocessableError(`${parent.code} is recorded as ${parent.sex}.`, field);
      }
      if (body.forSale && (animal.status === 'sold' || animal.status === 'deceased')) throw new UnprocessableError(`${animal.code} is ${animal.status}.`, 'forSale');
      const change: Record<string, unknown> = { updated_at: nowIso() };
      if (body.origin !== undefined) change.origin = body.origin;
      if (body.acquiredFrom !== undefined) change.acquired_from = body.acquiredFrom;
      if (body.sireId !== undefined) change.sire_id = body.sireId;
      if (body.damId !== undefined) change.dam_id = body.damId;
      if (body.feedingIntervalDays !== undefined) change.feeding_interval_days = body.feedingIntervalDays;
      if (body.forSale !== undefined) change.for_sale = body.forSale;
      await db('animals').where({ id }).update(change);
      await audit(db, req.identity, 'update_profile', 'animal', id, body);
      return profile(id);
    }),
  );

  // Sales see only what is offered: animals in the collection and marked for sale.
  router.get(
    '/api/v1/collection/for-sale',
    allow(...KEEPERS_AND_SALES),
    json(async () => {
      const rows = (await db('animals').whereNull('deleted_at').where({ for_sale: true }).whereIn('status', ['active', 'on-hold']).orderBy('code')) as Record<string, any>[];
      const genes = await genesOf(db, rows.map((r) => r.id));
      const items = rows.map((r) => ({ id: r.id, code: r.code, name: r.name, species: r.species, sex: r.sex, hatchDate: r.hatch_date, weightG: r.weight_g, morph: r.morph, genes: genes.get(r.id)! }));
      return { items, total: items.length };
    }),
  );

  return router;
}
