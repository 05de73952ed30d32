import { Router } from 'express';
import type { RecordsDeps } from '../app.js';
import { profileRoutes } from './animals/profile-routes.js';
import { clutchesRoutes } from './breeding/clutches-routes.js';
import { pairingsRoutes } from './breeding/pairings-routes.js';
import { traitsRoutes } from './breeding/traits-routes.js';
import { environmentRoutes } from './environment/environment-routes.js';
import { speciesRoutes } from './environment/species-routes.js';
import { husbandryRoutes } from './husbandry/husbandry-routes.js';
import { importExportRoutes } from './import-export/import-export-routes.js';
import { photosRoutes } from './photos/photos-routes.js';
import { racksRoutes } from './racks/racks-routes.js';
import { schedulesRoutes } from './schedules/schedules-routes.js';

/**
 * The collection areas (racks and tubs, husbandry events, schedules, breeding, environment, import/export).
 * `raw` routes (multipart uploads) mount before the JSON body parser, `json` routes after it.
 */
export function collectionRoutes(deps: RecordsDeps, stage: 'raw' | 'json'): Router {
  const router = Router();
  // Photos need a directory; until RecordsDeps carries one, the upload routes answer 503.
  router.use(photosRoutes(deps.db, deps.uploadsDir, stage));
  if (stage === 'raw') return router;
  router.use(racksRoutes(deps.db));
  router.use(husbandryRoutes(deps.db));
  router.use(schedulesRoutes(deps.db, deps.mailer));
  router.use(traitsRoutes(deps.db));
  router.use(pairingsRoutes(deps.db, deps.calculator));
  router.use(clutchesRoutes(deps.db, deps.calculator));
  router.use(environmentRoutes(deps.db));
  router.use(speciesRoutes(deps.db));
  router.use(importExportRoutes(deps.db));
  router.use(profileRoutes(deps.db));
  return router;
}
