import { randomBytes } from 'node:crypto';
import express, { type Request, type Response } from 'express';
import Stripe from 'stripe';

/**
 * A local stand-in for the payment provider: answers the part of its HTTP API that the official
 * SDK calls for deposits (customers, payment intents) and sends signed webhook events, so the
 * shop's real SDK code runs end to end without leaving this machine.
 */
export interface StandinDeps {
  secretKey: string;
  webhookSecret: string;
  /** Where events are delivered; none means they are only kept in the event list. */
  webhookUrl?: string;
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

  app.get('/v1/events', (_req, res) => {
    res.json({ object: 'list', data: events.slice(0, 100), has_more: events.length > 100, url: '/v1/events' });
  });

  app.use((req, res) => providerError(res, 404, `Unrecognized request URL (${req.method}: ${req.path}).`));
  return app;
}
