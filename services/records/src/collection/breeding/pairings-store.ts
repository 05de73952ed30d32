import type { Knex } from 'knex';
import { NotFoundError } from '../../../../common/src/errors.js';
import { listPage, type ListParams } from '../../lib/list.js';
import { expectedHatch, layingWindow } from './breeding-dates.js';

type PairingRow = {
  id: number; sire_id: number; dam_id: number; season: string; status: string; ovulation_date: string | null; pre_lay_shed_date: string | null; notes: string; created_at: string;
  sire_code: string; sire_name: string; dam_code: string; dam_name: string;
};
type ObservationRow = { id: number; pairing_id: number; kind: string; observed_on: string; notes: string };

const pairingsQuery = (db: Knex) =>
  db('pairings as p')
    .join('animals as s', 's.id', 'p.sire_id')
    .join('animals as d', 'd.id', 'p.dam_id')
    .whereNull('p.deleted_at')
    .select('p.*', 's.code as sire_code', 's.name as sire_name', 'd.code as dam_code', 'd.name as dam_name');

function toPairing(r: PairingRow, observations: ObservationRow[]) {
  return {
    id: r.id,
    sire: { id: r.sire_id, code: r.sire_code, name: r.sire_name },
    dam: { id: r.dam_id, code: r.dam_code, name: r.dam_name },
    season: r.season,
    status: r.status,
    ovulationDate: r.ovulation_date,
    preLayShedDate: r.pre_lay_shed_date,
    layingWindow: layingWindow(r.pre_lay_shed_date, r.ovulation_date),
    observations: observations.filter((o) => o.pairing_id === r.id).map((o) => ({ id: o.id, kind: o.kind, observedOn: o.observed_on, notes: o.notes })),
    notes: r.notes,
    createdAt: r.created_at,
  };
}
export type Pairing = ReturnType<typeof toPairing>;

const observationsOf = (db: Knex, ids: number[]) => db('pairing_observations').whereIn('pairing_id', ids).orderBy(['observed_on', 'id']) as Promise<ObservationRow[]>;

export async function listPairings(db: Knex, params: ListParams & { season?: string; status?: string }) {
  let q = pairingsQuery(db);
  if (params.season) q = q.where('p.season', params.season);
  if (params.status) q = q.where('p.status', params.status);
  const page = await listPage<PairingRow, PairingRow>(q, params, {
    columns: { season: 'p.season', status: 'p.status', createdAt: 'p.created_at' },
    searchColumns: ['s.code', 'd.code', 'p.season', 'p.notes'],
    defaultSort: '-createdAt',
    toItem: (r) => r,
  });
  const observations = await observationsOf(db, page.items.map((r) => r.id));
  return { ...page, items: page.items.map((r) => toPairing(r, observations)) };
}

export async function findPairing(db: Knex, id: number) {
  const row = (await pairingsQuery(db).where('p.id', id).first()) as PairingRow | undefined;
  if (!row) throw new NotFoundError(`No pairing with id ${id}.`);
  return toPairing(row, await observationsOf(db, [id]));
}

type ClutchRow = {
  id: number; pairing_id: number; laid_on: string; fertile_eggs: number; slugs: number; incubation_temp_f: number | null; humidity_pct: number | null;
  expected_hatch_from: string; expected_hatch_to: string; hatched_on: string | null; hatchling_count: number | null; notes: string; created_at: string;
};

export const toClutch = (r: ClutchRow) => ({
  id: r.id,
  pairingId: r.pairing_id,
  laidOn: r.laid_on,
  fertileEggs: r.fertile_eggs,
  slugs: r.slugs,
  incubationTempF: r.incubation_temp_f,
  humidityPct: r.humidity_pct,
  expectedHatchFrom: r.expected_hatch_from,
  expectedHatchTo: r.expected_hatch_to,
  incubationWarning: expectedHatch(r.laid_on, r.incubation_temp_f).warning,
  hatchedOn: r.hatched_on,
  hatchlingCount: r.hatchling_count,
  notes: r.notes,
  createdAt: r.created_at,
});

const liveClutches = (db: Knex) => db('clutches').whereNull('deleted_at');

export function listClutches(db: Knex, params: ListParams & { pairingId?: number }) {
  let q = liveClutches(db);
  if (params.pairingId) q = q.where({ pairing_id: params.pairingId });
  return listPage<ClutchRow, ReturnType<typeof toClutch>>(q, params, {
    columns: { laidOn: 'laid_on', expectedHatchFrom: 'expected_hatch_from', createdAt: 'created_at' },
    searchColumns: ['notes'],
    defaultSort: '-laidOn',
    toItem: toClutch,
  });
}

export async function findClutchRow(db: Knex, id: number): Promise<ClutchRow> {
  const row = (await liveClutches(db).where({ id }).first()) as ClutchRow | undefined;
  if (!row) throw new NotFoundError(`No clutch with id ${id}.`);
  return row;
}
