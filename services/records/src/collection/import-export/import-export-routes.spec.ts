import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseCsv } from '../shared/csv.js';
import { seedCollectionDemo } from '../../seed/collection-demo.js';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
const keeper = () => asRole('keeper');
const send = (path: string, csv: string, role = keeper()) => request(ctx.app).post(path).set(role).set('content-type', 'text/csv').send(csv);
const PREVIEW = '/api/v1/collection/animals/import/preview';
const IMPORT = '/api/v1/collection/animals/import';

beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await seedCollectionDemo(ctx.db);
});
afterAll(() => ctx.close());

const GOOD = 'code,name,species,sex,weightG,hatchDate,forSale,origin,acquiredFrom\nIM-1,Quill,Python regius,female,410,2025-06-01,yes,acquired,a show\nIM-2,"Fig, the second",Python regius,male,,2025-07-02,no,bred,\n';
const BAD = 'code,species,sex,weightG\nIM-3,Python regius,female,-3\nPR-001,Python regius,,\nIM-4,Python regius,,12\n';

describe('animal CSV import', () => {
  it('previews a bad file row by row and imports nothing until it is clean', async () => {
    const before = await ctx.db('animals').count({ n: '*' }).first();
    const preview = await send(PREVIEW, BAD);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ ok: false, rowCount: 3 });
    expect(preview.body.errors).toEqual([
      { row: 2, field: 'weightG', message: expect.any(String) },
      { row: 3, field: 'code', message: 'PR-001 is in the collection already' },
    ]);
    const refused = await send(IMPORT, BAD);
    expect(refused.status).toBe(422);
    expect(refused.body.error.field).toBe('csv[2].weightG');
    expect(await ctx.db('animals').count({ n: '*' }).first()).toEqual(before);
  });

  it('imports a clean file in one go, with the collection\'s columns', async () => {
    const preview = await send(PREVIEW, GOOD);
    expect(preview.body).toMatchObject({ ok: true, rowCount: 2, errors: [] });
    const res = await send(IMPORT, GOOD);
    expect(res.status).toBe(201);
    expect(res.body.imported).toBe(2);
    const fig = await ctx.db('animals').where({ code: 'IM-2' }).first();
    expect(fig).toMatchObject({ name: 'Fig, the second', sex: 'male', weight_g: null, origin: 'bred' });
    const imported = await ctx.db('animals').where({ code: 'IM-1' }).first();
    // SQLite stores a boolean as 1, PostgreSQL as true.
    expect({ ...imported, for_sale: Boolean(imported.for_sale) }).toMatchObject({ for_sale: true, acquired_from: 'a show', weight_g: 410 });
    // the same file again clashes on every code
    expect((await send(PREVIEW, GOOD)).body.errors.map((e: { row: number }) => e.row)).toEqual([2, 3]);
  });

  it('refuses other content types (415), unknown columns (400) and oversized files (413)', async () => {
    expect((await request(ctx.app).post(PREVIEW).set(keeper()).send({ csv: GOOD })).status).toBe(415);
    expect((await send(PREVIEW, 'code,colour\nA,red\n')).body.error.field).toBe('csv');
    expect((await send(PREVIEW, `code,species\n${'X,Python regius\n'.repeat(200_000)}`)).status).toBe(413);
    expect((await send(IMPORT, GOOD, asRole('sales'))).status).toBe(403);
    expect((await request(ctx.app).post(IMPORT).set('content-type', 'text/csv').send(GOOD)).status).toBe(401);
  });
});

describe('CSV export', () => {
  it('exports animals with the import columns, readable back', async () => {
    const res = await request(ctx.app).get('/api/v1/collection/animals.csv').set(keeper());
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/animals\.csv/);
    const rows = parseCsv(res.text, ['code', 'name', 'species', 'morph', 'sex', 'hatchDate', 'weightG', 'status', 'notes', 'origin', 'acquiredFrom', 'forSale', 'feedingIntervalDays'], ['code']);
    expect(rows.find((r) => r.values.code === 'IM-2')?.values.name).toBe('Fig, the second');
    expect(rows.length).toBe(42);
  });

  it('exports events in a date range, and answers 400 for a bad range, 403 for sales', async () => {
    const animal = (await ctx.db('animals').where({ code: 'IM-1' }).first()).id;
    await request(ctx.app).post(`/api/v1/animals/${animal}/events`).set(keeper()).send({ kind: 'weight', occurredAt: '2026-11-15T10:00:00Z', weightG: 420 });
    await request(ctx.app).post(`/api/v1/animals/${animal}/events`).set(keeper()).send({ kind: 'note', occurredAt: '2026-10-15T10:00:00Z', note: '=cmd "quoted"' });
    const res = await request(ctx.app).get('/api/v1/collection/events.csv?from=2026-11-01&to=2026-11-30').set(keeper());
    expect(res.status).toBe(200);
    expect(res.text.split('\r\n')[0]).toBe('id,animalCode,kind,occurredAt,preyKind,preySize,preyMassG,result,weightG,shed,note,createdBy');
    expect(res.text).toContain(',IM-1,weight,2026-11-15T10:00:00.000Z,,,,,420,,,');
    expect(res.text).not.toContain('=cmd');
    const all = await request(ctx.app).get('/api/v1/collection/events.csv?kind=note').set(keeper());
    expect(all.text).toContain(`"'=cmd ""quoted"""`);
    expect((await request(ctx.app).get('/api/v1/collection/events.csv?from=November').set(keeper())).body.error.field).toBe('query.from');
    expect((await request(ctx.app).get('/api/v1/collection/events.csv').set(asRole('sales'))).status).toBe(403);
  });
});

describe('animal profile and the for-sale list', () => {
  it('sets origin, parents, interval and for-sale; sales read only what is for sale', async () => {
    const id = (await ctx.db('animals').where({ code: 'PR-004' }).first()).id;
    const sire = (await ctx.db('animals').where({ code: 'PR-001' }).first()).id;
    const res = await request(ctx.app).patch(`/api/v1/animals/${id}/profile`).set(keeper()).send({ origin: 'bred', sireId: sire, feedingIntervalDays: 10, forSale: true });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ origin: 'bred', sireId: sire, feedingIntervalDays: 10, forSale: true, genes: [] });
    expect(res.body.currentTub).toMatchObject({ label: 'R1-2A', removedAt: null }); // where the animal seed puts PR-004
    expect(res.body.animal.code).toBe('PR-004');
    expect((await request(ctx.app).patch(`/api/v1/animals/${id}/profile`).set(keeper()).send({ damId: sire })).body.error.field).toBe('damId');
    expect((await request(ctx.app).patch(`/api/v1/animals/${id}/profile`).set(keeper()).send({ feedingIntervalDays: 0 })).body.error.field).toBe('feedingIntervalDays');
    expect((await request(ctx.app).get('/api/v1/animals/999999/profile').set(keeper())).status).toBe(404);
    const list = await request(ctx.app).get('/api/v1/collection/for-sale').set(asRole('sales'));
    expect(list.status).toBe(200);
    const codes = list.body.items.map((a: { code: string }) => a.code);
    expect(codes).toEqual(expect.arrayContaining(['IM-1', 'PR-004']));
    const marked = await ctx.db('animals').where({ for_sale: true }).whereIn('status', ['active', 'on-hold']).pluck('code');
    expect([...codes].sort()).toEqual([...marked].sort());
    expect((await request(ctx.app).get(`/api/v1/animals/${id}/profile`).set(asRole('sales'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/collection/for-sale').set(asRole('builder'))).status).toBe(403);
  });
});
