import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCollectionDemo } from '../../seed/collection-demo.js';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
const keeper = () => asRole('keeper');
const id = async (code: string) => (await ctx.db('animals').where({ code }).first()).id as number;
let cinder = 0;
let tide = 0;
let sire = 0;
let dam = 0;

beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await seedCollectionDemo(ctx.db);
  sire = await id('PR-001'); // the demo seed makes every third animal male, the next female
  dam = await id('PR-002');
});
afterAll(() => ctx.close());

describe('traits and genes', () => {
  it('keeps the shop\'s trait list: create, unique names, read, change notes', async () => {
    const a = await request(ctx.app).post('/api/v1/traits').set(keeper()).send({ name: 'cinder', mode: 'recessive' });
    expect(a.status).toBe(201);
    cinder = a.body.id;
    tide = (await request(ctx.app).post('/api/v1/traits').set(keeper()).send({ name: 'tide', mode: 'incomplete-dominant', notes: 'darker saddles' })).body.id;
    expect((await request(ctx.app).post('/api/v1/traits').set(keeper()).send({ name: 'Cinder', mode: 'dominant' })).status).toBe(409);
    expect((await request(ctx.app).post('/api/v1/traits').set(keeper()).send({ name: 'x', mode: 'codominant' })).body.error.field).toBe('mode');
    expect((await request(ctx.app).post('/api/v1/traits').set(keeper()).send({ name: '-x-', mode: 'recessive' })).body.error.field).toBe('name');
    const list = await request(ctx.app).get('/api/v1/traits?mode=recessive&q=cinder').set(asRole('sales'));
    expect(list.body.items.map((t: { name: string }) => t.name)).toEqual(['cinder']);
    expect((await request(ctx.app).patch(`/api/v1/traits/${tide}`).set(keeper()).send({ notes: 'n' })).body.notes).toBe('n');
    expect((await request(ctx.app).patch(`/api/v1/traits/${tide}`).set(keeper()).send({ mode: 'codominant' })).status).toBe(400);
    expect((await request(ctx.app).get('/api/v1/traits/99999').set(keeper())).status).toBe(404);
    expect((await request(ctx.app).post('/api/v1/traits').set(asRole('sales')).send({ name: 'y', mode: 'recessive' })).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/traits').set(asRole('builder'))).status).toBe(403);
  });

  it('sets an animal\'s genes, checking each state against its trait\'s mode', async () => {
    const set = await request(ctx.app).put(`/api/v1/animals/${sire}/genes`).set(keeper()).send({ genes: [{ traitId: cinder, state: 'het' }, { traitId: tide, state: 'single' }] });
    expect(set.status).toBe(200);
    expect(set.body.genes.map((g: { trait: string; state: string }) => `${g.state} ${g.trait}`)).toEqual(['het cinder', 'single tide']);
    await request(ctx.app).put(`/api/v1/animals/${dam}/genes`).set(keeper()).send({ genes: [{ traitId: cinder, state: 'het' }] });
    const wrong = await request(ctx.app).put(`/api/v1/animals/${dam}/genes`).set(keeper()).send({ genes: [{ traitId: tide, state: 'het' }] });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.field).toBe('genes[0].state');
    expect((await request(ctx.app).put(`/api/v1/animals/${dam}/genes`).set(keeper()).send({ genes: [{ traitId: cinder, state: 'possible-het' }] })).body.error.field).toBe('genes[0].hetProbability');
    expect((await request(ctx.app).put(`/api/v1/animals/${dam}/genes`).set(keeper()).send({ genes: [{ traitId: 424242, state: 'het' }] })).body.error.field).toBe('genes[0].traitId');
    expect((await request(ctx.app).put(`/api/v1/animals/${dam}/genes`).set(keeper()).send({ genes: [{ traitId: cinder, state: 'het', hetProbability: 2 }] })).body.error.field).toBe('genes[0].hetProbability');
    expect((await request(ctx.app).get(`/api/v1/animals/${dam}/genes`).set(keeper())).body.genes).toHaveLength(1);
    expect((await request(ctx.app).delete(`/api/v1/traits/${cinder}`).set(keeper())).status).toBe(409);
  });
});

describe('pairings, clutches and the hatch', () => {
  let pairing = 0;
  let clutch = 0;

  it('pairs a male with a female, with a laying window from the pre-lay shed', async () => {
    const res = await request(ctx.app).post('/api/v1/pairings').set(keeper()).send({ sireId: sire, damId: dam, season: '2025-26', ovulationDate: '2026-08-01', preLayShedDate: '2026-08-20' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ sire: { id: sire, code: 'PR-001' }, dam: { id: dam }, status: 'planned', layingWindow: { from: '2026-09-16', to: '2026-09-22', basis: 'pre-lay-shed' } }); // +27 and +33 days, common practice from memory
    pairing = res.body.id;
    expect((await request(ctx.app).post('/api/v1/pairings').set(keeper()).send({ sireId: dam, damId: sire, season: '2025-26' })).body.error.field).toBe('sireId');
    expect((await request(ctx.app).post('/api/v1/pairings').set(keeper()).send({ sireId: sire, damId: 999999, season: '2025-26' })).body.error.field).toBe('damId');
    expect((await request(ctx.app).post('/api/v1/pairings').set(keeper()).send({ sireId: sire, damId: dam, season: '2025-26', ovulationDate: '2099-01-01' })).body.error.field).toBe('ovulationDate');
    expect((await request(ctx.app).post('/api/v1/pairings').set(keeper()).send({ sireId: sire, damId: dam })).body.error.field).toBe('season');
  });

  it('records introductions and locks, which move the status along', async () => {
    await request(ctx.app).post(`/api/v1/pairings/${pairing}/observations`).set(keeper()).send({ kind: 'introduced', observedOn: '2026-06-01' });
    const res = await request(ctx.app).post(`/api/v1/pairings/${pairing}/observations`).set(keeper()).send({ kind: 'lock', observedOn: '2026-06-03', notes: 'two hours' });
    expect(res.status).toBe(201);
    expect(res.body.status).toBe('locked');
    expect(res.body.observations.map((o: { kind: string }) => o.kind)).toEqual(['introduced', 'lock']);
    expect((await request(ctx.app).post(`/api/v1/pairings/${pairing}/observations`).set(keeper()).send({ kind: 'lock', observedOn: '2099-06-03' })).body.error.field).toBe('observedOn');
    expect((await request(ctx.app).post('/api/v1/pairings/999999/observations').set(keeper()).send({ kind: 'lock', observedOn: '2026-06-03' })).status).toBe(404);
    const changed = await request(ctx.app).patch(`/api/v1/pairings/${pairing}`).set(keeper()).send({ notes: 'good weight' });
    expect(changed.body.notes).toBe('good weight');
    expect((await request(ctx.app).get('/api/v1/pairings?season=2025-26').set(keeper())).body.total).toBe(1);
  });

  it('shows the pair\'s outcome table from the genetics calculator', async () => {
    const res = await request(ctx.app).get(`/api/v1/pairings/${pairing}/outcomes`).set(keeper());
    expect(res.status).toBe(200);
    const visual = res.body.outcomes.appearances.find((a: { looks: Record<string, string> }) => a.looks.cinder === 'visual' && a.looks.tide === 'normal');
    expect(visual.fraction).toBe('1/8'); // het x het 1/4 visual (OpenStax Biology 2e ch. 12) times 1/2 without tide
  });

  it('adds a clutch with its expected hatch 55 to 60 days out (common practice)', async () => {
    const res = await request(ctx.app).post('/api/v1/clutches').set(keeper()).send({ pairingId: pairing, laidOn: '2026-09-20', fertileEggs: 4, slugs: 1, incubationTempF: 89, humidityPct: 95 });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ expectedHatchFrom: '2026-11-14', expectedHatchTo: '2026-11-19', incubationWarning: null });
    clutch = res.body.id;
    expect((await request(ctx.app).get(`/api/v1/pairings/${pairing}`).set(keeper())).body.status).toBe('laid');
    expect((await request(ctx.app).post('/api/v1/clutches').set(keeper()).send({ pairingId: pairing, laidOn: '2099-01-01', fertileEggs: 1 })).body.error.field).toBe('laidOn');
    expect((await request(ctx.app).post('/api/v1/clutches').set(keeper()).send({ pairingId: pairing, laidOn: '2026-09-20', fertileEggs: -1 })).body.error.field).toBe('fertileEggs');
    expect((await request(ctx.app).post('/api/v1/clutches').set(keeper()).send({ pairingId: 999999, laidOn: '2026-09-20', fertileEggs: 1 })).body.error.field).toBe('pairingId');
    const warm = await request(ctx.app).patch(`/api/v1/clutches/${clutch}`).set(keeper()).send({ incubationTempF: 92 });
    expect(warm.body.incubationWarning).toMatch(/outside 88 to 90/);
    expect((await request(ctx.app).get(`/api/v1/clutches?pairingId=${pairing}`).set(keeper())).body.total).toBe(1);
    expect((await request(ctx.app).delete(`/api/v1/pairings/${pairing}`).set(keeper())).status).toBe(409);
  });

  it('hatches: hatchlings become animals with parents and possible genes', async () => {
    const res = await request(ctx.app).post(`/api/v1/clutches/${clutch}/hatch`).set(keeper()).send({
      hatchedOn: '2026-11-16',
      hatchlings: [
        { code: 'PR-H1', sex: 'female', looks: { cinder: 'visual' } },
        { code: 'PR-H2', looks: { tide: 'single' } },
      ],
    });
    expect(res.status).toBe(201);
    expect(res.body.clutch).toMatchObject({ hatchedOn: '2026-11-16', hatchlingCount: 2 });
    const [h1, h2] = res.body.hatchlings;
    expect(h1.genes.map((g: { state: string; trait: string }) => `${g.state} ${g.trait}`)).toEqual(['visual cinder']);
    expect(h2.genes).toEqual([
      expect.objectContaining({ trait: 'cinder', state: 'possible-het', hetProbability: 0.6667 }), // 2/3 of normal-looking het x het young are het (OpenStax Biology 2e ch. 12)
      expect.objectContaining({ trait: 'tide', state: 'single' }),
    ]);
    const row = await ctx.db('animals').where({ code: 'PR-H2' }).first();
    expect(row).toMatchObject({ sire_id: sire, dam_id: dam, clutch_id: clutch, origin: 'bred', hatch_date: '2026-11-16', species: 'Python regius', morph: '67% possible het cinder, tide' });
    expect((await request(ctx.app).post(`/api/v1/clutches/${clutch}/hatch`).set(keeper()).send({ hatchedOn: '2026-11-16', hatchlings: [{ code: 'PR-H3' }] })).status).toBe(409);
  });

  it('refuses hatchlings the parents cannot produce, used codes and too many hatchlings, writing nothing', async () => {
    const second = (await request(ctx.app).post('/api/v1/clutches').set(keeper()).send({ pairingId: pairing, laidOn: '2026-09-25', fertileEggs: 2 })).body.id;
    const before = await ctx.db('animals').count({ n: '*' }).first();
    const impossible = await request(ctx.app).post(`/api/v1/clutches/${second}/hatch`).set(keeper()).send({ hatchedOn: '2026-11-20', hatchlings: [{ code: 'PR-X1' }, { code: 'PR-X2', looks: { tide: 'super' } }] });
    expect(impossible.status).toBe(422);
    expect(impossible.body.error.field).toBe('hatchlings[1].looks');
    expect((await request(ctx.app).post(`/api/v1/clutches/${second}/hatch`).set(keeper()).send({ hatchedOn: '2026-11-20', hatchlings: [{ code: 'PR-X1' }, { code: 'pr-001' }] })).body.error.field).toBe('hatchlings[1].code');
    expect((await request(ctx.app).post(`/api/v1/clutches/${second}/hatch`).set(keeper()).send({ hatchedOn: '2026-11-20', hatchlings: [{ code: 'A' }, { code: 'B' }, { code: 'C' }] })).status).toBe(422);
    expect((await request(ctx.app).post(`/api/v1/clutches/${second}/hatch`).set(keeper()).send({ hatchedOn: '2026-09-01', hatchlings: [{ code: 'A' }] })).body.error.field).toBe('hatchedOn');
    expect((await request(ctx.app).post(`/api/v1/clutches/${second}/hatch`).set(keeper()).send({ hatchedOn: '2026-11-20', hatchlings: [] })).body.error.field).toBe('hatchlings');
    expect(await ctx.db('animals').count({ n: '*' }).first()).toEqual(before);
  });

  it('answers 401, 403 and 404', async () => {
    expect((await request(ctx.app).get('/api/v1/pairings')).status).toBe(401);
    for (const path of ['/api/v1/pairings', '/api/v1/clutches']) {
      expect((await request(ctx.app).get(path).set(asRole('sales'))).status).toBe(403);
      expect((await request(ctx.app).get(path).set(asRole('builder'))).status).toBe(403);
      expect((await request(ctx.app).get(`${path}/999999`).set(keeper())).status).toBe(404);
    }
    expect((await request(ctx.app).get('/api/v1/clutches?sort=weight').set(keeper())).body.error.field).toBe('query.sort');
  });
});
