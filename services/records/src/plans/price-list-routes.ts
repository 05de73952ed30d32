import { Router } from 'express';
import type { Knex } from 'knex';
import { MaterialKeyParams, PutMaterialRequest, UpdatePriceListRequest } from '../../../../shared/api/plans.js';
import { json } from '../../../common/src/async-handler.js';
import { ValidationError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { audit } from '../audit/audit-log.js';
import { MissingLabelError, priceListStore } from './price-list-store.js';

/** Roles that read prices and materials: sales quote from them, builders plan with them. */
export const PRICE_READ_ROLES = ['owner', 'builder', 'sales'] as const;

/** The shop's price list and materials; only the owner changes them. */
export function priceListRoutes(db: Knex): Router {
  const store = priceListStore(db);
  const router = Router();

  router.get(
    '/api/v1/price-list',
    allow(...PRICE_READ_ROLES),
    json(async () => ({ items: await store.listPrices() })),
  );

  router.put(
    '/api/v1/price-list',
    allow('owner'),
    json(async (req) => {
      const body = parseOrThrow(UpdatePriceListRequest, req.body);
      try {
        const items = await store.upsertPrices(body.items);
        await audit(db, req.identity, 'update', 'price list', null, { items: body.items });
        return { items };
      } catch (err) {
        if (err instanceof MissingLabelError) throw new ValidationError(`items[${err.index}].label: is required for a key the calculator does not know`, `items[${err.index}].label`);
        throw err;
      }
    }),
  );

  router.get(
    '/api/v1/materials',
    allow(...PRICE_READ_ROLES),
    json(async () => ({ items: await store.listMaterials() })),
  );

  router.put(
    '/api/v1/materials/:key',
    allow('owner'),
    json(async (req, res) => {
      const { key } = parseOrThrow(MaterialKeyParams, req.params);
      const body = parseOrThrow(PutMaterialRequest, req.body);
      const { created, item } = await store.putMaterial(key, body);
      await audit(db, req.identity, created ? 'create' : 'update', 'material', key, body);
      res.status(created ? 201 : 200);
      return item;
    }),
  );

  return router;
}
