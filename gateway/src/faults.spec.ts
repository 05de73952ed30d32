import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE } from '../../shared/api/rack-plan.js';
import { createApp as createCalculatorApp } from '../../services/calculator/src/app.js';
import { recordsTestApp, TEST_INTERNAL_SECRET } from '../../services/records/src/test-support.js';
import { createGatewayApp } from './app.js';
import { TEST_JWT_SECRET } from './test-support.js';

/** A service on a fixed loopback port that can be stopped and started again, as a crash and restart would. */
class Restartable {
  private server: http.Server | undefined;
  port = 0;
  constructor(private readonly handler: http.RequestListener) {}
  get url() {
    return `http://127.0.0.1:${this.port}`;
  }
  async start(): Promise<void> {
    const server = http.createServer(this.handler);
    await new Promise<void>((resolve) => server.listen(this.port, '127.0.0.1', resolve));
    this.port = (server.address() as AddressInfo).port;
    this.server = server;
  }
  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (!server) return;
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
  }
}

let records: Awaited<ReturnType<typeof recordsTestApp>>;
let recordsHttp: Restartable;
let calculatorHttp: Restartable;
let slowHttp: Restartable;
let gateway: ReturnType<typeof createGatewayApp>;
let slowGateway: ReturnType<typeof createGatewayApp>;
let ownerToken: string;

beforeAll(async () => {
  records = await recordsTestApp({ seed: true });
  recordsHttp = new Restartable(records.app);
  calculatorHttp = new Restartable(createCalculatorApp({ internalSecret: TEST_INTERNAL_SECRET }));
  // Answers health at once and everything else after three seconds.
  slowHttp = new Restartable((req, res) => {
    if (req.url === '/health') return void res.end('{"status":"ok"}');
    setTimeout(() => res.end('{}'), 3000);
  });
  await Promise.all([recordsHttp.start(), calculatorHttp.start(), slowHttp.start()]);
  const deps = {
    calculatorUrl: calculatorHttp.url,
    recordsUrl: recordsHttp.url,
    mailUrl: 'http://127.0.0.1:9',
    paymentsUrl: 'http://127.0.0.1:9',
    webDir: '/nonexistent',
    jwtSecret: TEST_JWT_SECRET,
    internalSecret: TEST_INTERNAL_SECRET,
    accessTokenTtlS: 900,
    refreshTokenTtlS: 3600,
    loginRateLimitPerMinute: 1000,
  };
  gateway = createGatewayApp(deps);
  slowGateway = createGatewayApp({ ...deps, recordsUrl: slowHttp.url, upstreamTimeoutMs: 500 });
  ownerToken = (await login()).body.accessToken;
});
afterAll(async () => {
  await Promise.all([recordsHttp.stop(), calculatorHttp.stop(), slowHttp.stop()]);
  await records.close();
});

const login = () => request(gateway).post('/api/v1/auth/login').send({ email: 'owner@demo.tubwright.test', password: 'tubwright-demo' });
const owner = () => ({ authorization: `Bearer ${ownerToken}` });
const planWith = (headers: Record<string, string>) => request(gateway).post('/api/v1/calc/rack-plan').set(headers).send(RACK_PLAN_EXAMPLE);

function expectErrorShape(body: unknown, code: string) {
  expect(body).toMatchObject({ error: { code, message: expect.any(String) } });
  expect(JSON.stringify(body)).not.toMatch(/\bat \S+:\d+|\/work\/|node_modules|ECONN/);
}

describe('the calculator is down', () => {
  it('answers 503 with a clear message while records keep working, and recovers without a hand on it', async () => {
    await calculatorHttp.stop();
    try {
      const res = await planWith(owner());
      expect(res.status).toBe(503);
      expectErrorShape(res.body, 'service_unavailable');
      expect(res.body.error.message).toMatch(/calculator/i);
      expect((await request(gateway).get('/api/v1/animals').set(owner())).status).toBe(200);
    } finally {
      await calculatorHttp.start();
    }
    // The copy that failed is asked again as requests arrive.
    let status = 0;
    for (let i = 0; i < 30 && status !== 200; i++) {
      status = (await planWith(owner())).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 200));
    }
    expect(status).toBe(200);
  });
});

describe('the records service is down', () => {
  it('fails sign-in clearly, yet a partner key already seen still gets calculations', async () => {
    const issued = await request(gateway).post('/api/v1/api-keys').set(owner()).send({ name: 'Supply store', kind: 'secret', scopes: ['calculations'] });
    expect(issued.status).toBe(201);
    const key = { 'x-api-key': issued.body.key as string };
    expect((await planWith(key)).status).toBe(200);

    await recordsHttp.stop();
    try {
      const signIn = await login();
      expect(signIn.status).toBe(503);
      expectErrorShape(signIn.body, 'service_unavailable');
      expect(signIn.body.error.message).toMatch(/records/);
      const list = await request(gateway).get('/api/v1/animals').set(owner());
      expect(list.status).toBe(503);
      expectErrorShape(list.body, 'service_unavailable');
      const plan = await planWith(key);
      expect(plan.status).toBe(200);
      expect(plan.body.dimensions.levelOpening).toBe(6.625);
    } finally {
      await recordsHttp.start();
    }
    // Restarted on its port, it is used again with no step by hand.
    expect((await login()).status).toBe(200);
  });

  it('forgets a revoked key at once, even one it has cached', async () => {
    const issued = await request(gateway).post('/api/v1/api-keys').set(owner()).send({ name: 'Short-lived', kind: 'secret', scopes: ['calculations'] });
    const key = { 'x-api-key': issued.body.key as string };
    expect((await planWith(key)).status).toBe(200);
    expect((await request(gateway).delete(`/api/v1/api-keys/${issued.body.id}`).set(owner())).status).toBe(204);
    expect((await planWith(key)).status).toBe(401);
  });
});

describe('a slow upstream', () => {
  it('is cut off with 504 in the error shape', async () => {
    const started = Date.now();
    const res = await request(slowGateway).get('/api/v1/animals').set(owner());
    expect(res.status).toBe(504);
    expectErrorShape(res.body, 'upstream_timeout');
    expect(Date.now() - started).toBeLessThan(2500);
  });
});
