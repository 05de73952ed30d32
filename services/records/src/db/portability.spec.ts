import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../test-support.js';
import { nowIso } from './knex.js';

/*
 * Behaviour that differs between SQLite and PostgreSQL unless the code sees to it; this file runs
 * on both (PostgreSQL when TEST_POSTGRES_URL is set).
 */
let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

describe(`the records on ${process.env.TEST_POSTGRES_URL ? 'PostgreSQL' : 'SQLite'}`, () => {
  it('searches without regard to case', async () => {
    const lower = await request(ctx.app).get('/api/v1/customers?q=a').set(asRole('sales'));
    const upper = await request(ctx.app).get('/api/v1/customers?q=A').set(asRole('sales'));
    expect(lower.status).toBe(200);
    expect(lower.body.total).toBeGreaterThan(0);
    expect(upper.body.items).toEqual(lower.body.items);
  });

  it('searches a column whose name PostgreSQL reserves (`to` of the mail log)', async () => {
    const now = nowIso();
    await ctx.db('mail_log').insert({ to: 'Fern.Keeper@example.test', subject: 'Your quote', kind: 'quote', entity: 'quote', entity_id: 1, sent_at: now, status: 'sent', created_at: now, updated_at: now });
    const res = await request(ctx.app).get('/api/v1/mail-log?q=fern.keeper').set(asRole('owner'));
    expect(res.status).toBe(200);
    expect(res.body.items.map((m: { to: string }) => m.to)).toEqual(['Fern.Keeper@example.test']);
  });

  it('numbers quotes made at the same moment one after another, without a clash', async () => {
    const quote = { customerId: 1, lines: [{ kind: 'item', description: 'Thermostat', quantity: 1, unitPriceCents: 4500 }] };
    const made = await Promise.all(Array.from({ length: 6 }, () => request(ctx.app).post('/api/v1/quotes').set(asRole('sales')).send(quote)));
    expect(made.map((r) => r.status)).toEqual(Array(6).fill(201));
    const numbers = made.map((r) => r.body.number as string);
    expect(new Set(numbers).size).toBe(6);
    const sequence = numbers.map((n) => Number(n.split('-').pop())).sort((a, b) => a - b);
    expect(sequence.at(-1)! - sequence[0]!).toBe(5);
  });

  it('sorts empty values first going up and last going down, as SQLite does', async () => {
    const now = nowIso();
    await ctx.db('animals').insert({ code: 'ZZ-NOWEIGHT', species: 'Python regius', weight_g: null, created_at: now, updated_at: now });
    const up = await request(ctx.app).get('/api/v1/animals?sort=weightG&limit=200').set(asRole('keeper'));
    const down = await request(ctx.app).get('/api/v1/animals?sort=-weightG&limit=200').set(asRole('keeper'));
    expect(up.body.items[0].weightG).toBeNull();
    expect(down.body.items.at(-1).weightG).toBeNull();
    const weights = (items: { weightG: number | null }[]) => items.map((a) => a.weightG).filter((w) => w !== null);
    expect(weights(down.body.items)).toEqual([...weights(up.body.items)].reverse());
  });

  it('answers booleans as booleans', async () => {
    const users = await request(ctx.app).get('/api/v1/users').set(asRole('owner'));
    expect(users.status).toBe(200);
    expect(users.body.items.every((u: { active: unknown }) => u.active === true)).toBe(true);
    const forSale = await request(ctx.app).get('/api/v1/animals').set(asRole('sales'));
    expect(forSale.body.total).toBeGreaterThan(0);
  });
});
