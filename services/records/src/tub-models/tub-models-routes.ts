import type { Knex } from 'knex';
import { CreateTubModelRequest, TubModel, TubModelListQuery, UpdateTubModelRequest } from '../../../../shared/api/tub-models.js';
import { resourceRoutes } from '../lib/resource-routes.js';

/** The shop's measured tubs: builders plan racks around them; sales may read. */
export function tubModelsRoutes(db: Knex) {
  return resourceRoutes(db, {
    path: 'tub-models',
    table: 'tub_models',
    entity: 'tub model',
    fields: Object.keys(TubModel.shape),
    searchFields: ['name', 'maker', 'notes'],
    defaultSort: 'name',
    read: ['owner', 'builder', 'sales'],
    write: ['owner', 'builder'],
    listQuery: TubModelListQuery,
    create: CreateTubModelRequest,
    update: UpdateTubModelRequest,
  });
}
