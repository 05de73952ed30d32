import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gatewayTestStack, TEST_JWT_SECRET } from './test-support.js';

let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
beforeAll(async () => {
  stack = await gatewayTestStack();
});
afterAll(() => stack.close());

async function signIn(email: string, password = 'tubwright-demo') {
  return request(stack.app).post('/api/v1/auth/login').send({ email, password });
}
const bearer = (token: string) => ({ authorization: `Bearer ${token}` });

describe('sign-in', () => {
  it('answers a session with the user and role', async () => {
    const res = await signIn('builder@demo.tubwright.test');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ expiresIn: 900, user: { email: 'builder@demo.tubwright.test', role: 'builder' } });
    const claims = jwt.decode(res.body.accessToken) as jwt.JwtPayload;
    expect(claims.exp! - claims.iat!).toBe(900);
  });

  it('refuses a wrong password with 401', async () => {
    const res = await signIn('builder@demo.tubwright.test', 'not-the-password');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
  });

  it('names the field of a bad sign-in body, and answers malformed JSON with 400', async () => {
    const res = await request(stack.app).post('/api/v1/auth/login').send({ email: 'not-an-address', password: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('email');
    const missing = await request(stack.app).post('/api/v1/auth/login').send({ email: 'a@b.test' });
    expect(missing.body.error.field).toBe('password');
    const broken = await request(stack.app).post('/api/v1/auth/login').set('content-type', 'application/json').send('{"email":');
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe('invalid_json');
    expect(JSON.stringify(broken.body)).not.toMatch(/at .*\.ts/);
  });

  it('exchanges a refresh token for a new session and refuses an access token in its place', async () => {
    const session = (await signIn('keeper@demo.tubwright.test')).body;
    const refreshed = await request(stack.app).post('/api/v1/auth/refresh').send({ refreshToken: session.refreshToken });
    expect(refreshed.status).toBe(200);
    expect(refreshed.body.user.role).toBe('keeper');
    const misuse = await request(stack.app).post('/api/v1/auth/refresh').send({ refreshToken: session.accessToken });
    expect(misuse.status).toBe(401);
  });
});

describe('tokens and roles at the gateway', () => {
  it('refuses no token, an expired token and a token signed with another secret', async () => {
    expect((await request(stack.app).get('/api/v1/animals')).status).toBe(401);
    const claims = { email: 'keeper@demo.tubwright.test', name: 'K', role: 'keeper', typ: 'access' };
    const options = { subject: '3', issuer: 'tubwright-gateway', audience: 'api' } as const;
    const expired = jwt.sign({ ...claims, exp: Math.floor(Date.now() / 1000) - 10 }, TEST_JWT_SECRET, options);
    const expiredRes = await request(stack.app).get('/api/v1/animals').set(bearer(expired));
    expect(expiredRes.status).toBe(401);
    expect(expiredRes.body.error.message).toMatch(/expired/);
    const foreign = jwt.sign(claims, 'someone-elses-secret', { ...options, expiresIn: 600 });
    expect((await request(stack.app).get('/api/v1/animals').set(bearer(foreign))).status).toBe(401);
    const valid = jwt.sign(claims, TEST_JWT_SECRET, { ...options, expiresIn: 600 });
    expect((await request(stack.app).get('/api/v1/animals').set(bearer(valid))).status).toBe(200);
  });

  it('gives each role exactly its lists', async () => {
    const expected: Record<string, Record<string, number>> = {
      owner: { 'tub-models': 200, animals: 200, customers: 200, users: 200 },
      builder: { 'tub-models': 200, animals: 403, customers: 403, users: 403 },
      keeper: { 'tub-models': 403, animals: 200, customers: 403, users: 403 },
      sales: { 'tub-models': 200, animals: 200, customers: 200, users: 403 },
    };
    for (const [role, lists] of Object.entries(expected)) {
      const token = (await signIn(`${role}@demo.tubwright.test`)).body.accessToken;
      for (const [list, status] of Object.entries(lists)) {
        const res = await request(stack.app).get(`/api/v1/${list}`).set(bearer(token));
        expect(res.status, `${role} ${list}`).toBe(status);
      }
    }
  });

  it('passes a POST body through the proxy and names the bad field', async () => {
    const token = (await signIn('keeper@demo.tubwright.test')).body.accessToken;
    const created = await request(stack.app).post('/api/v1/animals').set(bearer(token)).send({ code: 'GW-1', species: 'Antaresia childreni' });
    expect(created.status).toBe(201);
    const bad = await request(stack.app).post('/api/v1/animals').set(bearer(token)).send({ code: 'GW-2', species: 'x', weightG: 'heavy' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('weightG');
  });

  it('ignores an identity header sent by the client', async () => {
    const res = await request(stack.app).get('/api/v1/users').set('x-tw-identity', 'forged.header');
    expect(res.status).toBe(401);
  });

  it('answers unknown API routes with 404 in the error shape', async () => {
    const token = (await signIn('owner@demo.tubwright.test')).body.accessToken;
    const res = await request(stack.app).get('/api/v1/no-such-thing').set(bearer(token));
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('lets the owner read the caught mail and nobody else', async () => {
    stack.mailStore.add({ from: 'shop@demo.tubwright.test', to: ['c@example.test'], subject: 'Your quote', text: 'Hello', html: null, receivedAt: new Date().toISOString() });
    const owner = (await signIn('owner@demo.tubwright.test')).body.accessToken;
    const list = await request(stack.app).get('/api/v1/mail/messages').set(bearer(owner));
    expect(list.body.items[0].subject).toBe('Your quote');
    const one = await request(stack.app).get(`/api/v1/mail/messages/${list.body.items[0].id}`).set(bearer(owner));
    expect(one.body.text).toBe('Hello');
    const sales = (await signIn('sales@demo.tubwright.test')).body.accessToken;
    expect((await request(stack.app).get('/api/v1/mail/messages').set(bearer(sales))).status).toBe(403);
  });
});

describe('login rate limit', () => {
  it('answers 429 after the allowed attempts per minute', async () => {
    const limited = await gatewayTestStack({ loginRateLimitPerMinute: 3 });
    try {
      const statuses = [];
      for (let i = 0; i < 5; i++) {
        statuses.push((await request(limited.app).post('/api/v1/auth/login').send({ email: 'owner@demo.tubwright.test', password: 'guess' })).status);
      }
      expect(statuses).toEqual([401, 401, 401, 429, 429]);
    } finally {
      await limited.close();
    }
  });
});

describe('calculations through the gateway', () => {
  it('routes rack plans and pairing outcomes to the calculator over HTTP', async () => {
    const token = (await signIn('builder@demo.tubwright.test')).body.accessToken;
    const plan = await request(stack.app)
      .post('/api/v1/calc/rack-plan')
      .set(bearer(token))
      .send({ tub: { length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 }, layout: { levels: 9, columns: 3 } });
    expect(plan.status).toBe(200);
    expect(plan.body.dimensions.outerShelfLength - plan.body.dimensions.interiorShelfLength).toBe(1);
    const keeper = (await signIn('keeper@demo.tubwright.test')).body.accessToken;
    const outcomes = await request(stack.app)
      .post('/api/v1/genetics/pairing-outcomes')
      .set(bearer(keeper))
      .send({ traits: [{ name: 'amber', mode: 'recessive' }], sire: { amber: 'het' }, dam: { amber: 'het' } });
    expect(outcomes.status).toBe(200);
    expect(outcomes.body.outcomes.map((o: { fraction: string }) => o.fraction).sort()).toEqual(['1/2', '1/4', '1/4']);
  });
});
