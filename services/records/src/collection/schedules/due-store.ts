import type { Knex } from 'knex';
import type { DueAnimal } from '../../../../../shared/api/collection-schedules.js';
import type { FeedingResult } from '../../../../../shared/api/collection-husbandry.js';
import { addDays } from '../shared/dates.js';
import { feedingDue, REFUSAL_STREAK_FLAG, refusalStreak, suggestedPreyMassG, WEIGHT_LOSS_FLAG_PCT, WEIGHT_LOSS_LOOKBACK_DAYS, weightLossPct } from './feeding-schedule.js';

// Feedings further back than this do not change who is due or a refusal streak worth flagging.
const FEEDING_LOOKBACK_DAYS = 365;

interface AnimalRow {
  id: number;
  code: string;
  name: string;
  species: string;
  hatch_date: string | null;
  weight_g: number | null;
  feeding_interval_days: number | null;
  tub_id: number | null;
  tub_label: string | null;
  rack_id: number | null;
  rack_name: string | null;
  level: number | null;
  column: number | null;
}

/** Everyone due to eat on `date` (events after that day are ignored), grouped by rack. */
export async function dueList(db: Knex, date: string) {
  const endOfDay = `${addDays(date, 1)}T00:00:00.000Z`;
  const animals = (await db('animals as a')
    .leftJoin('placements as p', function () {
      this.on('p.animal_id', '=', 'a.id').andOnNull('p.removed_at');
    })
    .leftJoin('tubs as t', 't.id', 'p.tub_id')
    .leftJoin('racks as r', 'r.id', 't.rack_id')
    .whereNull('a.deleted_at')
    .whereIn('a.status', ['active', 'on-hold'])
    .select('a.id', 'a.code', 'a.name', 'a.species', 'a.hatch_date', 'a.weight_g', 'a.feeding_interval_days', 't.id as tub_id', 't.label as tub_label', 'r.id as rack_id', 'r.name as rack_name', 't.level', 't.column')) as AnimalRow[];

  const events = (await db('events')
    .whereNull('deleted_at')
    .whereIn('kind', ['feeding', 'weight'])
    .where('occurred_at', '<', endOfDay)
    .where('occurred_at', '>=', `${addDays(date, -FEEDING_LOOKBACK_DAYS)}T00:00:00.000Z`)
    .orderBy([{ column: 'occurred_at', order: 'desc' }, { column: 'id', order: 'desc' }])
    .select('animal_id', 'kind', 'occurred_at', 'payload_json')) as { animal_id: number; kind: string; occurred_at: string; payload_json: string }[];
  const feedings = new Map<number, { at: string; result: FeedingResult }[]>();
  const weights = new Map<number, { occurredAt: string; weightG: number }[]>();
  for (const e of events) {
    const payload = JSON.parse(e.payload_json);
    if (e.kind === 'feeding') feedings.set(e.animal_id, [...(feedings.get(e.animal_id) ?? []), { at: e.occurred_at, result: payload.result }]);
    else if (e.occurred_at >= `${addDays(date, -2 * WEIGHT_LOSS_LOOKBACK_DAYS)}`) weights.set(e.animal_id, [{ occurredAt: e.occurred_at, weightG: payload.weightG }, ...(weights.get(e.animal_id) ?? [])]);
  }

  const due: (DueAnimal & { rackId: number | null; rackName: string | null; order: [number, number] })[] = [];
  for (const a of animals) {
    const fed = feedings.get(a.id) ?? [];
    const own = weights.get(a.id) ?? [];
    const latestWeightG = own.at(-1)?.weightG ?? a.weight_g;
    const schedule = feedingDue({ hatchDate: a.hatch_date, weightG: latestWeightG, ownIntervalDays: a.feeding_interval_days, lastFedAt: fed[0]?.at ?? null }, date);
    if (!schedule.isDue) continue;
    const streak = refusalStreak(fed.map((f) => f.result));
    const loss = weightLossPct(own);
    due.push({
      animalId: a.id,
      code: a.code,
      name: a.name,
      species: a.species,
      tubId: a.tub_id,
      tubLabel: a.tub_label,
      stage: schedule.stage,
      intervalDays: schedule.intervalDays,
      lastFedAt: fed[0]?.at ?? null,
      lastResult: fed[0]?.result ?? null,
      dueOn: schedule.dueOn,
      daysOverdue: schedule.daysOverdue,
      refusalStreak: streak,
      refusalFlag: streak >= REFUSAL_STREAK_FLAG,
      weightLossPct: loss,
      weightLossFlag: loss !== null && loss >= WEIGHT_LOSS_FLAG_PCT,
      latestWeightG,
      suggestedPreyMassG: suggestedPreyMassG(latestWeightG),
      rackId: a.rack_id,
      rackName: a.rack_name,
      order: [a.level ?? 0, a.column ?? 0],
    });
  }

  const byRack = new Map<number, { rackId: number; rackName: string; animals: typeof due }>();
  const unplaced: typeof due = [];
  for (const d of due) {
    if (d.rackId === null) unplaced.push(d);
    else {
      const group = byRack.get(d.rackId) ?? { rackId: d.rackId, rackName: d.rackName!, animals: [] };
      group.animals.push(d);
      byRack.set(d.rackId, group);
    }
  }
  const strip = ({ rackId: _r, rackName: _n, order: _o, ...animal }: (typeof due)[number]): DueAnimal => animal;
  const racks = [...byRack.values()]
    .sort((x, y) => x.rackName.localeCompare(y.rackName))
    .map((g) => ({ rackId: g.rackId, rackName: g.rackName, animals: g.animals.sort((x, y) => x.order[0] - y.order[0] || x.order[1] - y.order[1]).map(strip) }));
  return { date, total: due.length, racks, unplaced: unplaced.sort((x, y) => x.code.localeCompare(y.code)).map(strip) };
}
