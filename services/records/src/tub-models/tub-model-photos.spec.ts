import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Knex } from 'knex';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TubModel, TubModelPhoto } from '../../../../shared/api/tub-models.js';
import { createApp, type RecordsDeps } from '../app.js';
import { MAX_PHOTO_BYTES } from '../collection/photos/image-check.js';
import { migrateLatest } from '../db/knex.js';
import { openTestDatabase, type TestDatabase } from '../db/test-database.js';
import { seedDemoData } from '../seed/demo-seed.js';
import { asRole, TEST_INTERNAL_SECRET } from '../test-support.js';
import { MAX_THUMBNAIL_BYTES } from './tub-model-photo-routes.js';

// Photos touch only the database and the uploads folder, so this app gets just those.
let database: TestDatabase;
let db: Knex;
const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tw-tub-photos-'));
let app: ReturnType<typeof createApp>;
const builder = () => asRole('builder');
// PNG spec, 5.2 signature; JFIF SOI marker FF D8 FF. The bytes after them do not matter to the check.
const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)]);
const JPEG = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(32, 2)]);
const filesOnDisk = () => {
  const dir = path.join(uploadsDir, 'tub-models');
  return fs.existsSync(dir) ? fs.readdirSync(dir, { recursive: true }).map(String).filter((f) => f.includes('.')) : [];
};
const photoRows = async () => Number(((await db('tub_model_photos').count({ n: '*' }).first()) as { n: number | string }).n);
let tubId = 0;
let otherTubId = 0;

beforeAll(async () => {
  database = await openTestDatabase();
  db = database.db;
  app = createApp({ db, internalSecret: TEST_INTERNAL_SECRET, uploadsDir } as unknown as RecordsDeps);
  await migrateLatest(db);
  await seedDemoData(db);
  const tubs = (await db('tub_models').whereNull('deleted_at').orderBy('id').limit(2)) as { id: number }[];
  tubId = tubs[0]!.id;
  otherTubId = tubs[1]!.id;
});
afterAll(async () => {
  await database.dispose();
  fs.rmSync(uploadsDir, { recursive: true, force: true });
});

describe('tub model photos', () => {
  it('starts without a photo', async () => {
    const tub = await request(app).get(`/api/v1/tub-models/${tubId}`).set(builder());
    expect(TubModel.parse(tub.body).photoId).toBeNull();
    const none = await request(app).get(`/api/v1/tub-models/${tubId}/photo`).set(builder());
    expect(none.status).toBe(404);
    expect(none.body.error.message).toMatch(/has no photo/);
  });

  it('stores a photo with its thumbnail, links it to the tub model and serves both back', async () => {
    const res = await request(app)
      .post(`/api/v1/tub-models/${tubId}/photo`)
      .set(builder())
      .attach('photo', JPEG, { filename: 'front.jpg', contentType: 'image/jpeg' })
      .attach('thumbnail', PNG, { filename: 'front-small.png', contentType: 'image/png' });
    expect(res.status).toBe(201);
    const photo = TubModelPhoto.parse(res.body);
    expect(photo).toMatchObject({ tubModelId: tubId, contentType: 'image/jpeg', sizeBytes: JPEG.length, hasThumbnail: true });
    expect(filesOnDisk()).toHaveLength(2);

    // Every role that reads tub models sees the photo; the list carries its id for thumbnails.
    for (const role of ['owner', 'builder', 'sales'] as const) {
      const current = await request(app).get(`/api/v1/tub-models/${tubId}/photo`).set(asRole(role));
      expect(current.status, role).toBe(200);
      expect(current.body.id).toBe(photo.id);
    }
    const list = await request(app).get('/api/v1/tub-models').query({ limit: 200 }).set(asRole('sales'));
    expect(list.body.items.find((t: { id: number }) => t.id === tubId).photoId).toBe(photo.id);

    const full = await request(app).get(photo.url).set(asRole('sales'));
    expect(full.status).toBe(200);
    expect(full.headers['content-type']).toBe('image/jpeg');
    expect(full.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(full.body as Buffer, JPEG)).toBe(0);
    const thumb = await request(app).get(photo.thumbnailUrl).set(builder());
    expect(thumb.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(thumb.body as Buffer, PNG)).toBe(0);
  });

  it('replaces the photo on a new upload, keeping the old one in history, and serves the original as thumbnail when none was sent', async () => {
    const before = (await request(app).get(`/api/v1/tub-models/${tubId}/photo`).set(builder())).body.id as number;
    const res = await request(app).post(`/api/v1/tub-models/${tubId}/photo`).set(asRole('owner')).attach('photo', PNG, { filename: 'side.png', contentType: 'image/png' });
    expect(res.status).toBe(201);
    expect(res.body.hasThumbnail).toBe(false);
    expect(res.body.id).not.toBe(before);
    expect((await request(app).get(`/api/v1/tub-models/${tubId}`).set(builder())).body.photoId).toBe(res.body.id);
    expect((await request(app).get(`/api/v1/tub-model-photos/${before}/file`).set(builder())).status).toBe(404);
    const kept = await db('tub_model_photos').where({ id: before }).first();
    expect(kept.deleted_at).not.toBeNull();
    const thumb = await request(app).get(res.body.thumbnailUrl).set(builder());
    expect(thumb.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(thumb.body as Buffer, PNG)).toBe(0);
  });

  it('removes the photo: the tub model has none afterwards and the file route answers 404', async () => {
    const current = (await request(app).get(`/api/v1/tub-models/${tubId}/photo`).set(builder())).body;
    const audits = await db('audit_log').where({ entity: 'tub model photo' }).count({ n: '*' }).first();
    expect((await request(app).delete(`/api/v1/tub-models/${tubId}/photo`).set(builder())).status).toBe(204);
    expect((await request(app).get(`/api/v1/tub-models/${tubId}`).set(builder())).body.photoId).toBeNull();
    expect((await request(app).get(`/api/v1/tub-models/${tubId}/photo`).set(builder())).status).toBe(404);
    expect((await request(app).get(current.url).set(builder())).status).toBe(404);
    expect((await request(app).delete(`/api/v1/tub-models/${tubId}/photo`).set(builder())).status).toBe(404);
    expect(await db('audit_log').where({ entity: 'tub model photo' }).count({ n: '*' }).first()).not.toEqual(audits);
  });

  it('answers 415 for a non-image (by type or by content) and 413 when too large, storing nothing', async () => {
    const files = filesOnDisk().length;
    const rows = await photoRows();
    const post = () => request(app).post(`/api/v1/tub-models/${otherTubId}/photo`).set(builder());

    const pdf = await post().attach('photo', Buffer.from('%PDF-1.7'), { filename: 'a.pdf', contentType: 'application/pdf' });
    expect(pdf.status).toBe(415);
    expect(pdf.body.error.message).toMatch(/image\/jpeg/);
    const disguised = await post().attach('photo', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'), { filename: 'a.png', contentType: 'image/png' });
    expect(disguised.status).toBe(415);
    expect(disguised.body.error.message).toMatch(/not a/);
    const badThumb = await post().attach('photo', PNG, { filename: 'a.png', contentType: 'image/png' }).attach('thumbnail', Buffer.from('<html>'), { filename: 't.png', contentType: 'image/png' });
    expect(badThumb.status).toBe(415);
    expect(badThumb.body.error.message).toMatch(/thumbnail/);
    const json = await post().send({ photo: 'x' });
    expect(json.status).toBe(415);

    const big = await post().attach('photo', Buffer.concat([PNG, Buffer.alloc(MAX_PHOTO_BYTES)]), { filename: 'big.png', contentType: 'image/png' });
    expect(big.status).toBe(413);
    expect(big.body.error.message).toMatch(/5 MB/);
    const bigThumb = await post()
      .attach('photo', PNG, { filename: 'a.png', contentType: 'image/png' })
      .attach('thumbnail', Buffer.concat([PNG, Buffer.alloc(MAX_THUMBNAIL_BYTES)]), { filename: 't.png', contentType: 'image/png' });
    expect(bigThumb.status).toBe(413);

    const none = await post().field('note', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.field).toBe('photo');
    const stray = await post().attach('picture', PNG, { filename: 'a.png', contentType: 'image/png' });
    expect(stray.status).toBe(400);

    expect(filesOnDisk()).toHaveLength(files);
    expect(await photoRows()).toBe(rows);
    expect((await request(app).get(`/api/v1/tub-models/${otherTubId}`).set(builder())).body.photoId).toBeNull();
  });

  it('answers 401 without a signed identity and 403 to roles that may not write or read', async () => {
    const url = `/api/v1/tub-models/${otherTubId}/photo`;
    expect((await request(app).post(url).attach('photo', PNG, 'a.png')).status).toBe(401);
    expect((await request(app).get(url)).status).toBe(401);
    expect((await request(app).post(url).set(asRole('sales')).attach('photo', PNG, 'a.png')).status).toBe(403);
    expect((await request(app).post(url).set(asRole('keeper')).attach('photo', PNG, 'a.png')).status).toBe(403);
    expect((await request(app).delete(url).set(asRole('sales'))).status).toBe(403);
    expect((await request(app).get(url).set(asRole('keeper'))).status).toBe(403);

    const stored = await request(app).post(url).set(builder()).attach('photo', PNG, { filename: 'a.png', contentType: 'image/png' });
    expect(stored.status).toBe(201);
    expect((await request(app).get(stored.body.url).set(asRole('keeper'))).status).toBe(403);
    expect((await request(app).get(stored.body.thumbnailUrl).set(asRole('keeper'))).status).toBe(403);
    expect((await request(app).get(stored.body.url)).status).toBe(401);
  });

  it('answers 404 for a tub model that does not exist or was retired, and 503 without an uploads folder', async () => {
    expect((await request(app).post('/api/v1/tub-models/999999/photo').set(builder()).attach('photo', PNG, 'a.png')).status).toBe(404);
    expect((await request(app).get('/api/v1/tub-model-photos/999999/file').set(builder())).status).toBe(404);
    expect((await request(app).get('/api/v1/tub-model-photos/999999/thumbnail').set(builder())).status).toBe(404);
    const retired = await request(app).post('/api/v1/tub-models').set(builder()).send({ name: 'Short-lived 9', lengthIn: 18, widthIn: 12, heightIn: 5 });
    expect((await request(app).delete(`/api/v1/tub-models/${retired.body.id}`).set(builder())).status).toBe(204);
    expect((await request(app).post(`/api/v1/tub-models/${retired.body.id}/photo`).set(builder()).attach('photo', PNG, 'a.png')).status).toBe(404);

    const bare = createApp({ db, internalSecret: TEST_INTERNAL_SECRET } as unknown as RecordsDeps);
    const res = await request(bare).post(`/api/v1/tub-models/${tubId}/photo`).set(builder()).attach('photo', PNG, 'a.png');
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('uploads_unavailable');
  });

  it('does not let PATCH set the photo', async () => {
    const res = await request(app).patch(`/api/v1/tub-models/${tubId}`).set(builder()).send({ photoId: 1 });
    expect(res.status).toBe(400);
  });
});
