import { Router } from 'express';
import type { Knex } from 'knex';
import { CALIBRATION_CAUTION } from '../../../../../shared/api/collection-environment.js';
import { json } from '../../../../common/src/async-handler.js';
import { allow } from '../../../../common/src/roles.js';
import { KEEPERS } from '../shared/access.js';
import { speciesList } from './species-ranges.js';

const ALERT_RANGES = 'Reading alerts use the ball python ranges for every rack.';

/** The species of the collection with their husbandry ranges (read-only; the list follows the animals). */
export function speciesRoutes(db: Knex): Router {
  const router = Router();

  router.get(
    '/api/v1/environment/species',
    allow(...KEEPERS),
    json(async () => {
      const rows = (await db('animals').whereNull('deleted_at').whereIn('status', ['active', 'on-hold']).select('species').count({ n: '*' }).groupBy('species')) as { species: string; n: number | string }[];
      const items = speciesList(rows.map((r) => ({ name: r.species, count: Number(r.n) })));
      return { items, total: items.length, alertRanges: ALERT_RANGES, caution: CALIBRATION_CAUTION };
    }),
  );

  return router;
}
