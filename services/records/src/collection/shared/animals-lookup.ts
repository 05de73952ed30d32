import type { Knex } from 'knex';
import { NotFoundError } from '../../../../common/src/errors.js';

/** A live (not removed) animal row, or 404. */
export async function liveAnimal(db: Knex, id: number): Promise<Record<string, any>> {
  const row = await db('animals').whereNull('deleted_at').where({ id }).first();
  if (!row) throw new NotFoundError(`No animal with id ${id}.`);
  return row;
}
