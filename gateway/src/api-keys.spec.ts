import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE } from '../../shared/api/rack-plan.js';
import { gatewayTestStack } from './test-support.js';

let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
let owner = '';
const SITE = 'https://racks.example';

beforeAll(async () => {
  stack = await gatewayTestStack({ apiKeyRateLimitPerMinute: 1000, widgetIpRateLimitPerMinute: 1000 });
  owner = (await request(stack.app).post('/api/v1/auth/login').send({ email: 'owner@demo.tubwright.test', password: 'tubwright-demo' })).body.accessToken;
});
afterAll(() => stack.close());

const issue = async (body: object) => {
  const res = await request(stack.app).post('/api/v1/api-keys').set('authorization', `Bearer ${owner}`).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; key: string; prefix: string };
};
const plan = (key: string, origin?: string) => {
  const req = request(stack.app).post('/api/v1/calc/rack-plan').set('x-api-key', key);
  if (origin) req.set('origin', origin);
  return req.send({ ...RACK_PLAN_EXAMPLE, cutting: { include: false } });
};

describe('API keys', () => {
  it('shows a new key once, stores only a hash, and lists it without the key', async () => {
    const created = await issue({ name: 'Partner A', kind: 'secret', scopes: ['calculations'] });
    expect(created.key).toMatch(/^tw_sk_/);
    const list = await request(stack.app).get('/api/v1/api-keys').set('authorization', `Bearer ${owner}`);
    expect(JSON.stringify(list.body)).not.toContain(created.key);
    const row = await stack.db('api_keys').where({ id: created.id }).first();
    expect(row.key_hash).not.toContain(created.key);
    expect(row.key_hash).toHaveLength(64);
  });

  it('lets a secret key with the calculations scope plan a rack, and records when it was used', async () => {
    const { key, id } = await issue({ name: 'Partner B', kind: 'secret', scopes: ['calculations'] });
    const res = await plan(key);
    expect(res.status).toBe(200);
    expect(res.body.dimensions.levelOpening).toBe(6.625);
    expect((await stack.db('api_keys').where({ id }).first()).last_used_at).toBeTruthy();
  });

  it('refuses an unknown or revoked key with 401, a missing scope or a non-key route with 403', async () => {
    expect((await plan('tw_sk_not-a-real-key')).status).toBe(401);
    const { key, id } = await issue({ name: 'Partner C', kind: 'secret', scopes: ['order-status'] });
    expect((await plan(key)).status).toBe(403);
    expect((await request(stack.app).get('/api/v1/animals').set('x-api-key', key)).status).toBe(403);
    const full = await issue({ name: 'Partner D', kind: 'secret', scopes: ['calculations'] });
    expect((await request(stack.app).delete(`/api/v1/api-keys/${full.id}`).set('authorization', `Bearer ${owner}`)).status).toBe(204);
    expect((await plan(full.key)).status).toBe(401);
    expect(id).toBeGreaterThan(0);
  });

  it('locks a publishable key to its origins, with CORS headers only for them', async () => {
    const { key } = await issue({ name: 'Website', kind: 'publishable', origins: [SITE], scopes: ['calculations', 'quote-requests'] });
    const ok = await plan(key, SITE);
    expect(ok.status).toBe(200);
    expect(ok.headers['access-control-allow-origin']).toBe(SITE);
    const elsewhere = await plan(key, 'https://copycat.example');
    expect(elsewhere.status).toBe(403);
    expect(elsewhere.headers['access-control-allow-origin']).toBeUndefined();
    expect((await plan(key)).status).toBe(403);
  });

  it('answers preflights for listed origins only', async () => {
    const preflight = (origin: string) =>
      request(stack.app).options('/api/v1/calc/rack-plan').set('origin', origin).set('access-control-request-method', 'POST').set('access-control-request-headers', 'content-type, x-api-key');
    const ok = await preflight(SITE);
    expect(ok.status).toBe(204);
    expect(ok.headers['access-control-allow-origin']).toBe(SITE);
    expect(ok.headers['access-control-allow-headers']).toContain('x-api-key');
    const refused = await preflight('https://copycat.example');
    expect(refused.status).toBe(403);
    expect(refused.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('refuses bad key requests with 400 naming the field', async () => {
    const cases: [object, string][] = [
      [{ name: 'x', kind: 'publishable', origins: [], scopes: ['calculations'] }, 'origins'],
      [{ name: 'x', kind: 'publishable', origins: [SITE], scopes: ['order-status'] }, 'scopes[0]'],
      [{ name: 'x', kind: 'publishable', origins: ['https://racks.example/path'], scopes: ['calculations'] }, 'origins[0]'],
      [{ name: 'x', kind: 'master', scopes: ['calculations'] }, 'kind'],
    ];
    for (const [body, field] of cases) {
      const res = await request(stack.app).post('/api/v1/api-keys').set('authorization', `Bearer ${owner}`).send(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.field).toBe(field);
    }
    const builder = (await request(stack.app).post('/api/v1/auth/login').send({ email: 'builder@demo.tubwright.test', password: 'tubwright-demo' })).body.accessToken;
    expect((await request(stack.app).get('/api/v1/api-keys').set('authorization', `Bearer ${builder}`)).status).toBe(403);
  });
});

describe('key rate limits', () => {
  it('answers a flood with 429 and Retry-After', async () => {
    const limited = await gatewayTestStack({ apiKeyRateLimitPerMinute: 3 });
    try {
      const token = (await request(limited.app).post('/api/v1/auth/login').send({ email: 'owner@demo.tubwright.test', password: 'tubwright-demo' })).body.accessToken;
      const { key } = (await request(limited.app).post('/api/v1/api-keys').set('authorization', `Bearer ${token}`).send({ name: 'p', kind: 'secret', scopes: ['calculations'] })).body;
      const statuses: number[] = [];
      let retryAfter: string | undefined;
      for (let i = 0; i < 5; i++) {
        const res = await request(limited.app).post('/api/v1/genetics/pairing-outcomes').set('x-api-key', key).send({ traits: [{ name: 'a', mode: 'recessive' }], sire: {}, dam: {} });
        statuses.push(res.status);
        retryAfter ??= res.headers['retry-after'];
      }
      expect(statuses).toEqual([200, 200, 200, 429, 429]);
      expect(Number(retryAfter)).toBeGreaterThan(0);
    } finally {
      await limited.close();
    }
  });
});
