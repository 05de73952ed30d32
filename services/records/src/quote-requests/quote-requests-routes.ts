import { Router, type Request, type RequestHandler } from 'express';
import type { z } from 'zod';
import { OrderStatusParams, QuoteRequestBody, type QuoteRequestReceipt, WidgetSettings } from '../../../../shared/api/quote-requests.js';
import type { RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { json } from '../../../common/src/async-handler.js';
import { ApiError, ForbiddenError, ValidationError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { nowIso } from '../db/knex.js';
import { idempotent } from '../orders/idempotency.js';
import { sendLogged, shopName } from '../orders/mail-notices.js';
import { readOrderSettings } from '../orders/order-settings.js';
import { actorOf } from '../orders/quotes-routes.js';
import { costToCents, describeRack } from '../orders/rack-pricing.js';
import { findQuote, insertQuote, isoDatePlusDays } from '../orders/quotes-store.js';
import { percentToBp } from '../orders/quote-totals.js';
import { findOrCreateLead } from './lead-store.js';
import { statusByReference } from './order-status.js';
import { shopNoticeMail, visitorConfirmationMail, type RequestFacts } from './quote-request-mail.js';
import { readWidgetSettings, shopEmail, writeWidgetSettings } from './widget-settings.js';

type Receipt = z.output<typeof QuoteRequestReceipt>;
// Kinds of our own, listed in MAIL_KINDS (shared/api/orders.ts) so GET /mail-log can show them.
const SHOP_NOTICE = 'quote_request_received';
const VISITOR_CONFIRMATION = 'quote_request_confirmation';

/** The gateway checks a key's scopes; checked again here so no other path into the service skips it. */
function scope(name: string): RequestHandler {
  return (req, _res, next) => {
    const who = req.identity;
    if (who?.role === 'integrator' && !who.scopes?.includes(name)) return next(new ForbiddenError(`This key lacks the ${name} scope.`));
    next();
  };
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** A top-level `unit` fills in spec.unit when the spec leaves it out; when both are given they must agree. */
function parseRequest(raw: unknown): z.output<typeof QuoteRequestBody> {
  const unitOnlyOutside = isObject(raw) && isObject(raw.spec) && raw.unit !== undefined && raw.spec.unit === undefined;
  const body = parseOrThrow(QuoteRequestBody, unitOnlyOutside ? { ...raw, spec: { ...(raw.spec as object), unit: raw.unit } } : raw);
  if (body.unit !== undefined && body.unit !== body.spec.unit) throw new ValidationError(`unit is ${body.unit} but spec.unit is ${body.spec.unit}; give one or make them agree.`, 'unit');
  return body;
}

/** The rack is planned by the calculator on the caller's behalf; its field names are moved under `spec`. */
async function planRack(deps: RecordsDeps, req: Request, spec: Record<string, unknown>): Promise<RackPlanResponse> {
  try {
    return await deps.calculator.post<RackPlanResponse>('/api/v1/calc/rack-plan', spec, req.identity);
  } catch (err) {
    if (err instanceof ApiError && err.status < 500) throw new ApiError(err.status, err.code, err.message, err.field ? `spec.${err.field}` : 'spec', err.details);
    throw err;
  }
}

export function quoteRequestsRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();

  router.post(
    '/api/v1/quote-requests',
    allow('integrator', 'owner', 'sales'),
    scope('quote-requests'),
    json(async (req, res) =>
      idempotent(db, req, res, async () => {
        const body = parseRequest(req.body);
        const spec = body.spec as Record<string, unknown>;
        // Priced before anything is written: a spec the calculator refuses leaves no lead behind.
        const plan = await planRack(deps, req, spec);
        const [settings, widget] = await Promise.all([readOrderSettings(db), readWidgetSettings(db)]);
        const visitor = { name: body.name, email: body.email, phone: body.phone, note: body.note, source: body.source };
        const consentAt = nowIso();
        const { lead, quoteId } = await db.transaction(async (trx) => {
          const lead = await findOrCreateLead(trx, req.identity, visitor);
          const quoteId = await insertQuote(
            trx,
            lead.customerId,
            {
              validUntil: isoDatePlusDays(settings.quoteValidDays),
              currency: settings.currency,
              // Quote notes reach the customer when the quote is sent, so only their own words go here.
              notes: body.note ? `Your note: ${body.note}` : '',
              rates: { taxRateBp: percentToBp(settings.taxRatePercent), discountBp: 0, depositBp: percentToBp(settings.depositPercent) },
            },
            [{ kind: 'rack', description: describeRack(spec, plan), planId: null, spec, quantity: 1, unitPriceCents: costToCents(plan.cost.total) }],
            actorOf(req),
          );
          await audit(trx, req.identity, 'create', 'quote request', quoteId, { customerId: lead.customerId, newCustomer: lead.created, source: body.source, consentAt });
          return { lead, quoteId };
        });
        const quote = await findQuote(db, quoteId);
        const estimate = { totalCents: quote.totalCents, currency: quote.currency };
        const facts: RequestFacts = {
          reference: quote.number,
          shop: await shopName(db),
          visitor,
          rackDescription: quote.lines[0]!.description,
          dimensions: plan,
          estimate,
          existingCustomer: !lead.created,
        };
        // A failed send is in mail_log for the shop to see; the request itself is safely recorded.
        const notice = { customerId: lead.customerId, entity: 'quote' as const, entityId: quoteId };
        await sendLogged(db, deps.mailer, shopNoticeMail(facts, await shopEmail(db, deps.mailer.from)), { kind: SHOP_NOTICE, ...notice });
        await sendLogged(db, deps.mailer, visitorConfirmationMail(facts, widget.showPrices), { kind: VISITOR_CONFIRMATION, ...notice });
        const d = plan.dimensions;
        const receipt: Receipt = {
          reference: quote.number,
          status: 'received',
          // Internal ids are for staff: a key holder has no route that takes them.
          ...(req.identity?.role !== 'integrator' && { customerId: lead.customerId, quoteId }),
          estimate: widget.showPrices ? estimate : null,
          dimensions: { overallWidth: d.overallWidth, overallHeight: d.overallHeight, overallDepth: d.overallDepth, unit: plan.unit },
        };
        return { status: 201, body: receipt };
      }),
    ),
  );

  router.get(
    '/api/v1/order-status/:reference',
    allow('integrator', 'owner', 'sales'),
    scope('order-status'),
    json(async (req) => {
      const { reference } = parseOrThrow(OrderStatusParams, req.params);
      // A key sees only what it asked for itself (see statusByReference).
      return statusByReference(db, reference, req.identity?.role === 'integrator' ? actorOf(req) : undefined);
    }),
  );

  router.get('/api/v1/widget-settings', allow('owner', 'sales'), json(async () => readWidgetSettings(db)));
  // The same, for the widget itself: a page's `show-prices` attribute cannot overrule the shop.
  router.get('/api/v1/quote-requests/settings', allow('integrator', 'owner', 'sales'), scope('quote-requests'), json(async () => readWidgetSettings(db)));

  router.put(
    '/api/v1/widget-settings',
    allow('owner'),
    json(async (req) => {
      const settings = parseOrThrow(WidgetSettings, req.body);
      await writeWidgetSettings(db, settings);
      await audit(db, req.identity, 'update', 'widget settings', 'widget', settings);
      return readWidgetSettings(db);
    }),
  );

  return router;
}
