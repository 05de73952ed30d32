import { Router } from 'express';
import type { Knex } from 'knex';
import { CreateTubModelRequest, TubModel, TubModelListQuery, UpdateTubModelRequest } from '../../../../shared/api/tub-models.js';
import type { Access } from '../../../common/src/roles.js';
import { resourceRoutes } from '../lib/resource-routes.js';
import { tubModelPhotoRoutes } from './tub-model-photo-routes.js';

const READ: Access[] = ['owner', 'builder', 'sales'];
const WRITE: Access[] = ['owner', 'builder'];

/** The shop's measured tubs, each with an optional photo: builders plan racks around them; sales may read. */
export function tubModelsRoutes(db: Knex, uploadsDir?: string): Router {
  const router = Router();
  router.use(
    resourceRoutes(db, {
      path: 'tub-models',
      table: 'tub_models',
      entity: 'tub model',
      fields: Object.keys(TubModel.shape),
      searchFields: ['name', 'maker', 'notes'],
      defaultSort: 'name',
      read: READ,
      write: WRITE,
      listQuery: TubModelListQuery,
      create: CreateTubModelRequest,
      update: UpdateTubModelRequest,
    }),
  );
  router.use(tubModelPhotoRoutes(db, uploadsDir, { read: READ, write: WRITE }));
  return router;
}
