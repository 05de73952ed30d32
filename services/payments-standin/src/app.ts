import { randomBytes } from 'node:crypto';
import express, { type Request, type Response } from 'express';
import Stripe from 'stripe';
import { checkoutPage, TEST_CARDS } from './checkout-page.js';

/**
 * A local stand-in for the payment provider: answers the part of its HTTP API that the official
 * SDK calls for deposits (customers, payment intents, hosted checkout sessions, refunds), serves
 * the checkout page a customer pays on, and sends signed webhook events, so the shop's real SDK
 * code runs end to end without leaving this machine.
 */
export interface StandinDeps {
  secretKey: string;
  webhookSecret: string;
  /** Where events are delivered; none means they are only kept in the event list. */
  webhookUrl?: string;
  /** This stand-in's address as a browser reaches it, for checkout page links (default: from the request's Host). */
  publicUrl?: string;
}

type Obj = Record<string, unknown> & { id: string };

const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
const nowS = () => Math.floor(Date.now() / 1000);

function providerError(res: Response, status: number, message: string, param?: string, type = 'invalid_request_error') {
  res.status(status).json({ error: { type, message, ...(param && { param }) } });
}

export function createApp(deps: StandinDeps) {
  const app = express();
  app.disable('x-powered-by');
  const customers = new Map<string, Obj>();
  const intents = new Map<string, Obj>();
  const sessions = new Map<string, Obj>();
  const refunds = new Map<string, Obj>();
  const events: Obj[] = [];
  const signer = new Stripe(deps.secretKey);

  async function emit(type: string, object: Obj): Promise<void> {
    const event = { id: newId('evt'), object: 'event', type, created: nowS(), livemode: false, data: { object } };
    events.unshift(event);
    if (!deps.webhookUrl) return;
    const payload = JSON.stringify(event);
    const signature = signer.webhooks.generateTestHeaderString({ payload, secret: deps.webhookSecret });
    await fetch(deps.webhookUrl, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'stripe-signature': signature },
      body: payload,
      signal: AbortSignal.timeout(5000),
    }).catch((err: Error) => console.warn(`[payments] webhook ${type} not delivered: ${err.message}`));
  }

  app.get('/health', (_req, res) => {
    res.json({ status: 'ok' });
  });

  // The customer's checkout page: no key, the session id in the address is the customer's ticket.
  app.get('/checkout/:id', (req, res) => {
    const session = sessions.get(req.params.id);
    res.status(session ? 200 : 404).type('html').send(checkoutPage(session ?? null));
  });

  app.post('/checkout/:id/pay', express.urlencoded({ extended: false, limit: '10kb' }), async (req, res) => {
    const session = sessions.get(req.params.id);
    if (!session) return res.status(404).type('html').send(checkoutPage(null));
    if (session.status !== 'open') return res.status(409).type('html').send(checkoutPage(session, 'This payment page has already been used.'));
    const card = TEST_CARDS.find((c) => c.number === String((req.body as Record<string, string>).card ?? ''));
    if (!card) return res.status(400).type('html').send(checkoutPage(session, 'Choose one of the test cards.'));
    if (!card.succeeds) return res.status(402).type('html').send(checkoutPage(session, 'Your card was declined. Nothing was charged; try another card.'));
    const intentId = newId('pi');
    const intent: Obj = {
      id: intentId,
      object: 'payment_intent',
      amount: session.amount_total,
      amount_received: session.amount_total,
      currency: session.currency,
      description: session.description ?? null,
      metadata: session.metadata,
      status: 'succeeded',
      payment_method: card.method,
      created: nowS(),
      livemode: false,
    };
    intents.set(intentId, intent);
    Object.assign(session, { status: 'complete', payment_status: 'paid', payment_intent: intentId });
    await emit('checkout.session.completed', session);
    // The shop learns of the payment from the signed event above; the redirect only brings the customer back.
    return res.redirect(303, String(session.success_url).replace('{CHECKOUT_SESSION_ID}', session.id));
  });

  // The SDK sends form-encoded bodies with a bearer secret key.
  app.use('/v1', express.urlencoded({ extended: true, limit: '100kb' }), (req, res, next) => {
    if (req.header('authorization') !== `Bearer ${deps.secretKey}`) {
      return providerError(res, 401, 'Invalid API key provided.', undefined, 'authentication_error');
    }
    next();
  });

  app.post('/v1/customers', (req: Request, res: Response) => {
    const body = req.body as Record<string, string>;
    const customer: Obj = { id: newId('cus'), object: 'customer', created: nowS(), email: body.email ?? null, name: body.name ?? null, metadata: body.metadata ?? {} };
    customers.set(customer.id, customer);
    res.json(customer);
  });

  app.post('/v1/payment_intents', (req: Request, res: Response) => {
    const body = req.body as Record<string, string>;
    const amount = Number(body.amount);
    if (!Number.isInteger(amount) || amount < 50) return providerError(res, 400, 'Amount must be at least 50 cents.', 'amount');
    if (!/^[a-z]{3}$/.test(body.currency ?? '')) return providerError(res, 400, 'Missing or invalid currency.', 'currency');
    const id = newId('pi');
    const intent: Obj = {
      id,
      object: 'payment_intent',
      amount,
      amount_received: 0,
      currency: body.currency,
      customer: body.customer ?? null,
      description: body.description ?? null,
      metadata: body.metadata ?? {},
      status: 'requires_payment_method',
      client_secret: `${id}_secret_${randomBytes(8).toString('hex')}`,
      created: nowS(),
      livemode: false,
    };
    intents.set(id, intent);
    res.json(intent);
  });

  app.get('/v1/payment_intents/:id', (req, res) => {
    const intent = intents.get(req.params.id);
    if (!intent) return providerError(res, 404, `No such payment_intent: '${req.params.id}'`, 'id');
    res.json(intent);
  });

  /** Confirming with the test card `pm_card_visa` succeeds; `pm_card_chargeDeclined` fails, as a provider's test mode does. */
  app.post('/v1/payment_intents/:id/confirm', async (req, res) => {
    const intent = intents.get(req.params.id);
    if (!intent) return providerError(res, 404, `No such payment_intent: '${req.params.id}'`, 'id');
    const method = (req.body as Record<string, string>).payment_method ?? 'pm_card_visa';
    if (method === 'pm_card_chargeDeclined') {
      intent.status = 'requires_payment_method';
      intent.last_payment_error = { code: 'card_declined', message: 'Your card was declined.' };
      await emit('payment_intent.payment_failed', intent);
      return res.status(402).json({ error: { type: 'card_error', code: 'card_declined', message: 'Your card was declined.', payment_intent: intent } });
    }
    intent.status = 'succeeded';
    intent.amount_received = intent.amount;
    intent.payment_method = method;
    await emit('payment_intent.succeeded', intent);
    res.json(intent);
  });

  app.post('/v1/payment_intents/:id/cancel', async (req, res) => {
    const intent = intents.get(req.params.id);
    if (!intent) return providerError(res, 404, `No such payment_intent: '${req.params.id}'`, 'id');
    intent.status = 'canceled';
    await emit('payment_intent.canceled', intent);
    res.json(intent);
  });

  app.post('/v1/checkout/sessions', (req: Request, res: Response) => {
    const body = req.body as Record<string, any>;
    if (body.mode !== 'payment') return providerError(res, 400, 'Only mode=payment is supported here.', 'mode');
    const items = Array.isArray(body.line_items) ? body.line_items : Object.values(body.line_items ?? {});
    if (items.length === 0) return providerError(res, 400, 'line_items is required.', 'line_items');
    let amount = 0;
    let currency = '';
    for (const item of items as Record<string, any>[]) {
      const unit = Number(item?.price_data?.unit_amount);
      const quantity = Number(item?.quantity ?? 1);
      if (!Number.isInteger(unit) || unit < 0 || !Number.isInteger(quantity) || quantity < 1) return providerError(res, 400, 'Invalid line item amount or quantity.', 'line_items');
      currency = String(item.price_data.currency ?? '');
      amount += unit * quantity;
    }
    if (amount < 50) return providerError(res, 400, 'The total must be at least 50 cents.', 'line_items');
    if (!/^[a-z]{3}$/.test(currency)) return providerError(res, 400, 'Missing or invalid currency.', 'line_items');
    for (const field of ['success_url', 'cancel_url']) {
      if (!/^https?:\/\//.test(String(body[field] ?? ''))) return providerError(res, 400, `${field} must be an http(s) URL.`, field);
    }
    const id = newId('cs_test');
    const base = deps.publicUrl ?? `${req.protocol}://${req.get('host')}`;
    const first = items[0] as Record<string, any>;
    const session: Obj = {
      id,
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: amount,
      currency,
      description: first.price_data?.product_data?.name ?? null,
      customer_email: body.customer_email ?? null,
      client_reference_id: body.client_reference_id ?? null,
      metadata: body.metadata ?? {},
      payment_intent: null,
      success_url: body.success_url,
      cancel_url: body.cancel_url,
      url: `${base}/checkout/${id}`,
      created: nowS(),
      livemode: false,
    };
    sessions.set(id, session);
    res.json(session);
  });

  app.get('/v1/checkout/sessions/:id', (req, res) => {
    const session = sessions.get(req.params.id);
    if (!session) return providerError(res, 404, `No such checkout.session: '${req.params.id}'`, 'id');
    res.json(session);
  });

  app.post('/v1/checkout/sessions/:id/expire', async (req, res) => {
    const session = sessions.get(req.params.id);
    if (!session) return providerError(res, 404, `No such checkout.session: '${req.params.id}'`, 'id');
    if (session.status !== 'open') return providerError(res, 400, `Only an open session can be expired; this one is ${session.status}.`, 'id');
    session.status = 'expired';
    await emit('checkout.session.expired', session);
    res.json(session);
  });

  /** A refund against a succeeded payment; answered as succeeded at once, as test mode does, and announced by an event. */
  app.post('/v1/refunds', async (req: Request, res: Response) => {
    const body = req.body as Record<string, any>;
    const intent = intents.get(String(body.payment_intent ?? ''));
    if (!intent) return providerError(res, 404, `No such payment_intent: '${body.payment_intent}'`, 'payment_intent');
    if (intent.status !== 'succeeded') return providerError(res, 400, 'Only a succeeded payment can be refunded.', 'payment_intent');
    const already = [...refunds.values()].filter((r) => r.payment_intent === intent.id).reduce((sum, r) => sum + Number(r.amount), 0);
    const left = Number(intent.amount_received) - already;
    const amount = body.amount === undefined ? left : Number(body.amount);
    if (!Number.isInteger(amount) || amount <= 0) return providerError(res, 400, 'Invalid refund amount.', 'amount');
    if (amount > left) return providerError(res, 400, `Refund amount (${amount}) is greater than unrefunded amount on charge (${left}).`, 'amount');
    const refund: Obj = {
      id: newId('re'),
      object: 'refund',
      amount,
      currency: intent.currency,
      payment_intent: intent.id,
      reason: body.reason ?? null,
      metadata: body.metadata ?? {},
      status: 'succeeded',
      created: nowS(),
    };
    refunds.set(refund.id, refund);
    await emit('refund.created', refund);
    res.json(refund);
  });

  app.get('/v1/events', (_req, res) => {
    res.json({ object: 'list', data: events.slice(0, 100), has_more: events.length > 100, url: '/v1/events' });
  });

  app.use((req, res) => providerError(res, 404, `Unrecognized request URL (${req.method}: ${req.path}).`));
  return app;
}
