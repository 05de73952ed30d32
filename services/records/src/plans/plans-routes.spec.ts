import { parse as parseCsv } from 'csv-parse/sync';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Plan, PlanComparison, PlanPage, PlanVersion, PlanVersionPage } from '../../../../shared/api/plans.js';
import { MM_PER_IN } from '../../../../shared/units.js';
import { DEMO_PRICES, seedPlansDemo } from '../seed/plans-demo.js';
import { asRole, recordsTestApp } from '../test-support.js';
import { pdfText } from './pdf-text.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await seedPlansDemo(ctx.db);
});
afterAll(() => ctx.close());

const builder = () => asRole('builder');
const spec = (levels = 5, columns = 2) => ({ tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels, columns } });
const create = (body: object, who = builder()) => request(ctx.app).post('/api/v1/plans').set(who).send(body);
const binary = (req: request.Test) =>
  req.buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });

describe('saved plans: list and read', () => {
  it('lists plans as a page that matches its schema, filtered by status and text', async () => {
    const all = await request(ctx.app).get('/api/v1/plans').set(asRole('sales'));
    expect(all.status).toBe(200);
    expect(PlanPage.safeParse(all.body).success).toBe(true);
    expect(all.body.items.every((p: { spec?: unknown; result?: unknown }) => p.spec === undefined && p.result === undefined)).toBe(true);
    const archived = await request(ctx.app).get('/api/v1/plans?status=archived').set(builder());
    expect(archived.body.total).toBeGreaterThan(0);
    expect(archived.body.items.every((p: { status: string }) => p.status === 'archived')).toBe(true);
    const found = await request(ctx.app).get('/api/v1/plans?q=Longhold').set(builder());
    expect(found.body.total).toBeGreaterThan(0);
    expect(found.body.items.every((p: { name: string; tubModelName: string | null }) => `${p.name} ${p.tubModelName}`.includes('Longhold'))).toBe(true);
    const byName = await request(ctx.app).get('/api/v1/plans?sort=name').set(builder());
    const names = byName.body.items.map((p: { name: string }) => p.name);
    expect(names).toEqual([...names].sort());
  });

  it('seeds demo plans once: seeding again adds nothing', async () => {
    const count = async (table: string) => Number(((await ctx.db(table).count({ n: '*' }).first()) as { n: number }).n);
    const before = [await count('plans'), await count('plan_versions'), await count('price_list'), await count('materials')];
    await seedPlansDemo(ctx.db);
    expect([await count('plans'), await count('plan_versions'), await count('price_list'), await count('materials')]).toEqual(before);
  });

  it('answers 400 naming the query field, 401 without identity and 403 for a keeper', async () => {
    for (const [query, field] of [['status=gone', 'query.status'], ['sort=spec', 'query.sort'], ['limit=0', 'query.limit'], ['colour=red', 'query']] as const) {
      const res = await request(ctx.app).get(`/api/v1/plans?${query}`).set(builder());
      expect(res.status, query).toBe(400);
      expect(res.body.error.field, query).toBe(field);
    }
    expect((await request(ctx.app).get('/api/v1/plans')).status).toBe(401);
    expect((await request(ctx.app).get('/api/v1/plans').set(asRole('keeper'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/plans/1').set(asRole('keeper'))).status).toBe(403);
  });

  it('reads one plan with spec and result, 404 for a missing one, 400 for a bad id', async () => {
    const res = await request(ctx.app).get('/api/v1/plans/1').set(asRole('sales'));
    expect(res.status).toBe(200);
    const parsed = Plan.safeParse(res.body);
    expect(parsed.success, parsed.error?.message).toBe(true);
    expect((await request(ctx.app).get('/api/v1/plans/9999').set(builder())).status).toBe(404);
    const bad = await request(ctx.app).get('/api/v1/plans/abc').set(builder());
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('id');
  });
});

describe('saved plans: create', () => {
  it('computes the plan through the calculator and stores version 1', async () => {
    const res = await create({ name: 'Test rack', notes: 'n', tubModelId: 3, spec: spec(9, 3) });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Test rack', version: 1, status: 'active', tubModelId: 3, tubModelName: 'Longhold 28', unit: 'in', createdBy: 1 });
    const d = res.body.result.dimensions;
    // Rack rules (common practice): the top covers both 1/2 in side panels, so it is 1 in longer than the interior shelf;
    // a level is the tub height plus the default 1/8 in lid gap.
    expect(d.outerShelfLength - d.interiorShelfLength).toBeCloseTo(1, 9);
    expect(d.levelOpening).toBeCloseTo(6.5 + 0.125, 9);
    expect(res.body.summary).toMatchObject({ levels: 9, columns: 3, tubs: 27, total: res.body.result.cost.total });
    const versions = await request(ctx.app).get(`/api/v1/plans/${res.body.id}/versions`).set(builder());
    expect(versions.body.items.map((v: { version: number }) => v.version)).toEqual([1]);
  });

  it('fills prices from the shop price list unless the spec sets them, and does not store the shop prices in the spec', async () => {
    const res = await create({ name: 'Priced', spec: { ...spec(), prices: { caster: 20 } } });
    const price = (key: string) => res.body.result.cost.lines.find((l: { key: string }) => l.key === key)?.unitPrice;
    expect(price('thermostat')).toBe(DEMO_PRICES.thermostat);
    expect(price('caster')).toBe(20);
    expect(res.body.spec.prices).toEqual({ caster: 20 });
  });

  it('names the field of a bad body, prefixing spec fields, and never answers 500', async () => {
    const cases: [unknown, string][] = [
      [{ spec: spec() }, 'name'],
      [{ name: '  ', spec: spec() }, 'name'],
      [{ name: 'x' }, 'spec'],
      [{ name: 'x', spec: { ...spec(), layout: { levels: 0, columns: 2 } } }, 'spec.layout.levels'],
      [{ name: 'x', spec: { ...spec(), tub: { length: 23, width: -1, height: 6 } } }, 'spec.tub.width'],
      [{ name: 'x', spec: { ...spec(), prices: { 'sheet.gold': 1 } } }, 'spec.prices'],
      [{ name: 'x', tubModelId: 'three', spec: spec() }, 'tubModelId'],
      [{ name: 'x', spec: spec(), owner: 'me' }, 'body'],
      [[1, 2], 'body'],
    ];
    for (const [body, field] of cases) {
      const res = await create(body as object);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.field, JSON.stringify(body)).toBe(field);
    }
  });

  it('passes a spec the calculator cannot build through as 422 naming the spec field', async () => {
    // A 200 in tub cannot stand in a side panel cut from a 96 in sheet.
    const res = await create({ name: 'Too tall', spec: { ...spec(), tub: { length: 23, width: 16, height: 200 } } });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('spec.tub.height');
  });

  it('refuses an unknown tub model with 422, and sales, keepers and strangers', async () => {
    const unknown = await create({ name: 'x', tubModelId: 9999, spec: spec() });
    expect(unknown.status).toBe(422);
    expect(unknown.body.error.field).toBe('tubModelId');
    expect((await create({ name: 'x', spec: spec() }, asRole('sales'))).status).toBe(403);
    expect((await create({ name: 'x', spec: spec() }, asRole('keeper'))).status).toBe(403);
    expect((await request(ctx.app).post('/api/v1/plans').send({ name: 'x', spec: spec() })).status).toBe(401);
  });
});

describe('saved plans: change, history, duplicate, delete', () => {
  it('renames and archives without a new version, recomputes a new spec as version 2 and keeps version 1', async () => {
    const { body: plan } = await create({ name: 'History', spec: spec(5, 2) });
    const renamed = await request(ctx.app).patch(`/api/v1/plans/${plan.id}`).set(builder()).send({ name: 'History, renamed', status: 'archived', notes: 'old' });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({ name: 'History, renamed', status: 'archived', notes: 'old', version: 1 });
    const changed = await request(ctx.app).patch(`/api/v1/plans/${plan.id}`).set(builder()).send({ spec: spec(7, 2), status: 'active' });
    expect(changed.body).toMatchObject({ version: 2, status: 'active' });
    expect(changed.body.result.sections.reduce((n: number, s: { levels: number }) => n + s.levels, 0)).toBe(7);
    const versions = await request(ctx.app).get(`/api/v1/plans/${plan.id}/versions`).set(asRole('sales'));
    expect(PlanVersionPage.safeParse(versions.body).success).toBe(true);
    expect(versions.body.items.map((v: { version: number; summary: { levels: number } }) => [v.version, v.summary.levels])).toEqual([
      [2, 7],
      [1, 5],
    ]);
    const first = await request(ctx.app).get(`/api/v1/plans/${plan.id}/versions/1`).set(builder());
    expect(PlanVersion.safeParse(first.body).success).toBe(true);
    expect(first.body.spec.layout.levels).toBe(5);
    expect((await request(ctx.app).get(`/api/v1/plans/${plan.id}/versions/3`).set(builder())).status).toBe(404);
  });

  it('recomputes the saved spec with the current price list on request', async () => {
    const { body: plan } = await create({ name: 'Reprice', spec: spec() });
    await request(ctx.app).put('/api/v1/price-list').set(asRole('owner')).send({ items: [{ key: 'thermostat', price: 131 }] });
    const res = await request(ctx.app).patch(`/api/v1/plans/${plan.id}`).set(builder()).send({ recompute: true });
    expect(res.body.version).toBe(2);
    expect(res.body.result.cost.lines.find((l: { key: string }) => l.key === 'thermostat').unitPrice).toBe(131);
    await request(ctx.app).put('/api/v1/price-list').set(asRole('owner')).send({ items: [{ key: 'thermostat', price: DEMO_PRICES.thermostat }] });
  });

  it('answers 400 naming the field, 404, 403 and 422 on change', async () => {
    const id = (await create({ name: 'Guarded', spec: spec() })).body.id;
    for (const [body, field] of [[{ status: 'gone' }, 'status'], [{ name: '' }, 'name'], [{ spec: { ...spec(), layout: { levels: 3, columns: 0 } } }, 'spec.layout.columns'], [{ recompute: 'yes' }, 'recompute'], [{ colour: 'red' }, 'body']] as const) {
      const res = await request(ctx.app).patch(`/api/v1/plans/${id}`).set(builder()).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.field, JSON.stringify(body)).toBe(field);
    }
    const unbuildable = await request(ctx.app).patch(`/api/v1/plans/${id}`).set(builder()).send({ spec: { ...spec(), tub: { length: 23, width: 16, height: 200 } } });
    expect(unbuildable.status).toBe(422);
    expect(unbuildable.body.error.field).toBe('spec.tub.height');
    expect((await request(ctx.app).get(`/api/v1/plans/${id}`).set(builder())).body.version).toBe(1);
    expect((await request(ctx.app).patch('/api/v1/plans/9999').set(builder()).send({ name: 'x' })).status).toBe(404);
    expect((await request(ctx.app).patch(`/api/v1/plans/${id}`).set(asRole('sales')).send({ name: 'x' })).status).toBe(403);
    expect((await request(ctx.app).patch(`/api/v1/plans/${id}`).send({ name: 'x' })).status).toBe(401);
  });

  it('duplicates a plan into version 1 of a new one', async () => {
    const { body: source } = await create({ name: 'Original', notes: 'keep', spec: spec(4, 2) });
    const copy = await request(ctx.app).post(`/api/v1/plans/${source.id}/duplicate`).set(builder());
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'Original (copy)', notes: 'keep', version: 1, spec: source.spec, result: source.result });
    expect(copy.body.id).not.toBe(source.id);
    const named = await request(ctx.app).post(`/api/v1/plans/${source.id}/duplicate`).set(builder()).send({ name: 'Second' });
    expect(named.body.name).toBe('Second');
    const bad = await request(ctx.app).post(`/api/v1/plans/${source.id}/duplicate`).set(builder()).send({ name: 5 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('name');
    expect((await request(ctx.app).post('/api/v1/plans/9999/duplicate').set(builder())).status).toBe(404);
    expect((await request(ctx.app).post(`/api/v1/plans/${source.id}/duplicate`).set(asRole('sales'))).status).toBe(403);
  });

  it('removes a plan softly, keeping its row and versions', async () => {
    const { body: plan } = await create({ name: 'Doomed', spec: spec() });
    expect((await request(ctx.app).delete(`/api/v1/plans/${plan.id}`).set(asRole('sales'))).status).toBe(403);
    expect((await request(ctx.app).delete(`/api/v1/plans/${plan.id}`).set(builder())).status).toBe(204);
    expect((await request(ctx.app).get(`/api/v1/plans/${plan.id}`).set(builder())).status).toBe(404);
    expect((await request(ctx.app).delete(`/api/v1/plans/${plan.id}`).set(builder())).status).toBe(404);
    expect((await request(ctx.app).get('/api/v1/plans?q=Doomed').set(builder())).body.total).toBe(0);
    expect((await ctx.db('plans').where({ id: plan.id }).first()).deleted_at).toBeTruthy();
    expect(await ctx.db('plan_versions').where({ plan_id: plan.id }).count({ n: '*' }).first()).toEqual({ n: 1 });
  });
});

describe('saved plans: compare and exports', () => {
  it('compares two plans side by side, converting plan B to plan A\'s unit', async () => {
    const { body: a } = await create({ name: 'A', spec: spec(5, 2) });
    const mm = { unit: 'mm', tub: { length: 23 * MM_PER_IN, width: 16.25 * MM_PER_IN, height: 6.5 * MM_PER_IN }, layout: { levels: 6, columns: 2 } };
    const { body: b } = await create({ name: 'B', spec: mm });
    const res = await request(ctx.app).get(`/api/v1/plans/${a.id}/compare/${b.id}`).set(asRole('sales'));
    expect(res.status).toBe(200);
    expect(PlanComparison.safeParse(res.body).success).toBe(true);
    expect(res.body.unit).toBe('in');
    const height = res.body.dimensions.find((d: { key: string }) => d.key === 'overallHeight');
    expect(height.a).toBe(a.result.dimensions.overallHeight);
    // 1 in = 25.4 mm exactly (NIST SP 811).
    expect(height.b).toBeCloseTo(b.result.dimensions.overallHeight / 25.4, 5);
    expect(height.difference).toBeCloseTo(height.b - height.a, 5);
    const total = res.body.cost.find((c: { key: string }) => c.key === 'total');
    expect([total.a, total.b]).toEqual([a.result.cost.total, b.result.cost.total]);
    expect((await request(ctx.app).get(`/api/v1/plans/${a.id}/compare/9999`).set(builder())).status).toBe(404);
    const bad = await request(ctx.app).get(`/api/v1/plans/${a.id}/compare/x`).set(builder());
    expect(bad.body.error.field).toBe('otherId');
    expect((await request(ctx.app).get(`/api/v1/plans/${a.id}/compare/${b.id}`).set(asRole('keeper'))).status).toBe(403);
  });

  it('serves the cut list as RFC 4180 CSV, one row per part', async () => {
    const plan = (await request(ctx.app).get('/api/v1/plans/1').set(builder())).body;
    const res = await request(ctx.app).get('/api/v1/plans/1/cut-list.csv').set(asRole('sales'));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename=.*\.csv/);
    expect(res.text).toMatch(/\r\n$/);
    const rows = parseCsv(res.text, { columns: true }) as Record<string, string>[];
    expect(rows).toHaveLength(plan.result.parts.length);
    plan.result.parts.forEach((p: { name: string; material: string; length: number; quantity: number; section: number | null }, i: number) => {
      expect(rows[i]).toMatchObject({ 'Part no.': String(i + 1), Name: p.name, Material: p.material, 'Length (in)': String(p.length), Quantity: String(p.quantity), Section: p.section === null ? 'base' : String(p.section) });
    });
    const side = rows.find((r) => r.Name === 'side panel')!;
    expect(side['Length (in, fraction)']).toBe(plan.result.display.parts.find((p: { key: string }) => p.key === 'side-panel').length);
    expect((await request(ctx.app).get('/api/v1/plans/9999/cut-list.csv').set(builder())).status).toBe(404);
    expect((await request(ctx.app).get('/api/v1/plans/1/cut-list.csv').set(asRole('keeper'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/plans/1/cut-list.csv')).status).toBe(401);
  });

  it('serves the build sheet as a PDF holding the part names, the assembly order and the cautions', async () => {
    const plan = (await request(ctx.app).get('/api/v1/plans/1').set(builder())).body;
    const res = await binary(request(ctx.app).get('/api/v1/plans/1/build-sheet.pdf').set(asRole('sales')));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = pdfText(pdf);
    for (const part of plan.result.parts as { name: string }[]) expect(text).toContain(part.name);
    for (const words of ['Assembly order', 'Base:', 'Bottom section', 'Heat tape:', 'Thermostat:', 'licensed electrician', 'anchor tall racks', 'Escape gaps', plan.name]) expect(text).toContain(words);
    expect((await request(ctx.app).get('/api/v1/plans/9999/build-sheet.pdf').set(builder())).status).toBe(404);
    expect((await request(ctx.app).get('/api/v1/plans/1/build-sheet.pdf').set(asRole('keeper'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/plans/abc/build-sheet.pdf').set(builder())).status).toBe(400);
  });
});
