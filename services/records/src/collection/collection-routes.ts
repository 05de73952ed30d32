import { Router } from 'express';
import type { RecordsDeps } from '../app.js';

/**
 * The collection areas (racks and tubs, husbandry events, schedules, breeding, environment, import/export).
 * `raw` routes (multipart uploads) mount before the JSON body parser, `json` routes after it.
 */
export function collectionRoutes(_deps: RecordsDeps, _stage: 'raw' | 'json'): Router {
  return Router();
}
