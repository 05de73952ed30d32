import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gatewayTestStack } from '../test-support.js';
import type { CalculationMemo } from './calculation-memo.js';
import type { CalculatorPool } from './calculator-pool.js';
import { CALCULATION_HEADER } from './calculator-proxy.js';

const PLAN = { tub: { length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 }, layout: { levels: 9, columns: 3 } };
let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
let pool: CalculatorPool;
const tokens: Record<string, string> = {};

const served = () => pool.copies[0]!.served;
const plan = (role: string, body: unknown = PLAN) =>
  request(stack.app).post('/api/v1/calc/rack-plan').set({ authorization: `Bearer ${tokens[role]}` }).send(body as object);

beforeAll(async () => {
  stack = await gatewayTestStack({ calculationMemoEntries: 50 });
  pool = stack.app.locals.calculatorPool as CalculatorPool;
  for (const role of ['builder', 'sales', 'keeper']) {
    const login = await request(stack.app).post('/api/v1/auth/login').send({ email: `${role}@demo.tubwright.test`, password: 'tubwright-demo' });
    tokens[role] = login.body.accessToken;
  }
});
afterAll(() => stack.close());

describe('reusing calculator answers for identical requests', () => {
  it('computes a spec once and answers the same spec again, byte for byte, without the calculator', async () => {
    const before = served();
    const first = await plan('builder');
    const second = await plan('builder');
    expect(first.status).toBe(200);
    expect(first.headers[CALCULATION_HEADER]).toBe('computed');
    expect(second.status).toBe(200);
    expect(second.headers[CALCULATION_HEADER]).toBe('reused');
    expect(second.text).toBe(first.text);
    expect(second.headers['content-type']).toBe(first.headers['content-type']);
    expect(served() - before).toBe(1);
  });

  it('computes again for another spec or another role', async () => {
    const before = served();
    const taller = await plan('builder', { ...PLAN, layout: { levels: 10, columns: 3 } });
    expect(taller.headers[CALCULATION_HEADER]).toBe('computed');
    expect(taller.body.sections.reduce((n: number, s: { levels: number }) => n + s.levels, 0)).toBe(10);
    expect((await plan('sales')).headers[CALCULATION_HEADER]).toBe('computed');
    expect(served() - before).toBe(2);
  });

  it('never hands a remembered answer to a role the calculator refuses', async () => {
    expect((await plan('builder')).status).toBe(200);
    const keeper = await plan('keeper');
    expect(keeper.status).toBe(403);
    expect(keeper.headers[CALCULATION_HEADER]).not.toBe('reused');
  });

  it('keeps no refusal: bad input is checked by the calculator every time', async () => {
    const before = served();
    const bad = { ...PLAN, layout: { levels: 0, columns: 3 } };
    for (let i = 0; i < 2; i++) {
      const res = await plan('builder', bad);
      expect(res.status).toBe(400);
      expect(res.body.error.field).toBe('layout.levels');
      expect(res.headers[CALCULATION_HEADER]).toBe('computed');
    }
    expect(served() - before).toBe(2);
  });

  it('counts what it reused', () => {
    const memo = stack.app.locals.calculationMemo as CalculationMemo;
    expect(memo.hits).toBeGreaterThanOrEqual(2);
    expect(memo.size).toBeGreaterThanOrEqual(3);
  });
});

describe('without a memo (the default for a gateway built in code)', () => {
  it('sends every request to the calculator and says nothing about reuse', async () => {
    const plain = await gatewayTestStack();
    try {
      const login = await request(plain.app).post('/api/v1/auth/login').send({ email: 'builder@demo.tubwright.test', password: 'tubwright-demo' });
      const send = () => request(plain.app).post('/api/v1/calc/rack-plan').set({ authorization: `Bearer ${login.body.accessToken}` }).send(PLAN);
      await send();
      const again = await send();
      expect(again.status).toBe(200);
      expect(again.headers[CALCULATION_HEADER]).toBeUndefined();
      expect((plain.app.locals.calculatorPool as CalculatorPool).copies[0]!.served).toBe(2);
    } finally {
      await plain.close();
    }
  });
});
