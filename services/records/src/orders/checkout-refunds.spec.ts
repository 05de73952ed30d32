import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_INTERNAL_SECRET, type recordsTestApp } from '../test-support.js';
import { acceptedOrder, asCustomerLink, builder, owner, paymentsTestStack, postWebhook, sales } from './orders-test-helpers.js';
import { quoteLinkToken } from './quote-link-token.js';

/**
 * Hosted checkout and refunds end to end: the provider SDK creates the session at the stand-in,
 * the customer's card is chosen on the stand-in's own page, and every effect on the order comes
 * from the stand-in's signed events, delivered through a forwarder playing the gateway.
 */
let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
let stack: Awaited<ReturnType<typeof paymentsTestStack>>;
let forwarder: Awaited<ReturnType<typeof paymentsTestStack>>['forwarder'];

beforeAll(async () => {
  stack = await paymentsTestStack();
  ({ ctx, forwarder } = stack);
});
afterAll(() => stack.close());

const orderOf = async (id: number) => (await request(ctx.app).get(`/api/v1/orders/${id}`).set(sales())).body;
/** Presses Pay on the stand-in's page with one of its test cards, as the customer's browser would. */
const payOnPage = (checkoutUrl: string, card: string) => request(new URL(checkoutUrl).origin).post(`${new URL(checkoutUrl).pathname}/pay`).type('form').send({ card });

describe('a deposit paid on the provider\'s checkout page', () => {
  it('opens a page for the deposit, refuses a declined card, and counts the payment only from the signed event', async () => {
    const { order } = await acceptedOrder(ctx.app, [{ kind: 'item', description: 'Rack, 8 x 3', quantity: 1, unitPriceCents: 120000 }]);
    const created = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({ kind: 'deposit', via: 'checkout' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ via: 'checkout', kind: 'deposit', amountCents: 60000, status: 'pending', refundedCents: 0 });
    expect(created.body.providerId).toMatch(/^cs_test_/);
    expect(created.body.checkoutUrl).toBe(`${ctx.paymentsUrl}/checkout/${created.body.providerId}`);

    const page = await request(ctx.paymentsUrl).get(new URL(created.body.checkoutUrl).pathname);
    expect(page.status).toBe(200);
    expect(page.text).toContain(`Deposit for order ${order.number}`);
    expect(page.text).toContain('$600.00');

    const declined = await payOnPage(created.body.checkoutUrl, '4000000000000002');
    expect(declined.status).toBe(402);
    expect(declined.text).toContain('declined');
    expect((await orderOf(order.id)).status).toBe('awaiting_deposit');

    const paid = await payOnPage(created.body.checkoutUrl, '4242424242424242');
    expect(paid.status).toBe(303);
    // Back to the customer's own quote page; the redirect itself changes nothing.
    expect(paid.headers.location).toMatch(/\/quote\/Q-\d{4}-\d+\.[\w-]+\?payment=received$/);
    const after = await orderOf(order.id);
    expect(after).toMatchObject({ status: 'deposit_paid', paidCents: 60000, balanceCents: 60000 });
    const payment = (await request(ctx.app).get(`/api/v1/orders/${order.id}/payments`).set(sales())).body.items[0];
    expect(payment).toMatchObject({ status: 'succeeded', via: 'checkout' });
    expect((await ctx.db('payments').where({ id: payment.id }).first()).intent_id).toMatch(/^pi_/);

    // The same completed event delivered again has no second effect; a used page takes no second payment.
    const completed = forwarder.delivered.find((d) => d.payload.includes('checkout.session.completed') && d.payload.includes(created.body.providerId))!;
    expect((await postWebhook(ctx.app, completed.payload, completed.signature)).body).toEqual({ received: true, duplicate: true });
    expect((await payOnPage(created.body.checkoutUrl, '4242424242424242')).status).toBe(409);
    expect((await orderOf(order.id)).paidCents).toBe(60000);
  });

  it('can be withdrawn before it is paid, after which its page takes no payment', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const created = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({ via: 'checkout' });
    const withdrawn = await request(ctx.app).post(`/api/v1/payments/${created.body.id}/cancel`).set(sales());
    expect([withdrawn.status, withdrawn.body.status]).toEqual([200, 'canceled']);
    expect((await payOnPage(created.body.checkoutUrl, '4242424242424242')).status).toBe(409);
    expect((await orderOf(order.id)).paidCents).toBe(0);
    expect((await request(ctx.app).post(`/api/v1/payments/${created.body.id}/cancel`).set(sales())).status).toBe(409);
    const card = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({ via: 'card' });
    expect((await request(ctx.app).post(`/api/v1/payments/${card.body.id}/cancel`).set(owner())).body.status).toBe('canceled');
    expect((await request(ctx.app).post(`/api/v1/payments/${card.body.id}/cancel`).set(builder())).status).toBe(403);
  });

  it('is not confirmed from the console: the customer pays it on the page', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const created = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({ via: 'checkout' });
    const confirm = await request(ctx.app).post(`/api/v1/payments/${created.body.id}/confirm`).set(sales()).send({});
    expect(confirm.status).toBe(409);
  });

  it('lets the customer pay from their quote link, reusing one page for repeated presses', async () => {
    const { quote, order } = await acceptedOrder(ctx.app);
    const sentAt = (await ctx.db('quotes').where({ id: quote.id }).first('sent_at')).sent_at as string;
    const token = quoteLinkToken(TEST_INTERNAL_SECRET, quote, sentAt);
    const before = await request(ctx.app).get(`/api/v1/quote-links/${token}`).set(asCustomerLink());
    expect(before.body).toMatchObject({ orderNumber: order.number, orderStatus: 'awaiting_deposit', depositDueNowCents: order.depositDueCents, paidCents: 0 });

    const first = await request(ctx.app).post(`/api/v1/quote-links/${token}/pay`).set(asCustomerLink());
    const second = await request(ctx.app).post(`/api/v1/quote-links/${token}/pay`).set(asCustomerLink());
    expect(first.status).toBe(200);
    expect(second.body.checkoutUrl).toBe(first.body.checkoutUrl);
    expect(await ctx.db('payments').where({ order_id: order.id }).count({ n: '*' }).first()).toEqual({ n: 1 });

    await payOnPage(first.body.checkoutUrl, '4242424242424242');
    const after = await request(ctx.app).get(`/api/v1/quote-links/${token}`).set(asCustomerLink());
    expect(after.body).toMatchObject({ orderStatus: 'deposit_paid', depositDueNowCents: 0, paidCents: order.depositDueCents });
    expect((await request(ctx.app).post(`/api/v1/quote-links/${token}/pay`).set(asCustomerLink())).status).toBe(409);
    const mail = ctx.mailStore.list().find((m) => m.subject.includes(`deposit received for ${order.number}`));
    expect(mail).toBeDefined();
  });
});

describe('refunds through the provider', () => {
  let orderId = 0;

  it('refunds everything paid when an order is cancelled, once, and tells the customer', async () => {
    const { order } = await acceptedOrder(ctx.app, [{ kind: 'item', description: 'Rack, 5 x 2', quantity: 1, unitPriceCents: 40000 }]);
    orderId = order.id;
    const created = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({ via: 'checkout' });
    await payOnPage(created.body.checkoutUrl, '4242424242424242');
    expect((await request(ctx.app).post(`/api/v1/orders/${order.id}/stage`).set(sales()).send({ stage: 'cancelled', note: 'customer moved' })).status).toBe(200);

    const refund = await request(ctx.app).post(`/api/v1/orders/${order.id}/refunds`).set(sales()).set('Idempotency-Key', `refund-${order.id}`).send({ reason: 'Order cancelled by the customer' });
    expect(refund.status).toBe(201);
    expect(refund.body.items).toHaveLength(1);
    expect(refund.body.items[0]).toMatchObject({ amountCents: 20000, status: 'succeeded', reason: 'Order cancelled by the customer' });
    expect(refund.body.items[0].providerId).toMatch(/^re_/);
    expect(await orderOf(order.id)).toMatchObject({ status: 'cancelled', paidCents: 0, refundedCents: 20000 });

    // A retry with the same key answers the same refunds; a new request finds nothing left.
    const retry = await request(ctx.app).post(`/api/v1/orders/${order.id}/refunds`).set(sales()).set('Idempotency-Key', `refund-${order.id}`).send({ reason: 'Order cancelled by the customer' });
    expect(retry.body.items[0].id).toBe(refund.body.items[0].id);
    const again = await request(ctx.app).post(`/api/v1/orders/${order.id}/refunds`).set(sales()).send({ reason: 'twice' });
    expect([again.status, again.body.error.field]).toEqual([409, 'amountCents']);

    // The provider's refund event replayed: no second effect.
    const event = forwarder.delivered.find((d) => d.payload.includes('"refund.created"') && d.payload.includes(refund.body.items[0].providerId))!;
    expect((await postWebhook(ctx.app, event.payload, event.signature)).body.duplicate).toBe(true);
    expect((await orderOf(order.id)).refundedCents).toBe(20000);
    expect(ctx.mailStore.list().some((m) => m.subject.includes(`refund for ${order.number}`))).toBe(true);
    const list = await request(ctx.app).get(`/api/v1/orders/${order.id}/refunds`).set(owner());
    expect(list.body.items).toHaveLength(1);
  });

  it('gives part back on an open order, which then owes it again', async () => {
    const { order } = await acceptedOrder(ctx.app, [{ kind: 'item', description: 'Rack, 4 x 2', quantity: 1, unitPriceCents: 30000 }]);
    const created = await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({ via: 'checkout' });
    await payOnPage(created.body.checkoutUrl, '4242424242424242');
    const partial = await request(ctx.app).post(`/api/v1/orders/${order.id}/refunds`).set(owner()).send({ amountCents: 2500, reason: 'Scratched side panel' });
    expect(partial.status).toBe(201);
    expect(await orderOf(order.id)).toMatchObject({ paidCents: 12500, refundedCents: 2500, balanceCents: 17500 });
    const tooMuch = await request(ctx.app).post(`/api/v1/orders/${order.id}/refunds`).set(owner()).send({ amountCents: 12501, reason: 'x' });
    expect([tooMuch.status, tooMuch.body.error.field]).toEqual([409, 'amountCents']);
  });

  it('checks roles and input', async () => {
    expect((await request(ctx.app).post(`/api/v1/orders/${orderId}/refunds`).set(builder()).send({ reason: 'x' })).status).toBe(403);
    expect((await request(ctx.app).get(`/api/v1/orders/${orderId}/refunds`).set(builder())).status).toBe(403);
    expect((await request(ctx.app).post(`/api/v1/orders/${orderId}/refunds`).send({ reason: 'x' })).status).toBe(401);
    for (const [body, field] of [
      [{}, 'reason'],
      [{ reason: 'x', amountCents: -5 }, 'amountCents'],
      [{ reason: 'x', amountCents: 12.5 }, 'amountCents'],
      [{ reason: 'x', extra: 1 }, 'body'],
    ] as const) {
      const res = await request(ctx.app).post(`/api/v1/orders/${orderId}/refunds`).set(sales()).send(body);
      expect([res.status, res.body.error.field]).toEqual([400, field]);
    }
    expect((await request(ctx.app).post('/api/v1/orders/99999/refunds').set(sales()).send({ reason: 'x' })).status).toBe(404);
  });
});
