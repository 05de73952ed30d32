import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routes } from '../../gateway/src/openapi/route-catalog.js';
import '../../gateway/src/openapi/document.js';
import { createApp as createCalculatorApp } from '../../services/calculator/src/app.js';
import { loadConfig } from '../../services/common/src/config.js';
import { IDENTITY_HEADER, signIdentity } from '../../services/common/src/internal-identity.js';
import { recordsTestApp, TEST_INTERNAL_SECRET } from '../../services/records/src/test-support.js';

let records: Awaited<ReturnType<typeof recordsTestApp>>;
const calculator = createCalculatorApp({ internalSecret: TEST_INTERNAL_SECRET });

beforeAll(async () => {
  records = await recordsTestApp({ seed: true });
});
afterAll(() => records.close());

const owner = { kind: 'user', sub: '1', role: 'owner', email: 'owner@demo.tubwright.test' } as const;
const concrete = (path: string) => path.replace(/:\w+/g, '1');
const serviceOf = (path: string) => (/^\/api\/v1\/(calc|genetics)\//.test(path) ? calculator : /^\/api\/v1\/mail\//.test(path) ? null : records.app);

/** Ways to reach a service without going through the gateway. */
const forgeries: [string, Record<string, string>][] = [
  ['no identity header', {}],
  ['a header signed with another secret', { [IDENTITY_HEADER]: signIdentity(owner, 'not-the-internal-secret') }],
  ['a header signed an hour ago (replayed)', { [IDENTITY_HEADER]: signIdentity(owner, TEST_INTERNAL_SECRET, Math.floor(Date.now() / 1000) - 3600) }],
  ['a header with its role edited', { [IDENTITY_HEADER]: editRole(signIdentity({ ...owner, role: 'keeper' }, TEST_INTERNAL_SECRET)) }],
  ['a bearer token in place of the header', { authorization: 'Bearer anything' }],
];

function editRole(header: string): string {
  const [payload, mac] = header.split('.') as [string, string];
  const claims = JSON.parse(Buffer.from(payload, 'base64url').toString());
  return `${Buffer.from(JSON.stringify({ ...claims, role: 'owner' })).toString('base64url')}.${mac}`;
}

describe('services trust only the gateway', () => {
  it('refuse every documented route, public ones included, without a valid signed identity', async () => {
    const accepted: string[] = [];
    for (const route of routes) {
      const app = serviceOf(route.path);
      if (!app) continue;
      for (const [how, headers] of forgeries) {
        const res = await request(app)[route.method](concrete(route.path)).set(headers).send(route.method === 'get' || route.method === 'delete' ? undefined : {});
        // 404: the gateway answers this route itself (login, health…), so the service has nothing there.
        if (res.status !== 401 && res.status !== 404) accepted.push(`${route.method.toUpperCase()} ${route.path} with ${how}: ${res.status}`);
      }
    }
    expect(accepted).toEqual([]);
  }, 120_000);

  it('take a fresh header signed with the shared secret', async () => {
    const res = await request(records.app).get('/api/v1/animals').set(IDENTITY_HEADER, signIdentity(owner, TEST_INTERNAL_SECRET));
    expect(res.status).toBe(200);
  });

  it('listen on loopback unless told otherwise', () => {
    expect(loadConfig({}).host).toBe('127.0.0.1');
  });
});
