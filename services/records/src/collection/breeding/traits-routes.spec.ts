import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
const keeper = () => asRole('keeper');
const patch = (id: number, body: object, role: Parameters<typeof asRole>[0] = 'keeper') => request(ctx.app).patch(`/api/v1/traits/${id}`).set(asRole(role)).send(body);
let animalId = 0;

beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  animalId = (await request(ctx.app).post('/api/v1/animals').set(keeper()).send({ code: 'TR-1', species: 'Python regius' })).body.id;
});
afterAll(() => ctx.close());

const addTrait = async (name: string, mode: string) => (await request(ctx.app).post('/api/v1/traits').set(keeper()).send({ name, mode })).body.id as number;

describe('renaming a trait and changing its mode', () => {
  it('renames a trait; the animals carrying it show the new name', async () => {
    const id = await addTrait('ember', 'recessive');
    await request(ctx.app).put(`/api/v1/animals/${animalId}/genes`).set(keeper()).send({ genes: [{ traitId: id, state: 'het' }] });
    const renamed = await patch(id, { name: 'embers' });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({ id, name: 'embers', mode: 'recessive' });
    const genes = await request(ctx.app).get(`/api/v1/animals/${animalId}/genes`).set(keeper());
    expect(genes.body.genes).toEqual([expect.objectContaining({ traitId: id, trait: 'embers', state: 'het' })]);
  });

  it('refuses a name another trait has (ignoring case), naming the field, and a bad name with 400', async () => {
    const a = await addTrait('quill', 'dominant');
    await addTrait('sorrel', 'dominant');
    const clash = await patch(a, { name: 'Sorrel' });
    expect(clash.status).toBe(409);
    expect(clash.body.error.field).toBe('name');
    expect((await patch(a, { name: 'Quill' })).status).toBe(200); // its own name in other case is fine
    const bad = await patch(a, { name: '-x-' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('name');
  });

  it('changes the mode of a trait no animal carries, in any direction', async () => {
    const id = await addTrait('gloam', 'recessive');
    expect((await patch(id, { mode: 'incomplete-dominant' })).body.mode).toBe('incomplete-dominant');
    expect((await patch(id, { mode: 'recessive', notes: 'back again' })).body).toMatchObject({ mode: 'recessive', notes: 'back again' });
  });

  it('lets a carried trait move between incomplete-dominant and dominant (both use single and super), not to recessive', async () => {
    const id = await addTrait('vesper', 'incomplete-dominant');
    await request(ctx.app).put(`/api/v1/animals/${animalId}/genes`).set(keeper()).send({ genes: [{ traitId: id, state: 'super' }] });
    expect((await patch(id, { mode: 'dominant' })).body.mode).toBe('dominant');
    const refused = await patch(id, { mode: 'recessive' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.field).toBe('mode');
    expect((await request(ctx.app).get(`/api/v1/traits/${id}`).set(keeper())).body.mode).toBe('dominant');
  });

  it('refuses a carried recessive trait a dominant mode', async () => {
    const id = await addTrait('hollow', 'recessive');
    await request(ctx.app).put(`/api/v1/animals/${animalId}/genes`).set(keeper()).send({ genes: [{ traitId: id, state: 'visual' }] });
    expect((await patch(id, { mode: 'dominant' })).status).toBe(409);
  });

  it('is for keepers and the owner: sales and builders may not change traits; 404 for none', async () => {
    const id = await addTrait('tallow', 'recessive');
    expect((await patch(id, { name: 'tallows' }, 'sales')).status).toBe(403);
    expect((await patch(id, { name: 'tallows' }, 'builder')).status).toBe(403);
    expect((await patch(id, { name: 'tallows' }, 'owner')).status).toBe(200);
    expect((await patch(999999, { name: 'nobody' })).status).toBe(404);
  });
});
