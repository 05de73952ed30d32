import type { Knex } from 'knex';
import { Animal, AnimalListQuery, CreateAnimalRequest, UpdateAnimalRequest } from '../../../../shared/api/animals.js';
import { ConflictError } from '../../../common/src/errors.js';
import { assertNotFuture } from '../collection/shared/dates.js';
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
    check: async (body, id) => {
      if (typeof body.hatchDate === 'string') assertNotFuture(body.hatchDate, 'hatchDate');
      if (typeof body.code !== 'string') return;
      // Codes stay unique with removed animals too (their history still names them), ignoring case.
      let taken = db('animals').whereRaw('lower(code) = lower(?)', [body.code]);
      if (id !== null) taken = taken.whereNot({ id });
      if (await taken.first()) throw new ConflictError(`Code ${body.code} is in use; pick another.`, 'code');
    },
  });
}
