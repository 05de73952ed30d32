import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp as createCalculatorApp } from '../../../services/calculator/src/app.js';
import { TEST_INTERNAL_SECRET } from '../../../services/records/src/test-support.js';
import { gatewayTestStack } from '../test-support.js';
import type { CalculatorPool } from './calculator-pool.js';

/** A real calculator on loopback that counts what it answers, and can be stopped and started on its port. */
class CalculatorCopy {
  hits = 0;
  port = 0;
  private server: http.Server | undefined;
  private readonly app = createCalculatorApp({ internalSecret: TEST_INTERNAL_SECRET });

  constructor(private readonly behaviour: 'answer' | 'hang-up' | 'slow' = 'answer') {}

  get url() {
    return `http://127.0.0.1:${this.port}`;
  }

  async start(): Promise<void> {
    if (this.server) return;
    this.server = http.createServer((req, res) => {
      if (req.url !== '/health') this.hits++;
      // A copy that accepts the request and dies before answering it (as a crashing process does).
      if (this.behaviour === 'hang-up' && req.url !== '/health') req.socket.destroy();
      else if (this.behaviour === 'slow' && req.url !== '/health') setTimeout(() => this.app(req, res), 1500);
      else this.app(req, res);
    });
    await new Promise<void>((resolve, reject) => this.server!.once('error', reject).listen(this.port, '127.0.0.1', resolve));
    this.port = (this.server.address() as AddressInfo).port;
  }

  /** Stops listening and cuts the kept-alive connections, as a stopped process would. */
  async stop(): Promise<void> {
    const server = this.server;
    if (!server) return;
    this.server = undefined;
    const closed = new Promise((resolve) => server.close(resolve));
    server.closeAllConnections();
    await closed;
  }
}

const PLAN = { tub: { length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 }, layout: { levels: 9, columns: 3 } };
const a = new CalculatorCopy();
const b = new CalculatorCopy();
const broken = new CalculatorCopy('hang-up');
let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
let pool: CalculatorPool;
let token = '';

const plan = () => request(stack.app).post('/api/v1/calc/rack-plan').set({ authorization: `Bearer ${token}` }).send(PLAN);
async function plans(n: number): Promise<number[]> {
  const statuses: number[] = [];
  for (let i = 0; i < n; i++) statuses.push((await plan()).status);
  return statuses;
}

beforeAll(async () => {
  await Promise.all([a.start(), b.start(), broken.start()]);
  stack = await gatewayTestStack({ calculatorUrls: [a.url, b.url] });
  pool = stack.app.locals.calculatorPool as CalculatorPool;
  const login = await request(stack.app).post('/api/v1/auth/login').send({ email: 'builder@demo.tubwright.test', password: 'tubwright-demo' });
  token = login.body.accessToken;
});
afterAll(async () => {
  pool.stop();
  await Promise.all([a.stop(), b.stop(), broken.stop()]);
  await stack.close();
});
beforeEach(async () => {
  await Promise.all([a.start(), b.start()]);
  await pool.checkHealth();
  a.hits = 0;
  b.hits = 0;
});

describe('calculator copies behind the gateway', () => {
  it('spreads requests over both copies', async () => {
    expect(await plans(10)).toEqual(Array(10).fill(200));
    // Round-robin over two copies that are up: five each.
    expect([a.hits, b.hits]).toEqual([5, 5]);
    const res = await plan();
    expect(res.body.dimensions.outerShelfLength - res.body.dimensions.interiorShelfLength).toBe(1);
  });

  it('passes a calculator refusal through unchanged and does not send it twice', async () => {
    const res = await request(stack.app).post('/api/v1/calc/rack-plan').set({ authorization: `Bearer ${token}` }).send({ tub: PLAN.tub });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(a.hits + b.hits).toBe(1);
  });

  it('answers every request with one copy stopped, and takes that copy out', async () => {
    await a.stop();
    expect(await plans(8)).toEqual(Array(8).fill(200));
    expect(b.hits).toBe(8);
    expect(pool.copies.find((c) => c.url === a.url)!.up).toBe(false);
    const health = await request(stack.app).get('/api/v1/health');
    expect(health.body.services.calculator.status).toBe('ok');
    expect(health.body.services.calculator.error).toContain(a.url);
  });

  it('answers 503 in the error shape with both copies stopped', async () => {
    await Promise.all([a.stop(), b.stop()]);
    const res = await plan();
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ error: { code: 'service_unavailable', message: expect.any(String) } });
    const health = await request(stack.app).get('/api/v1/health');
    expect(health.status).toBe(503);
    expect(health.body.services.calculator.status).toBe('down');
  });

  it('sends requests to a copy again once its health check answers', async () => {
    await a.stop();
    await plans(2);
    expect(pool.copies.find((c) => c.url === a.url)!.up).toBe(false);
    await a.start();
    await pool.checkHealth();
    a.hits = 0;
    b.hits = 0;
    expect(await plans(4)).toEqual([200, 200, 200, 200]);
    expect([a.hits, b.hits]).toEqual([2, 2]);
  });
});

describe('a copy that fails mid-request', () => {
  it('retries the calculation once on another copy and takes the failing one out', async () => {
    const mixed = await gatewayTestStack({ calculatorUrls: [broken.url, b.url] });
    const mixedPool = mixed.app.locals.calculatorPool as CalculatorPool;
    try {
      const login = await request(mixed.app).post('/api/v1/auth/login').send({ email: 'builder@demo.tubwright.test', password: 'tubwright-demo' });
      broken.hits = 0;
      b.hits = 0;
      const send = () => request(mixed.app).post('/api/v1/calc/rack-plan').set({ authorization: `Bearer ${login.body.accessToken}` }).send(PLAN);
      // The first request goes to the broken copy, dies there, and is answered by the other.
      const first = await send();
      expect(first.status).toBe(200);
      expect([broken.hits, b.hits]).toEqual([1, 1]);
      expect(mixedPool.copies[0]!.up).toBe(false);
      // Taken out: the rest go straight to the working copy.
      expect((await send()).status).toBe(200);
      expect([broken.hits, b.hits]).toEqual([1, 2]);
    } finally {
      mixedPool.stop();
      await mixed.close();
    }
  });

  it('retries only once: with every copy failing the answer is 503, after two tries', async () => {
    const both = new CalculatorCopy('hang-up');
    await both.start();
    const failing = await gatewayTestStack({ calculatorUrls: [broken.url, both.url] });
    const failingPool = failing.app.locals.calculatorPool as CalculatorPool;
    try {
      const login = await request(failing.app).post('/api/v1/auth/login').send({ email: 'builder@demo.tubwright.test', password: 'tubwright-demo' });
      broken.hits = 0;
      const res = await request(failing.app).post('/api/v1/calc/rack-plan').set({ authorization: `Bearer ${login.body.accessToken}` }).send(PLAN);
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('service_unavailable');
      expect(broken.hits + both.hits).toBe(2);
    } finally {
      failingPool.stop();
      await failing.close();
      await both.stop();
    }
  });

  it('answers 504 for a copy that is slow, without sending the calculation again or taking the copy out', async () => {
    const slow = new CalculatorCopy('slow');
    await slow.start();
    const slowStack = await gatewayTestStack({ calculatorUrls: [slow.url, b.url], upstreamTimeoutMs: 300 });
    const slowPool = slowStack.app.locals.calculatorPool as CalculatorPool;
    try {
      const login = await request(slowStack.app).post('/api/v1/auth/login').send({ email: 'builder@demo.tubwright.test', password: 'tubwright-demo' });
      b.hits = 0;
      const res = await request(slowStack.app).post('/api/v1/calc/rack-plan').set({ authorization: `Bearer ${login.body.accessToken}` }).send(PLAN);
      expect(res.status).toBe(504);
      expect(res.body).toEqual({ error: { code: 'upstream_timeout', message: expect.stringMatching(/calculator/) } });
      expect([slow.hits, b.hits]).toEqual([1, 0]);
      expect(slowPool.copies[0]!.up).toBe(true);
    } finally {
      slowPool.stop();
      await slowStack.close();
      await slow.stop();
    }
  });
});
