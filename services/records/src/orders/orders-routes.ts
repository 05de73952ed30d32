import { Router } from 'express';
import type { RecordsDeps } from '../app.js';

/**
 * Quotes, orders, deposits, production, invoices and mail. `raw` routes (the payment provider's
 * signed webhook) mount before the JSON body parser, `json` routes after it.
 */
export function ordersRoutes(_deps: RecordsDeps, _stage: 'raw' | 'json'): Router {
  return Router();
}
