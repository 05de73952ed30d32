import type { Knex } from 'knex';
import type { z } from 'zod';
import type { Placement, Rack, Tub } from '../../../../../shared/api/collection-racks.js';
import { ConflictError, NotFoundError, UnprocessableError } from '../../../../common/src/errors.js';
import { insertId, isUniqueViolation, nowIso } from '../../db/knex.js';
import { listPage, type ListParams } from '../../lib/list.js';
import { tubSlots } from './rack-rules.js';

type RackRow = { id: number; name: string; levels: number; columns: number; plan_id: number | null; location: string; notes: string; created_at: string; tub_count: number; occupied_count: number };

const toRack = (r: RackRow): Rack => ({
  id: r.id,
  name: r.name,
  levels: r.levels,
  columns: r.columns,
  planId: r.plan_id,
  location: r.location,
  notes: r.notes,
  tubCount: Number(r.tub_count),
  occupiedCount: Number(r.occupied_count),
  createdAt: r.created_at,
});

function racksWithCounts(db: Knex) {
  return db('racks')
    .whereNull('racks.deleted_at')
    .select(
      'racks.*',
      db.raw('(select count(*) from tubs where tubs.rack_id = racks.id) as tub_count'),
      db.raw(
        "(select count(*) from tubs join placements p on p.tub_id = tubs.id and p.removed_at is null join animals a on a.id = p.animal_id and a.deleted_at is null and a.status in ('active', 'on-hold') where tubs.rack_id = racks.id) as occupied_count",
      ),
    );
}

export function listRacks(db: Knex, params: ListParams) {
  return listPage<RackRow, Rack>(racksWithCounts(db), params, {
    columns: { name: 'racks.name', levels: 'racks.levels', columns: 'racks.columns', location: 'racks.location', createdAt: 'racks.created_at' },
    searchColumns: ['racks.name', 'racks.location', 'racks.notes'],
    defaultSort: 'name',
    toItem: toRack,
  });
}

export async function findRack(db: Knex, id: number): Promise<Rack> {
  const row = (await racksWithCounts(db).where('racks.id', id).first()) as RackRow | undefined;
  if (!row) throw new NotFoundError(`No rack with id ${id}.`);
  return toRack(row);
}

/** A rack and all its tubs in one transaction: a half-built rack never shows. */
export async function createRack(db: Knex, input: { name: string; levels: number; columns: number; planId: number | null; location: string; notes: string }): Promise<number> {
  const taken = await db('racks').whereNull('deleted_at').whereRaw('lower(name) = lower(?)', [input.name]).first();
  if (taken) throw new ConflictError(`A rack named ${input.name} exists already; tub labels would clash.`, 'name');
  const now = nowIso();
  return db.transaction(async (trx) => {
    const id = await insertId(trx('racks'), { name: input.name, levels: input.levels, columns: input.columns, plan_id: input.planId, location: input.location, notes: input.notes, created_at: now, updated_at: now });
    const slots = tubSlots(input.name, input.levels, input.columns);
    await trx.batchInsert('tubs', slots.map((s) => ({ rack_id: id, ...s, created_at: now, updated_at: now })), 100);
    return id!;
  });
}

export async function updateRack(db: Knex, id: number, changes: { location?: string; notes?: string }): Promise<void> {
  await findRack(db, id);
  await db('racks').where({ id }).update({ ...changes, updated_at: nowIso() });
}

/** Only an empty rack can be removed (its tubs keep their history). */
export async function removeRack(db: Knex, id: number): Promise<void> {
  const rack = await findRack(db, id);
  if (rack.occupiedCount > 0) throw new ConflictError(`Rack ${rack.name} still houses ${rack.occupiedCount} animal(s); move them first.`);
  await db('racks').where({ id }).update({ deleted_at: nowIso(), updated_at: nowIso() });
}

type TubRow = { id: number; rack_id: number; rack_name: string; level: number; column: number; label: string; animal_id: number | null; code: string | null; animal_name: string | null; species: string | null; placed_at: string | null };

export function tubsQuery(db: Knex) {
  return db('tubs')
    .join('racks', 'racks.id', 'tubs.rack_id')
    .leftJoin('placements as p', function () {
      // An animal sold, deceased or removed through the animals API no longer holds its tub.
      this.on('p.tub_id', '=', 'tubs.id')
        .andOnNull('p.removed_at')
        .andOn(db.raw("p.animal_id in (select id from animals where deleted_at is null and status in ('active', 'on-hold'))"));
    })
    .leftJoin('animals as a', 'a.id', 'p.animal_id')
    .whereNull('racks.deleted_at')
    .select('tubs.id', 'tubs.rack_id', 'racks.name as rack_name', 'tubs.level', 'tubs.column', 'tubs.label', 'a.id as animal_id', 'a.code', 'a.name as animal_name', 'a.species', 'p.placed_at')
    .orderBy([{ column: 'racks.name' }, { column: 'tubs.level' }, { column: 'tubs.column' }]);
}

export const toTub = (r: TubRow): z.infer<typeof Tub> => ({
  id: r.id,
  rackId: r.rack_id,
  rackName: r.rack_name,
  level: r.level,
  column: r.column,
  label: r.label,
  occupant: r.animal_id === null ? null : { animalId: r.animal_id, code: r.code!, name: r.animal_name!, species: r.species!, since: r.placed_at! },
});

export async function rackTubs(db: Knex, rackId: number) {
  return ((await tubsQuery(db).where('tubs.rack_id', rackId)) as TubRow[]).map(toTub);
}

export async function emptyTubs(db: Knex, rackId?: number) {
  let q = tubsQuery(db).whereNull('p.id');
  if (rackId) q = q.where('tubs.rack_id', rackId);
  return ((await q) as TubRow[]).map(toTub);
}

type PlacementRow = { id: number; animal_id: number; tub_id: number; label: string; placed_at: string; removed_at: string | null };
const toPlacement = (r: PlacementRow): z.infer<typeof Placement> => ({ id: r.id, animalId: r.animal_id, tubId: r.tub_id, label: r.label, placedAt: r.placed_at, removedAt: r.removed_at });

export async function placementHistory(db: Knex, animalId: number) {
  const rows = (await db('placements as p')
    .join('tubs', 'tubs.id', 'p.tub_id')
    .where('p.animal_id', animalId)
    .select('p.id', 'p.animal_id', 'p.tub_id', 'tubs.label', 'p.placed_at', 'p.removed_at')
    .orderBy([{ column: 'p.placed_at', order: 'desc' }, { column: 'p.id', order: 'desc' }])) as PlacementRow[];
  const items = rows.map(toPlacement);
  return { current: items.find((p) => p.removedAt === null) ?? null, items };
}

/**
 * Moves an animal into an empty tub: closes its open placement, opens the new one and writes the
 * tub label to the animal's location, all in one transaction. The partial unique indexes catch a
 * race that the checks here miss.
 */
export async function placeAnimal(db: Knex, animalId: number, tubId: number, at: string, actor: string) {
  const animal = await db('animals').whereNull('deleted_at').where({ id: animalId }).first();
  if (!animal) throw new NotFoundError(`No animal with id ${animalId}.`);
  if (animal.status === 'sold' || animal.status === 'deceased') throw new UnprocessableError(`Animal ${animal.code} is ${animal.status}; it cannot be placed in a tub.`);
  const tub = await tubsQuery(db).where('tubs.id', tubId).first();
  if (!tub) throw new UnprocessableError(`No tub with id ${tubId} in a rack in use.`, 'tubId');
  if (tub.animal_id === animalId) throw new ConflictError(`${animal.code} is already in ${tub.label}.`, 'tubId');
  if (tub.animal_id !== null) throw new ConflictError(`Tub ${tub.label} is occupied by ${tub.code}; move that animal first.`, 'tubId');
  const open = await db('placements').where({ animal_id: animalId }).whereNull('removed_at').first();
  if (open && open.placed_at > at) throw new UnprocessableError(`The move cannot be before the animal entered its current tub (${open.placed_at}).`, 'at');
  const now = nowIso();
  try {
    await db.transaction(async (trx) => {
      // Close a placement left open by an animal that has left the collection.
      await trx('placements').where({ tub_id: tubId }).whereNull('removed_at').update({ removed_at: at, updated_at: now });
      await trx('placements').where({ animal_id: animalId }).whereNull('removed_at').update({ removed_at: at, updated_at: now });
      await trx('placements').insert({ animal_id: animalId, tub_id: tubId, placed_at: at, placed_by: actor, created_at: now, updated_at: now });
      await trx('animals').where({ id: animalId }).update({ location: tub.label, updated_at: now });
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw new ConflictError(`Tub ${tub.label} was just taken; reload the map.`, 'tubId');
    throw err;
  }
  return { from: open ? open.tub_id : null, label: tub.label as string };
}

/** Takes an animal out of its tub (sold, deceased, quarantine elsewhere); history kept. */
export async function removeFromTub(db: Knex, animalId: number, at: string): Promise<boolean> {
  const now = nowIso();
  return db.transaction(async (trx) => {
    const changed = await trx('placements').where({ animal_id: animalId }).whereNull('removed_at').update({ removed_at: at, updated_at: now });
    if (changed) await trx('animals').where({ id: animalId }).update({ location: '', updated_at: now });
    return changed > 0;
  });
}
