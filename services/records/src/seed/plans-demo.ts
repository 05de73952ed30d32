import type { Knex } from 'knex';
import { RackPlanRequest, type PriceKey, type RackPlanRequestInput } from '../../../../shared/api/rack-plan.js';
import { MATERIALS } from '../../../calculator/src/domain/materials.js';
// A seed may use the pure domain directly; the routes ask the calculator over HTTP.
import { planRack } from '../../../calculator/src/domain/rack-plan.js';
import { insertId, nowIso } from '../db/knex.js';
import { mergePrices } from '../plans/plan-calculation.js';
import { planSummary } from '../plans/plan-summary.js';
import { calculatorPriceMeta } from '../plans/price-list-store.js';
import { DEMO_TUB_MODELS } from './demo-data.js';

/** Invented prices of the demo shop (its own currency units), one per calculator key. */
export const DEMO_PRICES: Record<PriceKey, number> = {
  'sheet.pvc-rigid': 238,
  'sheet.pvc-expanded': 129,
  'sheet.melamine-particleboard': 58,
  'sheet.plywood': 71,
  'lumber.2x4-per-foot': 0.81,
  'screw.carcass': 0.09,
  'screw.base': 0.14,
  'screw.caster': 0.11,
  dowel: 0.25,
  caster: 8.5,
  'caster.locking': 13,
  'pvc-cement': 11,
  'heat-tape.per-foot': 3.8,
  thermostat: 84,
  'labor.rate-per-hour': 42,
  'labor.minutes-setup': 45,
  'labor.minutes-per-cut': 3,
  'labor.minutes-per-screw': 1,
  'labor.minutes-per-heat-strip': 12,
  'labor.minutes-per-caster': 5,
  'margin-percent': 28,
};

/** The demo shop's stock: physical values from the calculator's own material list, sizes and labels invented. */
const DEMO_STOCK: { key: keyof typeof MATERIALS; label: string; kind: 'sheet' | 'board'; thicknessIn: number; lengthIn: number; widthIn: number }[] = [
  { key: 'pvc-rigid', label: 'Rigid PVC sheet, 1/2 in, white', kind: 'sheet', thicknessIn: 0.5, lengthIn: 96, widthIn: 48 },
  { key: 'pvc-expanded', label: 'Foamed PVC board, 1/2 in', kind: 'sheet', thicknessIn: 0.5, lengthIn: 96, widthIn: 48 },
  { key: 'melamine-particleboard', label: 'Melamine particleboard, 3/4 in', kind: 'sheet', thicknessIn: 0.75, lengthIn: 97, widthIn: 49 },
  { key: 'plywood', label: 'Plywood for bottoms, 1/2 in', kind: 'sheet', thicknessIn: 0.5, lengthIn: 96, widthIn: 48 },
  { key: 'lumber-2x4', label: '2x4 stud, 8 ft', kind: 'board', thicknessIn: 1.5, lengthIn: 96, widthIn: 3.5 },
];

const tub = (name: (typeof DEMO_TUB_MODELS)[number]['name']) => DEMO_TUB_MODELS.find((t) => t.name === name)!;

/** Demo plans; the first gets a second version to show the history. */
const DEMO_PLANS: { name: string; notes: string; tubModel: string; status: 'active' | 'archived'; versions: RackPlanRequestInput[] }[] = [
  {
    name: 'Longhold 28, 9 high x 3 wide',
    notes: 'The shop standard; first drawn 8 high, raised to 9 for the back room.',
    tubModel: 'Longhold 28',
    status: 'active',
    versions: [8, 9].map((levels) => ({
      unit: 'in' as const,
      tub: { length: tub('Longhold 28').lengthIn, width: tub('Longhold 28').widthIn, height: tub('Longhold 28').heightIn },
      layout: { levels, columns: 3, dividers: 0 },
    })),
  },
  {
    name: 'Nestbox 15 hatchling rack, 10 x 4',
    notes: 'Juvenile rack on foamed PVC.',
    tubModel: 'Nestbox 15',
    status: 'active',
    versions: [
      {
        unit: 'in',
        tub: { length: tub('Nestbox 15').lengthIn, width: tub('Nestbox 15').widthIn, height: tub('Nestbox 15').heightIn, loadedMass: 2.5 },
        layout: { levels: 10, columns: 4, dividers: 1 },
        construction: { carcassMaterial: 'pvc-expanded' },
        heat: { wattsPerFoot: 8 },
      },
    ],
  },
  {
    name: 'Vault 70 pair, metric',
    notes: 'Drawn in millimetres for a customer abroad; not built yet.',
    tubModel: 'Vault 70',
    status: 'archived',
    versions: [
      {
        unit: 'mm',
        tub: { length: tub('Vault 70').lengthIn * 25.4, width: tub('Vault 70').widthIn * 25.4, height: tub('Vault 70').heightIn * 25.4 },
        layout: { levels: 4, columns: 2 },
      },
    ],
  },
];

/**
 * Demo price list, materials and a few saved plans. Each part is skipped when its table already
 * has rows, so calling it again does nothing.
 */
export async function seedPlansDemo(db: Knex): Promise<void> {
  const now = nowIso();
  const stamp = { created_at: now, updated_at: now };
  await db.transaction(async (trx) => {
    const empty = async (table: string) => Number(((await trx(table).count({ n: '*' }).first()) as { n: number }).n) === 0;
    if (await empty('price_list')) {
      await trx('price_list').insert(
        (Object.entries(DEMO_PRICES) as [PriceKey, number][]).map(([key, price]) => {
          const meta = calculatorPriceMeta(key);
          return { key, price, label: meta.label, unit: meta.unit, category: meta.category, notes: '', ...stamp };
        }),
      );
      await trx('price_list').insert({ key: 'delivery.local', label: 'Delivery within 25 miles', unit: 'each', category: 'other', price: 45, notes: 'For quotes; the calculator does not use it.', ...stamp });
    }
    if (await empty('materials')) {
      await trx('materials').insert(
        DEMO_STOCK.map((s) => {
          const m = MATERIALS[s.key];
          const price = s.kind === 'board' ? Math.round(DEMO_PRICES['lumber.2x4-per-foot'] * (s.lengthIn / 12) * 100) / 100 : DEMO_PRICES[`sheet.${s.key}` as PriceKey];
          return {
            key: s.key,
            label: s.label,
            kind: s.kind,
            thickness_in: s.thicknessIn,
            density_kg_m3: m.densityKgM3.value,
            modulus_mpa: m.modulusMPa.value,
            heated_modulus_mpa: m.heatedModulusMPa?.value ?? null,
            source: [`density: ${m.densityKgM3.source}`, `modulus: ${m.modulusMPa.source}`, ...(m.heatedModulusMPa ? [`heated modulus: ${m.heatedModulusMPa.source}`] : [])].join('; '),
            price_per_sheet: price,
            sheet_length_in: s.lengthIn,
            sheet_width_in: s.widthIn,
            ...stamp,
          };
        }),
      );
    }
    if (await empty('plans')) {
      const owner = (await trx('users').where({ role: 'owner' }).orderBy('id').first()) as { id: number } | undefined;
      for (const p of DEMO_PLANS) {
        const model = (await trx('tub_models').where({ name: p.tubModel }).whereNull('deleted_at').first()) as { id: number } | undefined;
        const computed = p.versions.map((input) => {
          const spec = RackPlanRequest.parse(input);
          return { spec, result: planRack({ ...spec, prices: mergePrices(DEMO_PRICES, spec.prices) }) };
        });
        const last = computed[computed.length - 1]!;
        const row = (c: (typeof computed)[number]) => ({
          spec_json: JSON.stringify(c.spec),
          result_json: JSON.stringify(c.result),
          summary_json: JSON.stringify(planSummary(c.spec, c.result)),
          unit: c.result.unit,
        });
        const id = await insertId(trx('plans'), {
          name: p.name,
          notes: p.notes,
          tub_model_id: model?.id ?? null,
          ...row(last),
          status: p.status,
          version: computed.length,
          created_by: owner?.id ?? null,
          ...stamp,
        });
        await trx('plan_versions').insert(computed.map((c, i) => ({ plan_id: id, version: i + 1, name: p.name, ...row(c), created_by: owner?.id ?? null, created_at: now })));
      }
    }
  });
}
