import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordsTestApp } from '../test-support.js';
import { asCustomerLink, sales } from './orders-test-helpers.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

/** What the gateway forwards for anyone opening /api/v1/quote-links/… (no account). */
const customer = asCustomerLink;

/** A sent quote and the link its e-mail carried. */
async function sentQuote(customerId: number) {
  const made = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ customerId, lines: [{ kind: 'item', description: 'Thermostat, 500 W', quantity: 1, unitPriceCents: 4500 }] });
  expect(made.status).toBe(201);
  const sent = await request(ctx.app).post(`/api/v1/quotes/${made.body.id}/send`).set(sales());
  expect(sent.status).toBe(200);
  const mail = ctx.mailStore.list().find((m) => m.subject.includes(made.body.number))!;
  const link = mail.text.match(/https?:\/\/\S+\/quote\/(\S+)/);
  expect(link, 'the quote e-mail carries the customer link').not.toBeNull();
  return { id: made.body.id as number, number: made.body.number as string, token: decodeURIComponent(link![1]!) };
}

describe("the customer's quote link", () => {
  it('shows the quote without internal ids, and accepting it makes the order once', async () => {
    const { token, number, id } = await sentQuote(4);
    const view = await request(ctx.app).get(`/api/v1/quote-links/${encodeURIComponent(token)}`).set(customer());
    expect(view.status).toBe(200);
    expect(view.body).toMatchObject({ number, status: 'sent', totalCents: expect.any(Number), orderNumber: null });
    expect(view.body).not.toHaveProperty('id');
    expect(view.body).not.toHaveProperty('customerId');

    const accepted = await request(ctx.app).post(`/api/v1/quote-links/${encodeURIComponent(token)}/accept`).set(customer()).send({ deliveryMethod: 'pickup' });
    expect(accepted.status).toBe(201);
    expect(accepted.body.status).toBe('accepted');
    expect(accepted.body.orderNumber).toMatch(/^O-\d{4}-\d{4}$/);
    expect(await ctx.db('orders').where({ quote_id: id }).count({ n: '*' }).first()).toMatchObject({ n: 1 });

    const again = await request(ctx.app).post(`/api/v1/quote-links/${encodeURIComponent(token)}/accept`).set(customer()).send({});
    expect(again.status).toBe(409);
    expect(await ctx.db('orders').where({ quote_id: id }).count({ n: '*' }).first()).toMatchObject({ n: 1 });
  });

  it('refuses a forged or replaced link as unknown, and a malformed one by its field', async () => {
    const { token, number } = await sentQuote(5);
    const forged = `${number}.${'A'.repeat(32)}`;
    expect((await request(ctx.app).get(`/api/v1/quote-links/${forged}`).set(customer())).status).toBe(404);
    // Another quote's number with this quote's signature.
    const [, signature] = token.split('.');
    expect((await request(ctx.app).get(`/api/v1/quote-links/Q-2026-0001.${signature}`).set(customer())).status).toBe(404);
    const bad = await request(ctx.app).get('/api/v1/quote-links/not-a-link').set(customer());
    expect([bad.status, bad.body.error.field]).toEqual([400, 'token']);

    // Sending the quote again replaces the link.
    await new Promise((r) => setTimeout(r, 5));
    const resent = await request(ctx.app).post(`/api/v1/quotes/${(await ctx.db('quotes').where({ number }).first()).id}/send`).set(sales());
    expect(resent.status).toBe(200);
    expect((await request(ctx.app).get(`/api/v1/quote-links/${encodeURIComponent(token)}`).set(customer())).status).toBe(404);
  });

  it('lets the customer decline', async () => {
    const { token } = await sentQuote(6);
    const res = await request(ctx.app).post(`/api/v1/quote-links/${encodeURIComponent(token)}/decline`).set(customer()).send({});
    expect([res.status, res.body.status]).toEqual([200, 'declined']);
  });
});
