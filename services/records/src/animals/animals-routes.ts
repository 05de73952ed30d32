import type { Knex } from 'knex';
import { Animal, AnimalListQuery, CreateAnimalRequest, UpdateAnimalRequest } from '../../../../shared/api/animals.js';
import { resourceRoutes } from '../lib/resource-routes.js';

/** The collection: keepers look after the animals; sales see only the animals offered for sale. */
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
    visibleTo: (rows, who) => (who.role === 'sales' ? rows.where('for_sale', true) : rows),
    create: CreateAnimalRequest,
    update: UpdateAnimalRequest,
  });
}
