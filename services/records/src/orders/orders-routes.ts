import { Router } from 'express';
import type { RecordsDeps } from '../app.js';
import { invoicesRoutes } from './invoices-routes.js';
import { orderAdminRoutes } from './order-admin-routes.js';
import { orderBookRoutes } from './order-book-routes.js';
import { paymentsRoutes, paymentWebhookRoutes } from './payments-routes.js';
import { refundsRoutes } from './refunds-routes.js';
import { quotesRoutes } from './quotes-routes.js';

/**
 * Quotes, orders, deposits, production, invoices and mail. `raw` routes (the payment provider's
 * signed webhook) mount before the JSON body parser, `json` routes after it.
 */
export function ordersRoutes(deps: RecordsDeps, stage: 'raw' | 'json'): Router {
  if (stage === 'raw') return paymentWebhookRoutes(deps);
  const router = Router();
  router.use(quotesRoutes(deps), orderBookRoutes(deps), paymentsRoutes(deps), refundsRoutes(deps), invoicesRoutes(deps), orderAdminRoutes(deps));
  return router;
}
