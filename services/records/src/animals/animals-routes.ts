import type { Knex } from 'knex';
import { Animal, AnimalListQuery, CreateAnimalRequest, UpdateAnimalRequest } from '../../../../shared/api/animals.js';
import { resourceRoutes } from '../lib/resource-routes.js';

/** The collection: keepers look after the animals; sales may read (to offer what is for sale). */
export function animalsRoutes(db: Knex) {
  return resourceRoutes(db, {
    path: 'animals',
    table: 'animals',
    entity: 'animal',
    fields: Object.keys(Animal.shape),
    searchFields: ['code', 'name', 'species', 'morph', 'location'],
    defaultSort: 'code',
    read: ['owner', 'keeper', 'sales'],
    write: ['owner', 'keeper'],
    listQuery: AnimalListQuery,
    filterFields: ['status', 'sex'],
    create: CreateAnimalRequest,
    update: UpdateAnimalRequest,
  });
}
