import { randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { Router, type NextFunction, type Request, type Response } from 'express';
import type { Knex } from 'knex';
import multer from 'multer';
import { IdParams } from '../../../../shared/api/common.js';
import { json } from '../../../common/src/async-handler.js';
import { ApiError, NotFoundError, PayloadTooLargeError, ValidationError } from '../../../common/src/errors.js';
import { allow, type Access } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { audit } from '../audit/audit-log.js';
// The same byte check and size limit as the animal photos, so both areas accept the same files.
import { IMAGE_TYPES, MAX_PHOTO_BYTES, sniffImage } from '../collection/photos/image-check.js';
import { insertId, nowIso } from '../db/knex.js';

/** A thumbnail is a list-sized copy (the console sends one about 320 px wide); anything bigger is not one. */
export const MAX_THUMBNAIL_BYTES = 256 * 1024;

type PhotoRow = {
  id: number;
  tub_model_id: number;
  file_name: string;
  content_type: string;
  size_bytes: number;
  thumbnail_file_name: string | null;
  thumbnail_content_type: string | null;
  created_at: string;
};

const toPhoto = (r: PhotoRow) => ({
  id: r.id,
  tubModelId: r.tub_model_id,
  contentType: r.content_type,
  sizeBytes: r.size_bytes,
  hasThumbnail: r.thumbnail_file_name !== null,
  url: `/api/v1/tub-model-photos/${r.id}/file`,
  thumbnailUrl: `/api/v1/tub-model-photos/${r.id}/thumbnail`,
  createdAt: r.created_at,
});

const unsupported = (message: string) => new ApiError(415, 'unsupported_media_type', message);

// Held in memory until checked, so a refused upload leaves nothing on disk.
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PHOTO_BYTES, files: 2, fields: 5 },
  fileFilter: (_req, file, done) => {
    if (IMAGE_TYPES.includes(file.mimetype)) done(null, true);
    else done(unsupported(`Photos are ${IMAGE_TYPES.join(', ')}; this file is ${file.mimetype}.`));
  },
}).fields([
  { name: 'photo', maxCount: 1 },
  { name: 'thumbnail', maxCount: 1 },
]);

function receiveFiles(req: Request, res: Response, next: NextFunction) {
  if (!req.is('multipart/form-data')) return next(unsupported('Send the photo as multipart/form-data in the field "photo".'));
  upload(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') return next(new PayloadTooLargeError(`A photo may be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`));
      return next(new ValidationError(`${err.field ?? 'photo'}: ${err.message}`, err.field ?? 'photo'));
    }
    next(err);
  });
}

/**
 * One optional photo per tub model, on disk under `uploadsDir/tub-models/<id>/`. No image library
 * is installed, so the server makes no thumbnail itself: the console sends a small copy beside the
 * original (field `thumbnail`), checked the same way; without one the original is served for lists.
 */
export function tubModelPhotoRoutes(db: Knex, uploadsDir: string | undefined, roles: { read: Access[]; write: Access[] }): Router {
  const router = Router();
  const requireDir = () => {
    if (!uploadsDir) throw new ApiError(503, 'uploads_unavailable', 'Photo uploads are not configured on this server.');
    return uploadsDir;
  };
  const liveModel = async (id: number) => {
    const row = (await db('tub_models').whereNull('deleted_at').where({ id }).first()) as { id: number; name: string; photo_id: number | null } | undefined;
    if (!row) throw new NotFoundError(`No tub model with id ${id}.`);
    return row;
  };
  const currentPhoto = async (tubModelId: number) => {
    const model = await liveModel(tubModelId);
    const row = model.photo_id === null ? undefined : ((await db('tub_model_photos').whereNull('deleted_at').where({ id: model.photo_id }).first()) as PhotoRow | undefined);
    if (!row) throw new NotFoundError(`Tub model ${model.name} has no photo.`);
    return row;
  };
  const photoById = async (id: number) => {
    const row = (await db('tub_model_photos').whereNull('deleted_at').where({ id }).first()) as PhotoRow | undefined;
    if (!row) throw new NotFoundError(`No photo with id ${id}.`);
    return row;
  };
  const sendFile = async (res: Response, fileName: string, contentType: string) => {
    const bytes = await fs.readFile(path.join(requireDir(), fileName)).catch(() => {
      throw new NotFoundError('The photo file is missing.');
    });
    // A photo id never changes its bytes (a new upload is a new id), so the browser may keep it.
    res.type(contentType).set('cache-control', 'private, max-age=86400').set('x-content-type-options', 'nosniff').send(bytes);
  };

  router.post(
    '/api/v1/tub-models/:id/photo',
    allow(...roles.write),
    // Answer 404/503 before reading the upload.
    async (req: Request, _res: Response, next: NextFunction) => {
      try {
        await liveModel(parseOrThrow(IdParams, req.params).id);
        requireDir();
        next();
      } catch (err) {
        next(err);
      }
    },
    receiveFiles,
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const files = (req.files ?? {}) as Record<string, Express.Multer.File[] | undefined>;
      const photo = files['photo']?.[0];
      const thumbnail = files['thumbnail']?.[0];
      if (!photo) throw new ValidationError('photo: attach an image in the field "photo"', 'photo');
      const image = sniffImage(photo.buffer);
      if (!image) throw unsupported(`The photo is not a ${IMAGE_TYPES.join(', ')} image.`);
      const thumbImage = thumbnail ? sniffImage(thumbnail.buffer) : null;
      if (thumbnail && !thumbImage) throw unsupported(`The thumbnail is not a ${IMAGE_TYPES.join(', ')} image.`);
      if (thumbnail && thumbnail.size > MAX_THUMBNAIL_BYTES) throw new PayloadTooLargeError(`A thumbnail may be at most ${MAX_THUMBNAIL_BYTES / 1024} KB.`);

      const base = path.join('tub-models', String(id), randomUUID());
      const relative = `${base}.${image.ext}`;
      const thumbRelative = thumbImage ? `${base}.thumb.${thumbImage.ext}` : null;
      const dir = requireDir();
      await fs.mkdir(path.join(dir, path.dirname(relative)), { recursive: true });
      const written: string[] = [];
      let photoId: number;
      try {
        await fs.writeFile(path.join(dir, relative), photo.buffer, { flag: 'wx' });
        written.push(relative);
        if (thumbnail && thumbRelative) {
          await fs.writeFile(path.join(dir, thumbRelative), thumbnail.buffer, { flag: 'wx' });
          written.push(thumbRelative);
        }
        const now = nowIso();
        photoId = await db.transaction(async (trx) => {
          const newId = await insertId(trx('tub_model_photos'), {
            tub_model_id: id,
            file_name: relative,
            content_type: image.type,
            size_bytes: photo.size,
            thumbnail_file_name: thumbRelative,
            thumbnail_content_type: thumbImage?.type ?? null,
            created_at: now,
            updated_at: now,
          });
          // The photo it replaces stays in history, as a removal does.
          await trx('tub_model_photos').where({ tub_model_id: id }).whereNull('deleted_at').whereNot({ id: newId }).update({ deleted_at: now, updated_at: now });
          await trx('tub_models').where({ id }).update({ photo_id: newId, updated_at: now });
          return newId;
        });
      } catch (err) {
        await Promise.all(written.map((f) => fs.rm(path.join(dir, f), { force: true })));
        throw err;
      }
      await audit(db, req.identity, 'upload', 'tub model photo', photoId, { tubModelId: id, bytes: photo.size, thumbnailBytes: thumbnail?.size ?? null });
      res.status(201);
      return toPhoto(await photoById(photoId));
    }),
  );

  router.get(
    '/api/v1/tub-models/:id/photo',
    allow(...roles.read),
    json(async (req) => toPhoto(await currentPhoto(parseOrThrow(IdParams, req.params).id))),
  );

  router.delete(
    '/api/v1/tub-models/:id/photo',
    allow(...roles.write),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const photo = await currentPhoto(id);
      const now = nowIso();
      // The file stays with the soft-deleted row, so the removal can be undone by hand.
      await db.transaction(async (trx) => {
        await trx('tub_model_photos').where({ id: photo.id }).update({ deleted_at: now, updated_at: now });
        await trx('tub_models').where({ id }).update({ photo_id: null, updated_at: now });
      });
      await audit(db, req.identity, 'delete', 'tub model photo', photo.id, { tubModelId: id });
      res.status(204).end();
    }),
  );

  router.get('/api/v1/tub-model-photos/:id/file', allow(...roles.read), async (req, res, next) => {
    try {
      const photo = await photoById(parseOrThrow(IdParams, req.params).id);
      await sendFile(res, photo.file_name, photo.content_type);
    } catch (err) {
      next(err);
    }
  });

  router.get('/api/v1/tub-model-photos/:id/thumbnail', allow(...roles.read), async (req, res, next) => {
    try {
      const photo = await photoById(parseOrThrow(IdParams, req.params).id);
      if (photo.thumbnail_file_name && photo.thumbnail_content_type) await sendFile(res, photo.thumbnail_file_name, photo.thumbnail_content_type);
      else await sendFile(res, photo.file_name, photo.content_type);
    } catch (err) {
      next(err);
    }
  });

  return router;
}
