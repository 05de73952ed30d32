import http from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from './app.js';

const secretKey = 'sk_test_standin_spec';
const webhookSecret = 'whsec_standin_spec';
const received: Stripe.Event[] = [];
const servers: http.Server[] = [];
let stripe: Stripe;
let standinPort = 0;

function listen(app: http.RequestListener): Promise<number> {
  const server = http.createServer(app);
  servers.push(server);
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve((server.address() as AddressInfo).port)));
}

beforeAll(async () => {
  // A webhook receiver that verifies signatures with the SDK, as the shop's own endpoint will.
  const verifier = new Stripe(secretKey);
  const receiver = express();
  receiver.post('/hook', express.raw({ type: 'application/json' }), (req, res) => {
    try {
      received.push(verifier.webhooks.constructEvent(req.body as Buffer, req.header('stripe-signature')!, webhookSecret));
      res.json({ received: true });
    } catch {
      res.status(400).end();
    }
  });
  const hookPort = await listen(receiver);
  standinPort = await listen(createApp({ secretKey, webhookSecret, webhookUrl: `http://127.0.0.1:${hookPort}/hook` }));
  stripe = new Stripe(secretKey, { host: '127.0.0.1', port: standinPort, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
});
afterAll(() => Promise.all(servers.map((s) => new Promise((r) => s.close(r)))));

describe('payments stand-in driven by the provider SDK', () => {
  it('creates a customer and a deposit intent, confirms it and delivers a signed succeeded event', async () => {
    const customer = await stripe.customers.create({ email: 'c@example.test', name: 'C' });
    const intent = await stripe.paymentIntents.create({ amount: 25000, currency: 'usd', customer: customer.id, metadata: { order: '42' } });
    expect(intent.status).toBe('requires_payment_method');
    expect(intent.metadata.order).toBe('42');
    const confirmed = await stripe.paymentIntents.confirm(intent.id, { payment_method: 'pm_card_visa' });
    expect(confirmed.status).toBe('succeeded');
    expect((await stripe.paymentIntents.retrieve(intent.id)).amount_received).toBe(25000);
    const event = received.find((e) => e.type === 'payment_intent.succeeded');
    expect((event?.data.object as Stripe.PaymentIntent).id).toBe(intent.id);
  });

  it('declines the declining test card and rejects a wrong key and a bad amount through the SDK error types', async () => {
    const intent = await stripe.paymentIntents.create({ amount: 1000, currency: 'usd' });
    await expect(stripe.paymentIntents.confirm(intent.id, { payment_method: 'pm_card_chargeDeclined' })).rejects.toBeInstanceOf(Stripe.errors.StripeCardError);
    await expect(stripe.paymentIntents.create({ amount: 10, currency: 'usd' })).rejects.toMatchObject({ param: 'amount' });
    const wrongKey = new Stripe('sk_test_wrong', { host: '127.0.0.1', port: standinPort, protocol: 'http', maxNetworkRetries: 0 });
    await expect(wrongKey.customers.create({})).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
  });
});
