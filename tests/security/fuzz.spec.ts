import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routes, type RouteDoc } from '../../gateway/src/openapi/route-catalog.js';
import '../../gateway/src/openapi/document.js';
import { gatewayTestStack } from '../../gateway/src/test-support.js';
import { deeplyNested, hostileValue, mutated, serialize } from './hostile-json.js';

let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
let owner: Record<string, string>;
const prototypeKeys = Object.getOwnPropertyNames(Object.prototype).sort();

beforeAll(async () => {
  stack = await gatewayTestStack({ widgetIpRateLimitPerMinute: 100_000, apiKeyRateLimitPerMinute: 100_000 });
  const session = await request(stack.app).post('/api/v1/auth/login').send({ email: 'owner@demo.tubwright.test', password: 'tubwright-demo' });
  owner = { authorization: `Bearer ${session.body.accessToken}` };
}, 60_000);
afterAll(() => stack.close());

const concrete = (path: string) => path.replace(/:version\b/, '1').replace(/:reference\b/, 'Q-2099-0001').replace(/:key\b/, 'sheet-pvc').replace(/:\w+/g, '1');
// Signing out would end the owner's session for the rest of the run.
const bodyRoutes = routes.filter((r) => ['post', 'put', 'patch'].includes(r.method) && r.path !== '/api/v1/auth/logout');
const RUNS_PER_ROUTE = 12;

/** Problems with one answer, if any: a 500, a refusal outside the error shape, or internals showing. */
function problems(route: RouteDoc, status: number, text: string, sent: string): string[] {
  const where = `${route.method.toUpperCase()} ${route.path} ← ${sent.slice(0, 120)}`;
  const found: string[] = [];
  if (status >= 500 && status !== 503) found.push(`${where}: ${status} ${text.slice(0, 200)}`);
  if (status >= 400) {
    let body: { error?: { code?: unknown; message?: unknown } } = {};
    try {
      body = JSON.parse(text);
    } catch {
      /* reported below */
    }
    if (typeof body.error?.code !== 'string' || typeof body.error?.message !== 'string') found.push(`${where}: ${status} without the error shape: ${text.slice(0, 200)}`);
  }
  if (/\bat \S+ \(|\.ts:\d+|\/work\/|node_modules|SqliteError|SQLITE_|knex/i.test(text)) found.push(`${where}: internals in the answer: ${text.slice(0, 200)}`);
  return found;
}

async function send(route: RouteDoc, raw: string) {
  const res = await request(stack.app)[route.method](concrete(route.path)).set(owner).set('content-type', 'application/json').timeout(10_000).send(raw);
  return { status: res.status, text: res.text };
}

describe('hostile JSON bodies', () => {
  it(`never answer 500, always in the error shape, on all ${bodyRoutes.length} JSON write routes`, async () => {
    const found: string[] = [];
    for (const route of bodyRoutes) {
      const arbitrary = route.bodyExample === undefined ? hostileValue : fc.oneof(hostileValue, mutated(route.bodyExample));
      await fc.assert(
        fc.asyncProperty(arbitrary, async (value) => {
          const raw = serialize(value);
          const { status, text } = await send(route, raw);
          found.push(...problems(route, status, text, raw));
        }),
        { numRuns: RUNS_PER_ROUTE, seed: 20261202, endOnFailure: true },
      );
    }
    expect(found).toEqual([]);
    // No body reached Object.prototype (the services run in this process).
    expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(prototypeKeys);
    expect(({} as Record<string, unknown>)['polluted']).toBeUndefined();
  }, 300_000);

  it('refuse broken, deeply nested and oversized JSON with the error shape', async () => {
    const found: string[] = [];
    const samples = ['{"a":', '[1,2', '{"a":1}}', 'NaN', '\u0000', deeplyNested(5_000), JSON.stringify({ note: 'x'.repeat(3 * 1024 * 1024) })];
    for (const route of bodyRoutes) {
      for (const raw of samples) {
        const { status, text } = await send(route, raw);
        found.push(...problems(route, status, text, raw));
        if (raw.length > 1024 * 1024 && status !== 413) found.push(`${route.method} ${route.path}: a 3 MB body answered ${status}, not 413`);
      }
    }
    expect(found).toEqual([]);
  }, 300_000);
});

describe('hostile query strings', () => {
  it('never answer 500 on the list routes', async () => {
    const lists = routes.filter((r) => r.method === 'get' && r.query);
    const found: string[] = [];
    const param = fc.tuple(
      fc.constantFrom('limit', 'offset', 'sort', 'q', 'from', 'to', 'status', 'entity', '__proto__', 'constructor[prototype][x]', 'limit[]'),
      fc.oneof(fc.constantFrom('-1', '1e309', 'NaN', '99999999999999999999', "'; drop table animals; --", '%', '_', '\\', '[]', ''), fc.string({ maxLength: 300 })),
    );
    for (const route of lists) {
      await fc.assert(
        fc.asyncProperty(fc.array(param, { minLength: 1, maxLength: 4 }), async (pairs) => {
          const qs = pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&');
          const res = await request(stack.app).get(`${concrete(route.path)}?${qs}`).set(owner).timeout(10_000);
          found.push(...problems(route, res.status, res.text, qs));
        }),
        { numRuns: 10, seed: 20261202 },
      );
    }
    expect(found).toEqual([]);
  }, 300_000);
});
