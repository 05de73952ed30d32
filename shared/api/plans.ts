import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';
import { LENGTH_UNITS, PRICE_KEY_LIST, RACK_PLAN_EXAMPLE, RackPlanRequest, RackPlanResponse } from './rack-plan.js';

/*
 * Saved plans, the shop's price list and its materials (records service). A plan keeps the spec
 * as the client sent it (defaults applied) and the calculator's last result for it; every new
 * spec or recompute bumps `version` and keeps the previous versions.
 */

export const PLAN_STATUS_VALUES = ['active', 'archived'] as const;
export const PlanStatus = z.enum(PLAN_STATUS_VALUES).describe('active, or archived (kept, hidden from everyday lists by the console).');

const planName = z.string().trim().min(1, 'is required').max(120, 'must be at most 120 characters').describe('Name of the plan, e.g. "Longhold 28, 9 high x 3 wide".');
const planNotes = z.string().max(4000, 'must be at most 4000 characters').describe('Free notes: customer wishes, workshop remarks.');
const tubModelId = z.number().int().positive().nullable().describe('Tub model the plan was sized for (GET /api/v1/tub-models), or null.');

export const PlanSummary = z
  .object({
    levels: z.number().int().describe('Levels (rows of tubs).'),
    columns: z.number().int().describe('Columns (tubs side by side).'),
    tubs: z.number().int().describe('levels x columns.'),
    sections: z.number().int().describe('Stacking sections.'),
    overallHeight: z.number().describe('Overall height, in the plan unit.'),
    overallWidth: z.number().describe('Overall width, in the plan unit.'),
    overallDepth: z.number().describe('Overall depth, in the plan unit.'),
    sheets: z.number().int().describe('Sheets to buy, all materials.'),
    total: z.number().describe('Price with margin, in the currency of the price list.'),
    warnings: z.number().int().describe('Checks of severity warning.'),
    dangers: z.number().int().describe('Checks of severity danger.'),
  })
  .describe('Key figures of a result, for lists and version histories.');
export type PlanSummary = z.output<typeof PlanSummary>;

export const PlanListItem = z
  .object({
    id: z.number().int(),
    name: z.string(),
    notes: z.string(),
    tubModelId: z.number().int().nullable(),
    tubModelName: z.string().nullable().describe('Name of the tub model, when one is linked and not removed.'),
    unit: z.enum(LENGTH_UNITS).describe('Unit of the spec and result lengths.'),
    status: PlanStatus,
    version: z.number().int().describe('1 at creation; +1 with every new spec or recompute.'),
    summary: PlanSummary,
    createdBy: z.number().int().nullable().describe('User id of the author.'),
    createdByName: z.string().nullable(),
    createdAt: IsoDateTime,
    updatedAt: IsoDateTime,
  })
  .describe('A saved plan without its spec and result.');

export const Plan = PlanListItem.extend({
  spec: RackPlanRequest.describe('The rack-plan request as saved (defaults applied; shop prices are not copied in).'),
  result: RackPlanResponse.describe('The calculator result of the current version, computed with the shop price list of that moment.'),
}).describe('A saved plan with its spec and last result.');
export type Plan = z.output<typeof Plan>;

export const PlanListQuery = listQuery(['name', 'status', 'version', 'createdAt', 'updatedAt']).extend({
  status: PlanStatus.optional().describe('Only plans with this status; default both.'),
  tubModelId: z.coerce.number().int().positive().optional().describe('Only plans for this tub model.'),
});
export const PlanPage = page(PlanListItem);

export const CreatePlanRequest = z
  .object({
    name: planName,
    notes: planNotes.default(''),
    tubModelId: tubModelId.default(null),
    spec: RackPlanRequest,
  })
  .strict()
  .describe(
    'A new plan. The spec is computed by the calculator with the shop price list merged into `spec.prices` (a price the spec sets wins). Errors in the spec name the field with a `spec.` prefix, e.g. `spec.layout.levels`.',
  );

export const CREATE_PLAN_EXAMPLE = {
  name: 'Longhold 28, 9 high x 3 wide',
  notes: 'Standard rack for the front room.',
  tubModelId: 3,
  spec: RACK_PLAN_EXAMPLE,
};

export const UpdatePlanRequest = z
  .object({
    name: planName.optional(),
    notes: planNotes.optional(),
    tubModelId: tubModelId.optional(),
    status: PlanStatus.optional().describe('archived to archive, active to bring back.'),
    spec: RackPlanRequest.optional().describe('A new spec: recomputed, version + 1, the old version kept.'),
    recompute: z.boolean().optional().describe('true: recompute the saved spec with the current price list (version + 1).'),
  })
  .strict()
  .describe('Any of: rename, notes, tub model, archive/unarchive, a new spec, or a recompute.');

export const DuplicatePlanRequest = z
  .object({ name: planName.optional().describe('Name of the copy; default "<name> (copy)".') })
  .strict()
  .describe('Copies spec, result, notes and tub model into a new plan at version 1.');

export const PlanVersionListItem = z.object({
  version: z.number().int(),
  name: z.string().describe('Plan name when this version was saved.'),
  unit: z.enum(LENGTH_UNITS),
  summary: PlanSummary,
  createdBy: z.number().int().nullable(),
  createdByName: z.string().nullable(),
  createdAt: IsoDateTime,
});
export const PlanVersionListQuery = listQuery(['version', 'createdAt']);
export const PlanVersionPage = page(PlanVersionListItem);
export const PlanVersion = PlanVersionListItem.extend({ spec: RackPlanRequest, result: RackPlanResponse }).describe('One saved version in full.');
export const PlanVersionParams = z.object({
  id: z.coerce.number().int().positive().describe('Plan id'),
  version: z.coerce.number().int().positive().describe('Version number, 1 for the first'),
});

export const ComparePlansParams = z.object({
  id: z.coerce.number().int().positive().describe('Plan A'),
  otherId: z.coerce.number().int().positive().describe('Plan B'),
});

const ComparedPlan = z.object({
  id: z.number().int(),
  name: z.string(),
  version: z.number().int(),
  unit: z.enum(LENGTH_UNITS).describe('The plan’s own unit; compared lengths are all in the comparison unit.'),
  levels: z.number().int(),
  columns: z.number().int(),
  sections: z.number().int(),
});

export const PlanComparison = z
  .object({
    unit: z.enum(LENGTH_UNITS).describe('Unit of every compared length: plan A’s unit.'),
    a: ComparedPlan,
    b: ComparedPlan,
    dimensions: z.array(
      z.object({
        key: z.string().describe('Dimension key of the rack-plan result, e.g. overallHeight.'),
        a: z.number(),
        b: z.number(),
        difference: z.number().describe('b - a'),
        aDisplay: z.string().describe('Fractional inches to 1/16 or millimetres, with the unit sign.'),
        bDisplay: z.string(),
      }),
    ),
    sheets: z
      .array(
        z.object({
          material: z.string(),
          thickness: z.number().describe('In the comparison unit.'),
          a: z.number().int().describe('Sheets for plan A (0 when A does not use it).'),
          b: z.number().int(),
          difference: z.number().int(),
        }),
      )
      .describe('Sheets to buy per material and thickness.'),
    cost: z.array(
      z.object({
        key: z.enum(['materials', 'hardware', 'heat', 'labor', 'subtotal', 'margin', 'total']),
        a: z.number(),
        b: z.number(),
        difference: z.number(),
      }),
    ),
    checks: z.object({ a: z.object({ warnings: z.number().int(), dangers: z.number().int() }), b: z.object({ warnings: z.number().int(), dangers: z.number().int() }) }),
  })
  .describe('Two plans side by side: dimensions, sheets and cost.');
export type PlanComparison = z.output<typeof PlanComparison>;

// ---------------------------------------------------------------------------------------------
// Price list

export const PRICE_CATEGORY_VALUES = ['sheet', 'lumber', 'hardware', 'heat', 'labor', 'margin', 'other'] as const;
const priceKey = z
  .string()
  .regex(/^[a-z0-9][a-z0-9.-]{0,59}$/, 'must be lower-case letters, digits, dots and dashes, up to 60')
  .describe(`Price-list key. The calculator uses ${PRICE_KEY_LIST.length} of them: ${PRICE_KEY_LIST.join(', ')}; others are kept for quotes.`);

export const PriceListItem = z.object({
  key: z.string(),
  label: z.string(),
  unit: z.string().describe('What the price is per: sheet, ft, each, can, hour, minutes, percent.'),
  price: z.number().describe('Amount in the shop currency (minutes for labor.minutes-*, percent for margin-percent).'),
  category: z.enum(PRICE_CATEGORY_VALUES),
  notes: z.string(),
  usedByCalculator: z.boolean().describe('True for keys the rack calculator reads.'),
  updatedAt: IsoDateTime,
});
export const PriceList = z.object({ items: z.array(PriceListItem).describe('Every entry, ordered by category and key.') });

export const PriceListEntryInput = z
  .object({
    key: priceKey,
    price: z.number().min(0, 'must not be negative').max(1_000_000, 'is too large').nullable().describe('New price; null removes the entry (the calculator then uses its own default).'),
    label: z.string().trim().min(1).max(160).optional().describe('Required for a new key the calculator does not know.'),
    unit: z.string().trim().min(1).max(20).optional(),
    category: z.enum(PRICE_CATEGORY_VALUES).optional(),
    notes: z.string().max(2000).optional(),
  })
  .strict();

export const UpdatePriceListRequest = z
  .object({
    items: z.array(PriceListEntryInput).min(1, 'must list at least one entry').max(200),
  })
  .strict()
  .superRefine((body, ctx) => {
    const seen = new Set<string>();
    body.items.forEach((item, i) => {
      if (seen.has(item.key)) ctx.addIssue({ code: 'custom', path: ['items', i, 'key'], message: `${item.key} is listed twice` });
      seen.add(item.key);
    });
  })
  .describe(
    'Upsert by key: listed keys are created or changed (fields left out keep their value), keys not listed stay as they are, `price: null` removes a key. Sheet prices are mirrored to the material of the same key (sheet.<material>; lumber.2x4-per-foot to lumber-2x4).',
  );
export const PRICE_LIST_EXAMPLE = { items: [{ key: 'thermostat', price: 95 }, { key: 'sheet.pvc-rigid', price: 235 }] };

// ---------------------------------------------------------------------------------------------
// Materials

export const MATERIAL_KIND_VALUES = ['sheet', 'board'] as const;

export const ShopMaterial = z.object({
  id: z.number().int(),
  key: z.string().describe('Material key; the calculator knows pvc-rigid, pvc-expanded, melamine-particleboard, plywood and lumber-2x4.'),
  label: z.string(),
  kind: z.enum(MATERIAL_KIND_VALUES).describe('sheet: cut in two dimensions; board: lumber cut to length.'),
  thicknessIn: z.number().describe('Thickness the shop stocks, inches.'),
  densityKgM3: z.number().describe('Density, kg/m³.'),
  modulusMPa: z.number().describe('Bending modulus at room temperature, MPa.'),
  heatedModulusMPa: z.number().nullable().describe('Bending modulus over heat tape, MPa, where known.'),
  source: z.string().describe('Where the physical values come from.'),
  pricePerSheet: z.number().describe('Price of one sheet or one stock board.'),
  sheetLengthIn: z.number().describe('Sheet or board length, inches.'),
  sheetWidthIn: z.number().describe('Sheet width or board face width, inches.'),
  usedByCalculator: z.boolean().describe('True when the rack calculator knows this key.'),
  updatedAt: IsoDateTime,
});
export const MaterialList = z.object({ items: z.array(ShopMaterial) });

export const MaterialKeyParams = z.object({
  key: z.string().regex(/^[a-z0-9][a-z0-9-]{0,59}$/, 'must be lower-case letters, digits and dashes, up to 60').describe('Material key'),
});

const positive = (what: string, max: number) => z.number().positive(`${what} must be greater than zero`).max(max, `${what} is too large`);

export const PutMaterialRequest = z
  .object({
    label: z.string().trim().min(1, 'is required').max(120),
    kind: z.enum(MATERIAL_KIND_VALUES),
    thicknessIn: positive('thicknessIn', 12),
    densityKgM3: positive('densityKgM3', 20_000),
    modulusMPa: positive('modulusMPa', 500_000),
    heatedModulusMPa: positive('heatedModulusMPa', 500_000).nullable().default(null),
    source: z.string().max(1000).default(''),
    pricePerSheet: z.number().min(0, 'must not be negative').max(1_000_000),
    sheetLengthIn: positive('sheetLengthIn', 1200),
    sheetWidthIn: positive('sheetWidthIn', 240),
  })
  .strict()
  .describe('The whole material (PUT replaces it, or creates it when the key is new). The price of a calculator material is mirrored to its price-list key.');
export const PUT_MATERIAL_EXAMPLE = {
  label: 'Rigid PVC sheet, 1/2 in',
  kind: 'sheet',
  thicknessIn: 0.5,
  densityKgM3: 1410,
  modulusMPa: 2900,
  heatedModulusMPa: 2300,
  source: 'Supplier data sheet',
  pricePerSheet: 235,
  sheetLengthIn: 96,
  sheetWidthIn: 48,
};
