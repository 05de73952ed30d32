import type { Knex } from 'knex';
import { addDays, daysBetween, todayUtc } from '../collection/shared/dates.js';
import { expectedHatch } from '../collection/breeding/breeding-dates.js';
import { tubSlots } from '../collection/racks/rack-rules.js';
import { defaultIntervalDays, feedingStage, suggestedPreyMassG } from '../collection/schedules/feeding-schedule.js';
import { insertId, nowIso } from '../db/knex.js';

/*
 * Invented collection data for the demo: three racks of 5 x 3 tubs matching the locations the
 * animal seed already gives (R1-1A … R3-4A), a few weeks of feedings, weights and sheds, the
 * shop's invented traits, two pairings and a clutch. Deterministic for a given day.
 */

const SEED_ACTOR = 'seed:demo';
const RACKS = [
  { name: 'R1', location: 'snake room, north wall', notes: 'Hatchling rack.' },
  { name: 'R2', location: 'snake room, north wall', notes: '' },
  { name: 'R3', location: 'snake room, east wall', notes: 'Carpets and small pythons.' },
];
const TRAITS = [
  { name: 'amber', mode: 'recessive', notes: 'Warm orange ground colour.' },
  { name: 'dusk', mode: 'incomplete-dominant', notes: 'Darker saddles; the super form is nearly patternless.' },
  { name: 'lattice', mode: 'recessive', notes: 'Broken, net-like pattern.' },
  { name: 'frost', mode: 'dominant', notes: 'Pale flanks.' },
] as const;

const at = (day: string, hour: number) => `${day}T${String(hour).padStart(2, '0')}:00:00.000Z`;

export async function seedCollectionDemo(db: Knex, today = todayUtc()): Promise<boolean> {
  const existing = (await db('racks').count({ n: '*' }).first()) as { n: number };
  if (Number(existing.n) > 0) return false;
  const now = nowIso();
  const stamp = { created_at: now, updated_at: now };
  const animals = (await db('animals').whereNull('deleted_at').orderBy('id')) as { id: number; code: string; species: string; sex: string; hatch_date: string | null; weight_g: number | null; status: string; location: string }[];

  await db.transaction(async (trx) => {
    // Racks and tubs
    const tubIdByLabel = new Map<string, number>();
    for (const rack of RACKS) {
      const rackId = await insertId(trx('racks'), { ...rack, levels: 5, columns: 3, plan_id: null, ...stamp });
      for (const slot of tubSlots(rack.name, 5, 3)) {
        const tubId = await insertId(trx('tubs'), { rack_id: rackId, ...slot, ...stamp });
        tubIdByLabel.set(slot.label, tubId!);
      }
    }

    // Placements where the animal seed says each animal lives
    const placed = animals.filter((a) => (a.status === 'active' || a.status === 'on-hold') && tubIdByLabel.has(a.location));
    for (const a of placed) {
      await trx('placements').insert({ animal_id: a.id, tub_id: tubIdByLabel.get(a.location), placed_at: at(addDays(today, -60), 9), placed_by: SEED_ACTOR, ...stamp });
    }

    // Five weeks of husbandry
    const events: Record<string, unknown>[] = [];
    const event = (animalId: number, kind: string, occurredAt: string, payload: Record<string, unknown>) =>
      events.push({ animal_id: animalId, kind, occurred_at: occurredAt, payload_json: JSON.stringify({ note: '', ...payload }), created_by: SEED_ACTOR, ...stamp });
    for (const [i, a] of placed.entries()) {
      const stage = feedingStage(a.hatch_date, a.weight_g, today);
      const interval = defaultIntervalDays(stage);
      const baseG = a.weight_g ?? 300;
      const losing = i === 9;
      // weights every two weeks, growing slowly (one animal losing, to show the flag)
      const weights = [-35, -21, -7].map((d, k) => ({ day: addDays(today, d - (i % 3)), g: Math.round(losing ? baseG * (1 - 0.07 * k) : baseG * (0.94 + 0.03 * k)) }));
      for (const w of weights) event(a.id, 'weight', at(w.day, 8), { weightG: w.g });
      const preyG = suggestedPreyMassG(weights.at(-1)!.g)!;
      const preyKind = preyG < 25 ? 'mouse' : 'rat';
      let n = 0;
      // Half the animals were fed last a full interval ago, so the due list has work on it today.
      for (let day = addDays(today, -35 + (i % interval)); daysBetween(day, today) >= (i % 2 === 0 ? interval : 1); day = addDays(day, interval)) {
        const refuser = i === 5 && daysBetween(day, today) < 3 * interval + 1;
        const result = refuser ? 'refused' : i === 12 && n === 1 ? 'regurgitated' : 'accepted';
        event(a.id, 'feeding', at(day, 19), { preyKind, preySize: preyG < 25 ? 'hopper' : preyG < 60 ? 'small' : 'medium', preyMassG: preyG, result });
        n++;
      }
      if (i % 4 === 0) event(a.id, 'shed', at(addDays(today, -12 - (i % 9)), 7), { shed: i % 8 === 0 ? 'in-pieces' : 'complete' });
      if (i % 6 === 0) event(a.id, 'cleaning', at(addDays(today, -4), 10), {});
    }
    const lastHealth = placed[3];
    if (lastHealth) event(lastHealth.id, 'health', at(addDays(today, -6), 11), { note: 'Small stuck shed on tail tip; soaked and removed.' });
    await trx.batchInsert('events', events, 200);
    for (const a of placed) {
      const latest = events.filter((e) => e.animal_id === a.id && e.kind === 'weight').at(-1);
      if (latest) await trx('animals').where({ id: a.id }).update({ weight_g: JSON.parse(latest.payload_json as string).weightG });
    }

    // Traits and genes
    const traitId: Record<string, number> = {};
    for (const t of TRAITS) traitId[t.name] = await insertId(trx('traits'), { ...t, ...stamp });
    const adult = (sex: string) =>
      animals.filter((a) => a.species === 'Python regius' && a.sex === sex && a.status === 'active' && a.hatch_date && daysBetween(a.hatch_date, today) > 1100);
    const [sire] = adult('male');
    const [dam1, dam2] = adult('female');
    const genes: [number | undefined, string, string, number | null][] = [
      [sire?.id, 'amber', 'het', null],
      [sire?.id, 'dusk', 'single', null],
      [dam1?.id, 'amber', 'het', null],
      [dam2?.id, 'lattice', 'visual', null],
      [dam2?.id, 'frost', 'single', null],
      [placed[2]?.id, 'amber', 'possible-het', 0.6667],
      [placed[4]?.id, 'dusk', 'super', null],
    ];
    for (const [animalId, trait, state, het] of genes) {
      if (animalId) await trx('animal_genes').insert({ animal_id: animalId, trait_id: traitId[trait], state, het_probability: het, ...stamp });
    }
    const forSale = placed.filter((_, i) => i % 7 === 3).map((a) => a.id);
    await trx('animals').whereIn('id', forSale).update({ for_sale: true });

    // Two pairings; the first has laid
    if (sire && dam1 && dam2) {
      const laid = await insertId(trx('pairings'), { sire_id: sire.id, dam_id: dam1.id, season: '2026-27', status: 'laid', ovulation_date: addDays(today, -70), pre_lay_shed_date: addDays(today, -50), notes: 'Good feeding response before the season.', ...stamp });
      const locked = await insertId(trx('pairings'), { sire_id: sire.id, dam_id: dam2.id, season: '2026-27', status: 'locked', ovulation_date: null, pre_lay_shed_date: null, notes: '', ...stamp });
      await trx('pairing_observations').insert([
        { pairing_id: laid, kind: 'introduced', observed_on: addDays(today, -120), notes: '', ...stamp },
        { pairing_id: laid, kind: 'lock', observed_on: addDays(today, -118), notes: 'About three hours.', ...stamp },
        { pairing_id: laid, kind: 'separated', observed_on: addDays(today, -100), notes: '', ...stamp },
        { pairing_id: locked, kind: 'introduced', observed_on: addDays(today, -10), notes: '', ...stamp },
        { pairing_id: locked, kind: 'lock', observed_on: addDays(today, -8), notes: '', ...stamp },
      ]);
      const laidOn = addDays(today, -20);
      const hatch = expectedHatch(laidOn, 89);
      await trx('clutches').insert({ pairing_id: laid, laid_on: laidOn, fertile_eggs: 6, slugs: 1, incubation_temp_f: 89, humidity_pct: 95, expected_hatch_from: hatch.from, expected_hatch_to: hatch.to, notes: 'Incubator B, top shelf.', ...stamp });
    }

    // Three days of readings per rack, one warm side running hot
    const rackIds = (await trx('racks').orderBy('id').pluck('id')) as number[];
    const readings: Record<string, unknown>[] = [];
    for (const [r, rackId] of rackIds.entries()) {
      for (let d = 3; d >= 1; d--) {
        for (const hour of [7, 19]) {
          const hot = r === 1 && d === 1 && hour === 19;
          readings.push({ rack_id: rackId, taken_at: at(addDays(today, -d), hour), temp_f: hot ? 93.5 : 89 + ((r + d + hour) % 3) * 0.5, humidity_pct: 52 + ((r + d) % 4) * 2, probe: 'warm', source: 'manual', created_by: SEED_ACTOR, ...stamp });
          readings.push({ rack_id: rackId, taken_at: at(addDays(today, -d), hour), temp_f: 77 + ((r + hour) % 3), humidity_pct: null, probe: 'cool', source: 'manual', created_by: SEED_ACTOR, ...stamp });
        }
      }
    }
    await trx.batchInsert('environment_readings', readings, 200);
  });
  return true;
}
