import { randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { Router, type NextFunction, type Request, type Response } from 'express';
import type { Knex } from 'knex';
import multer from 'multer';
import { IdParams } from '../../../../../shared/api/common.js';
import { json } from '../../../../common/src/async-handler.js';
import { ApiError, NotFoundError, PayloadTooLargeError, ValidationError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { insertId, nowIso } from '../../db/knex.js';
import { KEEPERS } from '../shared/access.js';
import { liveAnimal } from '../shared/animals-lookup.js';
import { IMAGE_TYPES, MAX_PHOTO_BYTES, sniffImage } from './image-check.js';

type PhotoRow = { id: number; animal_id: number; file_name: string; content_type: string; size_bytes: number; created_at: string };
const toPhoto = (r: PhotoRow) => ({ id: r.id, animalId: r.animal_id, contentType: r.content_type, sizeBytes: r.size_bytes, url: `/api/v1/animal-photos/${r.id}/file`, createdAt: r.created_at });

// Held in memory until checked, so a refused upload leaves nothing on disk.
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 5 },
  fileFilter: (_req, file, done) => {
    if (IMAGE_TYPES.includes(file.mimetype)) done(null, true);
    else done(new ApiError(415, 'unsupported_media_type', `Photos are ${IMAGE_TYPES.join(', ')}; this file is ${file.mimetype}.`));
  },
}).single('photo');

function receivePhoto(req: Request, res: Response, next: NextFunction) {
  if (!req.is('multipart/form-data')) return next(new ApiError(415, 'unsupported_media_type', 'Send the photo as multipart/form-data in the field "photo".'));
  upload(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') return next(new PayloadTooLargeError(`A photo may be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`));
      return next(new ValidationError(`photo: ${err.message}`, err.field ?? 'photo'));
    }
    next(err);
  });
}

/**
 * Animal photos on disk under `uploadsDir/animals/<id>/`, checked by their bytes, not their name.
 * No thumbnails: no image library is installed, so clients scale the original.
 */
export function photosRoutes(db: Knex, uploadsDir: string | undefined, stage: 'raw' | 'json'): Router {
  const router = Router();
  const requireDir = () => {
    if (!uploadsDir) throw new ApiError(503, 'uploads_unavailable', 'Photo uploads are not configured on this server.');
    return uploadsDir;
  };
  const findPhoto = async (id: number) => {
    const row = (await db('animal_photos').whereNull('deleted_at').where({ id }).first()) as PhotoRow | undefined;
    if (!row) throw new NotFoundError(`No photo with id ${id}.`);
    return row;
  };

  if (stage === 'raw') {
    router.post(
      '/api/v1/animals/:id/photos',
      allow(...KEEPERS),
      // Answer 404/503 before reading the upload.
      async (req: Request, _res: Response, next: NextFunction) => {
        try {
          await liveAnimal(db, parseOrThrow(IdParams, req.params).id);
          requireDir();
          next();
        } catch (err) {
          next(err);
        }
      },
      receivePhoto,
      json(async (req, res) => {
        const { id } = parseOrThrow(IdParams, req.params);
        const file = req.file;
        if (!file) throw new ValidationError('photo: attach an image in the field "photo"', 'photo');
        const image = sniffImage(file.buffer);
        if (!image) throw new ApiError(415, 'unsupported_media_type', `The file is not a ${IMAGE_TYPES.join(', ')} image.`);
        const relative = path.join('animals', String(id), `${randomUUID()}.${image.ext}`);
        const target = path.join(requireDir(), relative);
        await fs.mkdir(path.dirname(target), { recursive: true });
        await fs.writeFile(target, file.buffer, { flag: 'wx' });
        let photoId: number;
        try {
          const now = nowIso();
          photoId = await insertId(db('animal_photos'), { animal_id: id, file_name: relative, content_type: image.type, size_bytes: file.size, created_at: now, updated_at: now });
        } catch (err) {
          await fs.rm(target, { force: true });
          throw err;
        }
        await audit(db, req.identity, 'upload', 'animal_photo', photoId, { animalId: id, bytes: file.size });
        res.status(201);
        return toPhoto(await findPhoto(photoId));
      }),
    );
    return router;
  }

  router.get(
    '/api/v1/animals/:id/photos',
    allow(...KEEPERS),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await liveAnimal(db, id);
      const rows = (await db('animal_photos').whereNull('deleted_at').where({ animal_id: id }).orderBy('id')) as PhotoRow[];
      return { items: rows.map(toPhoto), total: rows.length };
    }),
  );

  router.get('/api/v1/animal-photos/:id/file', allow(...KEEPERS), async (req, res, next) => {
    try {
      const photo = await findPhoto(parseOrThrow(IdParams, req.params).id);
      const bytes = await fs.readFile(path.join(requireDir(), photo.file_name)).catch(() => {
        throw new NotFoundError('The photo file is missing.');
      });
      res.type(photo.content_type).set('cache-control', 'private, max-age=86400').set('x-content-type-options', 'nosniff').send(bytes);
    } catch (err) {
      next(err);
    }
  });

  router.delete(
    '/api/v1/animal-photos/:id',
    allow(...KEEPERS),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await findPhoto(id);
      // The file stays with the soft-deleted row, so the removal can be undone by hand.
      await db('animal_photos').where({ id }).update({ deleted_at: nowIso(), updated_at: nowIso() });
      await audit(db, req.identity, 'delete', 'animal_photo', id);
      res.status(204).end();
    }),
  );

  return router;
}
