import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { recordsTestApp } from '../test-support.js';
import { acceptedOrder, asWebhookSystem, builder, owner, paymentsTestStack, postWebhook, sales, signedEvent } from './orders-test-helpers.js';

/**
 * End to end: the provider SDK talks to the stand-in, the stand-in signs and delivers its events to
 * a small forwarder playing the gateway, which posts them to the records app with the system identity.
 */
let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
let stack: Awaited<ReturnType<typeof paymentsTestStack>>;
let delivered: { payload: string; signature: string }[];

beforeAll(async () => {
  stack = await paymentsTestStack();
  ({ ctx } = stack);
  delivered = stack.forwarder.delivered;
});
afterAll(() => stack.close());

describe('deposits through the provider SDK and its signed webhook', () => {
  let orderId = 0;
  let paymentId = 0;

  it('creates the deposit payment once per Idempotency-Key', async () => {
    const { order } = await acceptedOrder(ctx.app, [{ kind: 'item', description: 'Rack, 8 x 2', quantity: 1, unitPriceCents: 90001 }]);
    orderId = order.id;
    // 50 % of $900.01 = 45 000.5 cents -> 45 001 (half-up)
    expect(order.depositDueCents).toBe(45001);
    const first = await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`).set(sales()).set('Idempotency-Key', `dep-${orderId}`).send({ kind: 'deposit' });
    const retry = await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`).set(sales()).set('Idempotency-Key', `dep-${orderId}`).send({ kind: 'deposit' });
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ kind: 'deposit', amountCents: 45001, currency: 'usd', status: 'pending' });
    expect(first.body.providerId).toMatch(/^pi_/);
    expect(first.body.clientSecret).toMatch(/_secret_/);
    expect(retry.body.id).toBe(first.body.id);
    expect(await ctx.db('payments').where({ order_id: orderId }).count({ n: '*' }).first()).toEqual({ n: 1 });
    paymentId = first.body.id;
  });

  it('marks the deposit paid when the provider\'s event arrives, moves the order and e-mails the customer', async () => {
    const confirmed = await request(ctx.app).post(`/api/v1/payments/${paymentId}/confirm`).set(sales()).send({ paymentMethod: 'pm_card_visa' });
    expect(confirmed.status).toBe(200);
    // The stand-in delivers the event before it answers the confirm call.
    expect(confirmed.body.status).toBe('succeeded');
    expect(JSON.parse(delivered.at(-1)!.payload).type).toBe('payment_intent.succeeded');
    const order = await request(ctx.app).get(`/api/v1/orders/${orderId}`).set(sales());
    expect(order.body).toMatchObject({ status: 'deposit_paid', paidCents: 45001, balanceCents: 45000 });
    expect(order.body.stages.map((s: { stage: string; by: string }) => [s.stage, s.by])).toEqual([['awaiting_deposit', 'sales@example.test'], ['deposit_paid', 'payments-webhook']]);
    expect(ctx.mailStore.list().some((m) => m.subject.includes(`deposit received for ${order.body.number}`))).toBe(true);
  });

  it('applies the same event delivered twice only once', async () => {
    const again = delivered.at(-1)!;
    const res = await postWebhook(ctx.app, again.payload, again.signature);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ received: true, duplicate: true });
    const order = await request(ctx.app).get(`/api/v1/orders/${orderId}`).set(sales());
    expect(order.body.paidCents).toBe(45001);
    expect(order.body.stages).toHaveLength(2);
  });

  it('refuses a bad signature with 400 and changes nothing', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const payment = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({});
    const forged = signedEvent('whsec_not_the_shop_secret', 'payment_intent.succeeded', { id: payment.body.providerId, amount: payment.body.amountCents });
    const res = await postWebhook(ctx.app, forged.payload, forged.signature);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'invalid_signature', field: 'stripe-signature' });
    const tampered = signedEvent(ctx.stripeWebhookSecret, 'payment_intent.succeeded', { id: payment.body.providerId, amount: 1 });
    expect((await postWebhook(ctx.app, tampered.payload.replace('"amount":1', '"amount":2'), tampered.signature)).status).toBe(400);
    const noHeader = await request(ctx.app).post('/api/v1/payments/webhook').set(asWebhookSystem()).set('content-type', 'application/json').send('{}');
    expect([noHeader.status, noHeader.body.error.field]).toEqual([400, 'stripe-signature']);
    expect((await request(ctx.app).get(`/api/v1/orders/${order.id}`).set(sales())).body.status).toBe('awaiting_deposit');
    expect((await ctx.db('payments').where({ id: payment.body.id }).first()).status).toBe('pending');
  });

  it('takes the webhook only from the gateway\'s system identity', async () => {
    expect((await request(ctx.app).post('/api/v1/payments/webhook').send('{}')).status).toBe(401);
    expect((await request(ctx.app).post('/api/v1/payments/webhook').set(owner()).send('{}')).status).toBe(403);
  });

  it('records a declined card as failed and lets the same payment be tried again', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const payment = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({ kind: 'deposit' });
    const declined = await request(ctx.app).post(`/api/v1/payments/${payment.body.id}/confirm`).set(sales()).send({ paymentMethod: 'pm_card_chargeDeclined' });
    expect(declined.status).toBe(422);
    expect(declined.body.error.code).toBe('card_declined');
    const list = await request(ctx.app).get(`/api/v1/orders/${order.id}/payments`).set(sales());
    expect(list.body.items[0]).toMatchObject({ status: 'failed', failureMessage: 'Your card was declined.' });
    const retried = await request(ctx.app).post(`/api/v1/payments/${payment.body.id}/confirm`).set(sales()).send({ paymentMethod: 'pm_card_visa' });
    expect(retried.body.status).toBe('succeeded');
    expect((await request(ctx.app).get(`/api/v1/orders/${order.id}`).set(sales())).body.status).toBe('deposit_paid');
  });

  it('takes the balance after the deposit, and refuses a second deposit', async () => {
    const second = await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`).set(sales()).send({ kind: 'deposit' });
    expect(second.status).toBe(409);
    expect(second.body.error.field).toBe('kind');
    const balance = await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`).set(owner()).send({ kind: 'balance' });
    expect(balance.body.amountCents).toBe(45000);
    await request(ctx.app).post(`/api/v1/payments/${balance.body.id}/confirm`).set(owner()).send({});
    const order = await request(ctx.app).get(`/api/v1/orders/${orderId}`).set(sales());
    expect(order.body).toMatchObject({ paidCents: 90001, balanceCents: 0, status: 'deposit_paid' });
    expect((await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`).set(owner()).send({ kind: 'balance' })).status).toBe(409);
  });

  it('ignores a verified event for a payment the shop never made', async () => {
    const stray = signedEvent(ctx.stripeWebhookSecret, 'payment_intent.succeeded', { id: 'pi_elsewhere', amount: 500 });
    const res = await postWebhook(ctx.app, stray.payload, stray.signature);
    expect(res.body).toEqual({ received: true, duplicate: false });
  });

  it('checks roles, input and unknown records on the payment routes', async () => {
    expect((await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`).set(builder()).send({})).status).toBe(403);
    expect((await request(ctx.app).get(`/api/v1/orders/${orderId}/payments`).set(builder())).status).toBe(403);
    expect((await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`)).status).toBe(401);
    const badKind = await request(ctx.app).post(`/api/v1/orders/${orderId}/payments`).set(sales()).send({ kind: 'tip' });
    expect([badKind.status, badKind.body.error.field]).toEqual([400, 'kind']);
    const badMethod = await request(ctx.app).post(`/api/v1/payments/${paymentId}/confirm`).set(sales()).send({ paymentMethod: 'visa' });
    expect([badMethod.status, badMethod.body.error.field]).toEqual([400, 'paymentMethod']);
    expect((await request(ctx.app).post('/api/v1/orders/99999/payments').set(sales()).send({})).status).toBe(404);
    expect((await request(ctx.app).post('/api/v1/payments/99999/confirm').set(sales()).send({})).status).toBe(404);
    expect((await request(ctx.app).post(`/api/v1/payments/${paymentId}/confirm`).set(sales()).send({})).status).toBe(409);
  });
});
