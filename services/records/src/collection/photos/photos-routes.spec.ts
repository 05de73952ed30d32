import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp, type RecordsDeps } from '../../app.js';
import type { Knex } from 'knex';
import { migrateLatest } from '../../db/knex.js';
import { openTestDatabase, type TestDatabase } from '../../db/test-database.js';
import { seedDemoData } from '../../seed/demo-seed.js';
import { asRole, TEST_INTERNAL_SECRET } from '../../test-support.js';
import { MAX_PHOTO_BYTES } from './image-check.js';

// Photos touch only the database and the uploads folder, so this app gets just those (plus an uploads dir the shared test app lacks).
let database: TestDatabase;
let db: Knex;
const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tw-photos-'));
let app: ReturnType<typeof createApp>;
const keeper = () => asRole('keeper');
const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)]);
const filesOnDisk = () => (fs.existsSync(path.join(uploadsDir, 'animals')) ? fs.readdirSync(path.join(uploadsDir, 'animals'), { recursive: true }).filter((f) => String(f).includes('.')) : []);
let animalId = 0;

beforeAll(async () => {
  database = await openTestDatabase();
  db = database.db;
  app = createApp({ db, internalSecret: TEST_INTERNAL_SECRET, uploadsDir } as unknown as RecordsDeps);
  await migrateLatest(db);
  await seedDemoData(db);
  animalId = (await db('animals').first()).id;
});
afterAll(async () => {
  await database.dispose();
  fs.rmSync(uploadsDir, { recursive: true, force: true });
});

describe('animal photos', () => {
  it('stores an image under the uploads folder and serves it back', async () => {
    const res = await request(app).post(`/api/v1/animals/${animalId}/photos`).set(keeper()).attach('photo', PNG, { filename: 'side.png', contentType: 'image/png' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ animalId, contentType: 'image/png', sizeBytes: PNG.length });
    expect(filesOnDisk()).toHaveLength(1);
    const file = await request(app).get(res.body.url).set(keeper());
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(file.body as Buffer, PNG)).toBe(0);
    const list = await request(app).get(`/api/v1/animals/${animalId}/photos`).set(keeper());
    expect(list.body.total).toBe(1);
    expect((await request(app).delete(`/api/v1/animal-photos/${res.body.id}`).set(keeper())).status).toBe(204);
    expect((await request(app).get(res.body.url).set(keeper())).status).toBe(404);
  });

  it('answers 415 for a non-image (by type or by content) and 413 when too large, storing nothing', async () => {
    const before = filesOnDisk().length;
    const rows = await db('animal_photos').count({ n: '*' }).first();
    const pdf = await request(app).post(`/api/v1/animals/${animalId}/photos`).set(keeper()).attach('photo', Buffer.from('%PDF-1.7'), { filename: 'a.pdf', contentType: 'application/pdf' });
    expect(pdf.status).toBe(415);
    expect(pdf.body.error.message).toMatch(/image\/jpeg/);
    const disguised = await request(app).post(`/api/v1/animals/${animalId}/photos`).set(keeper()).attach('photo', Buffer.from('<html>'), { filename: 'a.png', contentType: 'image/png' });
    expect(disguised.status).toBe(415);
    const big = await request(app).post(`/api/v1/animals/${animalId}/photos`).set(keeper()).attach('photo', Buffer.concat([PNG, Buffer.alloc(MAX_PHOTO_BYTES)]), { filename: 'big.png', contentType: 'image/png' });
    expect(big.status).toBe(413);
    const json = await request(app).post(`/api/v1/animals/${animalId}/photos`).set(keeper()).send({ photo: 'x' });
    expect(json.status).toBe(415);
    const none = await request(app).post(`/api/v1/animals/${animalId}/photos`).set(keeper()).field('note', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.field).toBe('photo');
    expect(filesOnDisk()).toHaveLength(before);
    expect(await db('animal_photos').count({ n: '*' }).first()).toEqual(rows);
  });

  it('answers 401, 403 and 404', async () => {
    expect((await request(app).post(`/api/v1/animals/${animalId}/photos`).attach('photo', PNG, 'a.png')).status).toBe(401);
    expect((await request(app).post(`/api/v1/animals/${animalId}/photos`).set(asRole('sales')).attach('photo', PNG, 'a.png')).status).toBe(403);
    expect((await request(app).get(`/api/v1/animals/${animalId}/photos`).set(asRole('builder'))).status).toBe(403);
    expect((await request(app).post('/api/v1/animals/999999/photos').set(keeper()).attach('photo', PNG, 'a.png')).status).toBe(404);
    expect((await request(app).get('/api/v1/animal-photos/999999/file').set(keeper())).status).toBe(404);
  });

  it('answers 503 when the server has no uploads folder configured', async () => {
    const bare = createApp({ db, internalSecret: TEST_INTERNAL_SECRET } as unknown as RecordsDeps);
    const res = await request(bare).post(`/api/v1/animals/${animalId}/photos`).set(keeper()).attach('photo', PNG, 'a.png');
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('uploads_unavailable');
  });
});
