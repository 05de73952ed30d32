import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Express } from 'express';
import request from 'supertest';
import Stripe from 'stripe';
import { IDENTITY_HEADER, signIdentity } from '../../../common/src/internal-identity.js';
import { asRole, recordsTestApp, TEST_INTERNAL_SECRET } from '../test-support.js';

/** The header the gateway adds when it forwards the provider's webhook. */
export function asWebhookSystem(): Record<string, string> {
  return { [IDENTITY_HEADER]: signIdentity({ kind: 'gateway', sub: 'payments-webhook', role: 'system' }, TEST_INTERNAL_SECRET) };
}

/** The header the gateway adds for a customer's quote link (no account). */
export const asCustomerLink = () => ({ [IDENTITY_HEADER]: signIdentity({ kind: 'gateway', sub: 'customer-link', role: 'system' }, TEST_INTERNAL_SECRET) });

export const sales = () => asRole('sales');
export const owner = () => asRole('owner');
export const builder = () => asRole('builder');
export const keeper = () => asRole('keeper');

/** A sent quote of plain lines for a seeded customer, accepted into an order. */
export async function acceptedOrder(app: Express, lines: unknown[] = [{ kind: 'item', description: 'Test rack, 6 x 2', quantity: 1, unitPriceCents: 50000 }]) {
  const quote = await request(app).post('/api/v1/quotes').set(sales()).send({ customerId: 1, lines });
  if (quote.status !== 201) throw new Error(`quote: ${quote.status} ${JSON.stringify(quote.body)}`);
  const sent = await request(app).post(`/api/v1/quotes/${quote.body.id}/send`).set(sales());
  if (sent.status !== 200) throw new Error(`send: ${sent.status} ${JSON.stringify(sent.body)}`);
  const order = await request(app).post('/api/v1/orders').set(sales()).send({ quoteId: quote.body.id, deliveryMethod: 'pickup' });
  if (order.status !== 201) throw new Error(`order: ${order.status} ${JSON.stringify(order.body)}`);
  return { quote: quote.body, order: order.body };
}

/** A payment_intent event signed the way the provider signs it, for posting to the webhook directly. */
export function signedEvent(secret: string, type: string, intent: Record<string, unknown>, id = `evt_test_${Math.random().toString(36).slice(2)}`) {
  const payload = JSON.stringify({ id, object: 'event', type, created: Math.floor(Date.now() / 1000), livemode: false, data: { object: { object: 'payment_intent', ...intent } } });
  const signature = new Stripe('sk_test_unused').webhooks.generateTestHeaderString({ payload, secret });
  return { payload, signature, id };
}

export function postWebhook(app: Express, payload: string, signature: string) {
  return request(app).post('/api/v1/payments/webhook').set(asWebhookSystem()).set('content-type', 'application/json').set('stripe-signature', signature).send(payload);
}

/** Creates the deposit payment through the SDK, then delivers a signed success event for it. */
export async function payDeposit(app: Express, secret: string, orderId: number) {
  const payment = await request(app).post(`/api/v1/orders/${orderId}/payments`).set(sales()).send({ kind: 'deposit' });
  if (payment.status !== 201) throw new Error(`payment: ${payment.status} ${JSON.stringify(payment.body)}`);
  const event = signedEvent(secret, 'payment_intent.succeeded', { id: payment.body.providerId, amount: payment.body.amountCents, amount_received: payment.body.amountCents, status: 'succeeded' });
  const res = await postWebhook(app, event.payload, event.signature);
  if (res.status !== 200) throw new Error(`webhook: ${res.status} ${JSON.stringify(res.body)}`);
  return payment.body;
}

/**
 * A small forwarder playing the gateway: receives the stand-in's signed events and posts them to
 * the records app with the system identity. Start it before the app (the stand-in needs its URL).
 */
export async function webhookForwarder() {
  const delivered: { payload: string; signature: string; status: number }[] = [];
  let target: Express | undefined;
  const server = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', async () => {
      const payload = Buffer.concat(chunks).toString('utf8');
      const signature = String(req.headers['stripe-signature'] ?? '');
      const answer = await postWebhook(target!, payload, signature);
      delivered.push({ payload, signature, status: answer.status });
      res.writeHead(answer.status, { 'content-type': 'application/json' }).end(JSON.stringify(answer.body));
    });
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/v1/payments/webhook`,
    delivered,
    deliverTo: (app: Express) => {
      target = app;
    },
    close: () => new Promise((r) => server.close(r)),
  };
}

/**
 * A seeded records app whose payment stand-in delivers its signed events back to it through a
 * forwarder, with an invented shop's 50 % deposit and no tax.
 */
export async function paymentsTestStack() {
  const forwarder = await webhookForwarder();
  const ctx = await recordsTestApp({ seed: true, webhookUrl: forwarder.url });
  forwarder.deliverTo(ctx.app);
  await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ taxRatePercent: 0, depositPercent: 50 });
  return {
    ctx,
    forwarder,
    close: async () => {
      await ctx.close();
      await forwarder.close();
    },
  };
}
