import { Router } from 'express';
import type { RecordsDeps } from '../app.js';

/** Saved plans, the shop's price list and materials (issue: planning module). */
export function plansRoutes(_deps: RecordsDeps): Router {
  return Router();
}
