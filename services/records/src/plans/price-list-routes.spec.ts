import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MaterialList, PriceList, ShopMaterial } from '../../../../shared/api/plans.js';
import { PRICE_KEY_LIST } from '../../../../shared/api/rack-plan.js';
import { seedPlansDemo } from '../seed/plans-demo.js';
import { asRole, recordsTestApp } from '../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await seedPlansDemo(ctx.db);
});
afterAll(() => ctx.close());

const owner = () => asRole('owner');
const putPrices = (items: object[], who = owner()) => request(ctx.app).put('/api/v1/price-list').set(who).send({ items });
const priceOf = async (key: string) => (await request(ctx.app).get('/api/v1/price-list').set(owner())).body.items.find((i: { key: string }) => i.key === key);
const materialOf = async (key: string) => (await request(ctx.app).get('/api/v1/materials').set(owner())).body.items.find((i: { key: string }) => i.key === key);
const material = { label: 'Test sheet', kind: 'sheet', thicknessIn: 0.5, densityKgM3: 1000, modulusMPa: 2000, pricePerSheet: 100, sheetLengthIn: 96, sheetWidthIn: 48 };

describe('price list', () => {
  it('lists every calculator key for owner, builder and sales, and refuses keepers and strangers', async () => {
    for (const role of ['owner', 'builder', 'sales'] as const) {
      const res = await request(ctx.app).get('/api/v1/price-list').set(asRole(role));
      expect(res.status, role).toBe(200);
      expect(PriceList.safeParse(res.body).success).toBe(true);
    }
    const keys = (await request(ctx.app).get('/api/v1/price-list').set(owner())).body.items.map((i: { key: string }) => i.key);
    expect(keys).toEqual(expect.arrayContaining(PRICE_KEY_LIST));
    expect((await request(ctx.app).get('/api/v1/price-list').set(asRole('keeper'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/price-list')).status).toBe(401);
  });

  it('upserts by key, keeps unlisted keys, adds labelled keys and removes with price null', async () => {
    const before = await priceOf('dowel');
    const res = await putPrices([{ key: 'thermostat', price: 77.5, notes: 'new supplier' }, { key: 'delivery.far', price: 90, label: 'Delivery beyond 25 miles', unit: 'each' }]);
    expect(res.status).toBe(200);
    expect(res.body.items.find((i: { key: string }) => i.key === 'thermostat')).toMatchObject({ price: 77.5, notes: 'new supplier', unit: 'each', usedByCalculator: true });
    expect(res.body.items.find((i: { key: string }) => i.key === 'delivery.far')).toMatchObject({ price: 90, category: 'other', usedByCalculator: false });
    expect(await priceOf('dowel')).toEqual(before);
    await putPrices([{ key: 'delivery.far', price: null }]);
    expect(await priceOf('delivery.far')).toBeUndefined();
    const audited = await ctx.db('audit_log').where({ entity: 'price list' }).count({ n: '*' }).first();
    expect(Number((audited as { n: number }).n)).toBeGreaterThanOrEqual(2);
  });

  it('names the field of bad entries and writes nothing then', async () => {
    const cases: [object, string][] = [
      [{ items: [{ key: 'thermostat', price: -1 }] }, 'items[0].price'],
      [{ items: [{ key: 'Thermostat!', price: 1 }] }, 'items[0].key'],
      [{ items: [{ key: 'thermostat', price: 1 }, { key: 'thermostat', price: 2 }] }, 'items[1].key'],
      [{ items: [{ key: 'thermostat', price: 1 }, { key: 'gift.wrap', price: 2 }] }, 'items[1].label'],
      [{ items: [] }, 'items'],
      [{ items: [{ key: 'thermostat', price: 1, colour: 'red' }] }, 'items[0]'],
    ];
    const before = await priceOf('thermostat');
    for (const [body, field] of cases) {
      const res = await request(ctx.app).put('/api/v1/price-list').set(owner()).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.field, JSON.stringify(body)).toBe(field);
    }
    expect(await priceOf('thermostat')).toEqual(before);
  });

  it('lets only the owner write', async () => {
    expect((await putPrices([{ key: 'thermostat', price: 1 }], asRole('builder'))).status).toBe(403);
    expect((await putPrices([{ key: 'thermostat', price: 1 }], asRole('sales'))).status).toBe(403);
    expect((await request(ctx.app).put('/api/v1/price-list').send({ items: [] })).status).toBe(401);
  });

  it('mirrors sheet and lumber prices to the materials of the same key', async () => {
    await putPrices([{ key: 'sheet.pvc-rigid', price: 250 }, { key: 'lumber.2x4-per-foot', price: 1.25 }]);
    expect((await materialOf('pvc-rigid')).pricePerSheet).toBe(250);
    const lumber = await materialOf('lumber-2x4');
    // A stick is priced per foot: 12 in to the foot.
    expect(lumber.pricePerSheet).toBeCloseTo(1.25 * (lumber.sheetLengthIn / 12), 4);
  });

  it('is what plans are computed with', async () => {
    await putPrices([{ key: 'heat-tape.per-foot', price: 4.4 }]);
    const plan = await request(ctx.app).post('/api/v1/plans').set(asRole('builder')).send({ name: 'p', spec: { tub: { length: 20, width: 13.5, height: 5 }, layout: { levels: 3, columns: 2 } } });
    expect(plan.body.result.cost.lines.find((l: { key: string }) => l.key === 'heat-tape.per-foot').unitPrice).toBe(4.4);
  });
});

describe('materials', () => {
  it('lists the materials with their physical values for owner, builder and sales', async () => {
    const res = await request(ctx.app).get('/api/v1/materials').set(asRole('sales'));
    expect(res.status).toBe(200);
    expect(MaterialList.safeParse(res.body).success).toBe(true);
    expect(res.body.items.map((m: { key: string }) => m.key)).toEqual(expect.arrayContaining(['pvc-rigid', 'pvc-expanded', 'melamine-particleboard', 'plywood', 'lumber-2x4']));
    // ASTM D792 specific gravity 1.41 for rigid PVC, as the calculator's material list cites.
    expect((await materialOf('pvc-rigid')).densityKgM3).toBe(1410);
    expect((await request(ctx.app).get('/api/v1/materials').set(asRole('keeper'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/materials')).status).toBe(401);
  });

  it('creates a new material with 201 and replaces it with 200', async () => {
    const created = await request(ctx.app).put('/api/v1/materials/acrylic-clear').set(owner()).send(material);
    expect(created.status).toBe(201);
    expect(ShopMaterial.safeParse(created.body).success).toBe(true);
    expect(created.body).toMatchObject({ key: 'acrylic-clear', heatedModulusMPa: null, source: '', usedByCalculator: false });
    const replaced = await request(ctx.app).put('/api/v1/materials/acrylic-clear').set(owner()).send({ ...material, label: 'Clear acrylic', pricePerSheet: 140 });
    expect(replaced.status).toBe(200);
    expect(replaced.body).toMatchObject({ id: created.body.id, label: 'Clear acrylic', pricePerSheet: 140 });
    expect(await priceOf('sheet.acrylic-clear')).toBeUndefined();
  });

  it('mirrors a calculator material price into the price list', async () => {
    await request(ctx.app).put('/api/v1/materials/plywood').set(owner()).send({ ...material, label: 'Plywood', pricePerSheet: 66 });
    expect((await priceOf('sheet.plywood')).price).toBe(66);
    await request(ctx.app).put('/api/v1/materials/lumber-2x4').set(owner()).send({ ...material, label: '2x4', kind: 'board', thicknessIn: 1.5, sheetLengthIn: 120, sheetWidthIn: 3.5, pricePerSheet: 10 });
    // 120 in = 10 ft, so 10 per stick is 1 per foot.
    expect((await priceOf('lumber.2x4-per-foot')).price).toBe(1);
  });

  it('names the field of a bad key or body and lets only the owner write', async () => {
    const badKey = await request(ctx.app).put('/api/v1/materials/Bad%20Key').set(owner()).send(material);
    expect(badKey.status).toBe(400);
    expect(badKey.body.error.field).toBe('key');
    for (const [body, field] of [[{ ...material, thicknessIn: -1 }, 'thicknessIn'], [{ ...material, kind: 'roll' }, 'kind'], [{ ...material, label: undefined }, 'label'], [{ ...material, pricePerSheet: -5 }, 'pricePerSheet']] as const) {
      const res = await request(ctx.app).put('/api/v1/materials/pvc-rigid').set(owner()).send(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.field).toBe(field);
    }
    expect((await request(ctx.app).put('/api/v1/materials/pvc-rigid').set(asRole('builder')).send(material)).status).toBe(403);
    expect((await request(ctx.app).put('/api/v1/materials/pvc-rigid').send(material)).status).toBe(401);
  });
});
