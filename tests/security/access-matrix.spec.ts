import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routes } from '../../gateway/src/openapi/route-catalog.js';
import { openApiDocument } from '../../gateway/src/openapi/document.js';
import { gatewayTestStack, TEST_JWT_SECRET } from '../../gateway/src/test-support.js';
import { allowedFor } from './access-table.js';

const SITE = 'https://alder-bend.example';
const ROLES = ['owner', 'builder', 'keeper', 'sales'] as const;
type Caller = { name: string; headers: Record<string, string>; kind: 'role' | 'key' | 'nobody'; grants: string[] };

let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
const callers: Caller[] = [];

const login = async (role: string) =>
  (await request(stack.app).post('/api/v1/auth/login').send({ email: `${role}@demo.tubwright.test`, password: 'tubwright-demo' })).body as { accessToken: string };

beforeAll(async () => {
  stack = await gatewayTestStack({ widgetIpRateLimitPerMinute: 100_000, apiKeyRateLimitPerMinute: 100_000 });
  for (const role of ROLES) callers.push({ name: role, kind: 'role', grants: [role], headers: { authorization: `Bearer ${(await login(role)).accessToken}` } });
  const owner = callers[0]!.headers;
  const issue = async (body: object) => (await request(stack.app).post('/api/v1/api-keys').set(owner).send(body)).body.key as string;
  const publishable = await issue({ name: 'Website', kind: 'publishable', origins: [SITE], scopes: ['calculations', 'quote-requests'] });
  const secret = await issue({ name: 'Partner', kind: 'secret', scopes: ['calculations', 'quote-requests', 'order-status'] });
  const statusOnly = await issue({ name: 'Status board', kind: 'secret', scopes: ['order-status'] });
  callers.push(
    { name: 'publishable key', kind: 'key', grants: ['key:calculations', 'key:quote-requests'], headers: { 'x-api-key': publishable, origin: SITE } },
    { name: 'secret key', kind: 'key', grants: ['key:calculations', 'key:quote-requests', 'key:order-status'], headers: { 'x-api-key': secret } },
    { name: 'order-status key', kind: 'key', grants: ['key:order-status'], headers: { 'x-api-key': statusOnly } },
  );
  // Tokens that must all be refused: expired, signed with another secret, a role claim edited by hand, none.
  const builderToken = (await login('builder')).accessToken;
  const claims = jwt.decode(builderToken) as jwt.JwtPayload;
  const expired = jwt.sign({ ...claims, iat: claims.iat! - 7200, exp: claims.iat! - 3600 }, TEST_JWT_SECRET, { algorithm: 'HS256' });
  const foreign = jwt.sign(claims, 'some-other-secret', { algorithm: 'HS256' });
  const [head, , signature] = builderToken.split('.');
  const tampered = `${head}.${Buffer.from(JSON.stringify({ ...claims, role: 'owner' })).toString('base64url')}.${signature}`;
  const none = `${Buffer.from('{"alg":"none","typ":"JWT"}').toString('base64url')}.${Buffer.from(JSON.stringify({ ...claims, role: 'owner' })).toString('base64url')}.`;
  for (const [name, token] of [['expired token', expired], ['token of another secret', foreign], ['tampered role claim', tampered], ['unsigned token', none]] as const) {
    callers.push({ name, kind: 'nobody', grants: [], headers: { authorization: `Bearer ${token}` } });
  }
  callers.push({ name: 'no credentials', kind: 'nobody', grants: [], headers: {} });
}, 60_000);
afterAll(() => stack.close());

/** Placeholder values for path parameters: records that do not exist, so an allowed call answers 400 or 404 and changes nothing. */
const concrete = (path: string) =>
  path.replace(/:version\b/, '1').replace(/:reference\b/, 'Q-2099-0001').replace(/:key\b/, 'no-such-material').replace(/:\w+/g, '999999');

function verdict(status: number): 'allowed' | 'refused' | 'unauthenticated' {
  if (status === 401) return 'unauthenticated';
  if (status === 403) return 'refused';
  return 'allowed';
}

describe('access matrix', () => {
  it('every documented route has a row in the access table, and the document agrees with it', () => {
    const documented = Object.entries(openApiDocument().paths ?? {}).flatMap(([path, item]) =>
      Object.keys(item ?? {}).filter((k) => ['get', 'post', 'put', 'patch', 'delete'].includes(k)).map((m) => `${m.toUpperCase()} ${path}`),
    );
    expect(documented.length).toBe(routes.length);
    for (const route of routes) {
      const allowed = allowedFor(route.method.toUpperCase(), route.path);
      expect(allowed, `${route.method} ${route.path} has no row`).toBeDefined();
      const staff = allowed!.filter((a) => (ROLES as readonly string[]).includes(a)).sort();
      const documentedStaff = route.roles.filter((r) => r !== 'integrator').sort();
      expect(documentedStaff, `${route.method} ${route.path}: documented roles`).toEqual(allowed!.includes('public') ? [] : staff);
    }
  });

  it('answers every route as the table says for each role, key and broken credential', async () => {
    const mismatches: string[] = [];
    let calls = 0;
    for (const route of routes) {
      const method = route.method.toUpperCase();
      const allowed = allowedFor(method, route.path)!;
      const isPublic = allowed.includes('public');
      for (const caller of callers) {
        // Signing out would end the caller's session for the rest of the matrix: use a fresh one.
        const headers =
          route.path === '/api/v1/auth/logout' && caller.kind === 'role' ? { authorization: `Bearer ${(await login(caller.grants[0]!)).accessToken}` } : caller.headers;
        const call = request(stack.app)[route.method](concrete(route.path)).set(headers);
        const res = method === 'GET' || method === 'DELETE' ? await call : await call.send({});
        calls++;
        // The health report answers 503 when a neighbour is down (the payments stand-in is not started here).
        if (res.status >= 500 && route.path !== '/api/v1/health') mismatches.push(`${method} ${route.path} as ${caller.name}: ${res.status} ${JSON.stringify(res.body)}`);
        const expected = isPublic
          ? caller.kind === 'key' && (route.path === '/api/v1/payments/webhook' || route.path.startsWith('/api/v1/quote-links/'))
            ? 'refused' // a key is never a payment provider, nor the customer holding a quote link
            : 'allowed'
          : caller.kind === 'nobody' || (caller.kind === 'key' && route.path === '/api/v1/auth/logout') // a key has no session to end
            ? 'unauthenticated'
            : caller.grants.some((g) => allowed.includes(g))
              ? 'allowed'
              : 'refused';
        const got = verdict(res.status);
        if (got !== expected) mismatches.push(`${method} ${route.path} as ${caller.name}: expected ${expected}, got ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`);
        // Every refusal is in the error shape (the health report answers 503 with its own body by design).
        if (res.status >= 400 && route.path !== '/api/v1/health' && typeof res.body?.error?.message !== 'string') {
          mismatches.push(`${method} ${route.path} as ${caller.name}: ${res.status} without the error shape`);
        }
      }
    }
    expect(mismatches).toEqual([]);
    expect(calls).toBe(routes.length * callers.length);
  }, 240_000);
});

describe('records cannot be reached by guessing', () => {
  it("lets a partner key read the status of its own quote requests only", async () => {
    const owner = callers[0]!.headers;
    const issue = async (name: string) =>
      (await request(stack.app).post('/api/v1/api-keys').set(owner).send({ name, kind: 'secret', scopes: ['quote-requests', 'order-status'] })).body.key as string;
    const [a, b] = [await issue('Partner A'), await issue('Partner B')];
    const created = await request(stack.app)
      .post('/api/v1/quote-requests')
      .set('x-api-key', a)
      .send({ name: 'Rowan Pike', email: 'rowan@example.test', consent: true, spec: { unit: 'in', tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 4, columns: 2 } } });
    expect(created.status).toBe(201);
    const reference = created.body.reference as string;
    expect((await request(stack.app).get(`/api/v1/order-status/${reference}`).set('x-api-key', a)).status).toBe(200);
    const guessed = await request(stack.app).get(`/api/v1/order-status/${reference}`).set('x-api-key', b);
    expect(guessed.status).toBe(404);
    // The shop's own earlier quotes (sequential numbers) read as unknown to a key too.
    const [, year, n] = reference.match(/^Q-(\d{4})-(\d{4})$/)!;
    const earlier = `Q-${year}-${String(Number(n) - 1).padStart(4, '0')}`;
    expect((await request(stack.app).get(`/api/v1/order-status/${earlier}`).set('x-api-key', a)).status).toBe(404);
  });
});
