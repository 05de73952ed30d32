import { z } from 'zod';
import { CuttingPlanResponse } from './cutting-plan.js';

/*
 * Public contract of POST /api/v1/calc/rack-plan. Member names are relied on by integrators and
 * the widget: add members, never rename them. Lengths are in the request's `unit`; masses are in
 * pounds with `in` and kilograms with `mm`, or in the unit a field name says (…Lb, …Kg).
 */

export const LENGTH_UNITS = ['in', 'mm'] as const;

/** Sheet materials the calculator knows (density and stiffness live in the calculator's material list). */
export const SHEET_MATERIAL_IDS = ['pvc-rigid', 'pvc-expanded', 'melamine-particleboard', 'plywood'] as const;
export type SheetMaterialId = (typeof SHEET_MATERIAL_IDS)[number];

/** Price-list keys; each cost line names the key its price came from. */
export const PRICE_KEYS = {
  'sheet.pvc-rigid': 'One full sheet of rigid PVC',
  'sheet.pvc-expanded': 'One full sheet of expanded (foamed) PVC',
  'sheet.melamine-particleboard': 'One full sheet of melamine-faced particleboard',
  'sheet.plywood': 'One full sheet of plywood',
  'lumber.2x4-per-foot': 'Nominal 2x4 lumber, per foot of stock bought',
  'screw.carcass': 'Flat-head screw joining panels, each',
  'screw.base': 'Screw for the 2x4 base frame, each',
  'screw.caster': 'Screw fixing a caster plate, each',
  dowel: 'Dowel locating one section on another, each',
  caster: 'Caster without a brake, each',
  'caster.locking': 'Caster with a brake, each',
  'pvc-cement': 'PVC cement for support blocks, per can',
  'heat-tape.per-foot': 'Heat tape, per foot',
  thermostat: 'Thermostat, each',
  'labor.rate-per-hour': 'Labor rate, per hour',
  'labor.minutes-setup': 'Labor minutes per rack for set-up, squaring and clean-up',
  'labor.minutes-per-cut': 'Labor minutes per piece cut from a sheet or a stick',
  'labor.minutes-per-screw': 'Labor minutes per screw (pilot hole, countersink, drive)',
  'labor.minutes-per-heat-strip': 'Labor minutes per heat strip laid and connected',
  'labor.minutes-per-caster': 'Labor minutes per caster fitted',
  'margin-percent': 'Margin added to the subtotal, percent',
} as const;
export type PriceKey = keyof typeof PRICE_KEYS;
export const PRICE_KEY_LIST = Object.keys(PRICE_KEYS) as PriceKey[];

export const RACK_PLAN_RULES = `### How the rack plan is computed

Lengths are in the request's \`unit\` (\`in\` or \`mm\`); the calculator works in inches inside and converts at the edges (1 in = 25.4 mm exactly).

**Trade rules (common practice; every number below is a default you can change):**
- A level's opening is the tub's height (rim included) plus the lid gap (default 1/8 in): the shelf above is the tub's lid, so the gap must stay small.
- The interior shelf spans the tubs side by side plus the side play (default 1/2 in) plus the thickness of each vertical support between columns (default 1/2 in each): \`interiorShelfLength = columns x tub.width + sidePlay + (dividers + supportColumns) x dividerThickness\`. Vertical supports are the requested dividers and, where the sag check asks for a mid-span support, columns of support blocks (\`supportColumns\` in the response).
- The top and bottom panels cover the ends of both side panels: \`outerShelfLength = interiorShelfLength + 2 x panelThickness\` (a 33 in interior shelf gives a 34 in top with 1/2 in panels).
- Every panel's depth is the tub's length plus the depth play (default 1/2 in).
- A section with k levels has side panels of height \`k x levelOpening + (k - 1) x panelThickness\`.
- Tall racks are built as sections that stack: only the lowest has a bottom panel, and each upper section stands on the top panel of the one below, located with dowels (default two per joint).
- \`carcassHeight = bottomThickness + sum over sections of (sidePanelHeight + panelThickness)\`; a rack of n levels has n + 1 horizontal panels however it is sectioned.
- With \`sections.maxSidePanelLength\` (default: the sheet length) the calculator uses the fewest sections whose side panels fit, balanced so that section sizes differ by at most one level, larger sections lowest. With \`sections.levelsPerSection\` (listed from the bottom) the sections are taken as given.
- The rolling base is a frame of 2x4 lumber (actual 1-1/2 x 3-1/2 in, American Softwood Lumber Standard PS 20) on edge: two rails the full width at front and back, a cross member at each end and a centre brace between the rails; \`overallHeight = carcassHeight + 3.5 in + casterHeight\`.

**Loads:** masses from the material list (density with its source) plus the tubs. Load per caster assumes one caster carries nothing (common practice). Each shelf is a simply supported beam under its tubs and its own weight: sag = 5wL^4/384EI (AISC Steel Construction Manual, Table 3-23), using the modulus for a heated shelf where the material list gives one (PVC softens when warm). When sag exceeds \`limits.maxShelfSag\`, each bay of two or more columns that is too saggy gets a column of support blocks at the column boundary nearest its mid-span, one pair per level (a wide block at the front, a thin one at the back, clear of the heat tape); the blocks are as thick as a divider and widen the shelf like one. A sagging shelf pinches the tub below; a sagging floor opens the gap above its tub: the effective lid gap is \`lidGap + floor sag - ceiling sag\`, checked against binding and the escape threshold.

**Heat:** one strip per level along the back, \`interiorShelfLength - 2 x heat.endMargin\` long; watts from the tape's watts per foot; thermostats so that none carries more than its rating; the share of a 15 A and a 20 A 120 V branch circuit against the 80 % continuous-load limit (NFPA 70, 210.19/210.20). Follow the thermostat maker's rating and local electrical code; have wiring done by a licensed electrician where required.

**Errors:** invalid input gives 400 naming the field; a spec that cannot be built (a level opening taller than the sheet, a part that fits no stock) gives 422 with the reason.
`;

// ---------------------------------------------------------------------------------------------
// Request

const MAX_LENGTH = 100_000; // generous enough for millimetres; real limits come from the stock (422)
const MAX_MASS = 10_000;

const length = (what: string) =>
  z
    .number()
    .positive(`${what} must be greater than zero`)
    .max(MAX_LENGTH, `${what} is too large`)
    .describe(`${what}, in the request unit`);
const gap = (what: string) =>
  z
    .number()
    .min(0, `${what} must not be negative`)
    .max(MAX_LENGTH, `${what} is too large`)
    .describe(`${what}, in the request unit`);
const mass = (what: string) =>
  z
    .number()
    .positive(`${what} must be greater than zero`)
    .max(MAX_MASS, `${what} is too large`)
    .describe(`${what}, in lb for unit "in" and kg for unit "mm"`);
const count = (what: string, min: number, max: number) =>
  z.number().int(`${what} must be a whole number`).min(min).max(max).describe(what);

export const RackTub = z
  .object({
    length: length('Tub length, front to back as the tub slides in'),
    width: length('Tub width, side to side'),
    height: length('Tub height, rim included'),
    loadedMass: mass('Mass of one tub with animal, substrate and water (default 4.5 lb = 2.041 kg)').optional(),
  })
  .strict()
  .describe('The measured tub the rack is built around.');

export const RackLayout = z
  .object({
    levels: count('Levels (rows of tubs), 1 to 30', 1, 30),
    columns: count('Columns (tubs side by side on a shelf), 1 to 12', 1, 12),
    dividers: count('Vertical dividers between columns, fewer than columns', 0, 11).default(0),
  })
  .strict()
  .refine((l) => l.dividers < l.columns, { message: 'dividers must be fewer than columns', path: ['dividers'] })
  .describe('How many tubs, in levels and columns.');

export const RackAllowances = z
  .object({
    lidGap: gap('Gap between the tub rim and the shelf above (default 1/8 in)').optional(),
    sidePlay: gap('Play across the shelf, shared by all columns (default 1/2 in)').optional(),
    depthPlay: gap('Play front to back (default 1/2 in)').optional(),
  })
  .strict()
  .describe('Clearances around the tubs. Defaults are common practice, converted exactly for mm.');

const SheetSize = z
  .object({ length: length('Sheet length'), width: length('Sheet width') })
  .strict()
  .describe('Stock sheet size (default 96 x 48 in).');

const SupportBlock = z
  .object({
    placement: z
      .enum(['every-column', 'when-needed'])
      .default('every-column')
      .describe('every-column (default, common practice): a pair of blocks at every column boundary without a divider, so each tub spans its own shelf width; when-needed: only where the sag check asks for them.'),
    frontDepth: length('Depth of the wide front block (default 2 in)').optional(),
    backDepth: length('Depth of the thin back block, which leaves room for the heat tape (default 3/4 in)').optional(),
  })
  .strict()
  .describe('Vertical support blocks between columns (a wide one at the front, a thin one at the back); as thick as a divider, each widens the shelf by its thickness.');

const SheetMaterial = z.enum(SHEET_MATERIAL_IDS).describe(`Sheet material: ${SHEET_MATERIAL_IDS.join(', ')}.`);

export const RackConstruction = z
  .object({
    panelThickness: length('Side, shelf and top panel thickness (default 1/2 in)').optional(),
    dividerThickness: length('Divider thickness (default 1/2 in)').optional(),
    bottomThickness: length('Bottom panel thickness (default: panelThickness)').optional(),
    backPanelThickness: length('Back panel thickness (default: panelThickness)').optional(),
    carcassMaterial: SheetMaterial.default('pvc-rigid'),
    bottomMaterial: SheetMaterial.default('plywood'),
    kerf: gap('Saw kerf (default 1/8 in)').optional(),
    sheet: SheetSize.optional(),
    backPanel: z.boolean().default(false).describe('Add a back panel to every section.'),
    supportBlock: SupportBlock.optional(),
  })
  .strict()
  .describe('Materials and thicknesses.');

export const RackSections = z
  .object({
    maxSidePanelLength: length('Longest side panel allowed; fewest balanced sections (default: the sheet length)').optional(),
    levelsPerSection: z
      .array(count('Levels in a section', 1, 30))
      .min(1)
      .max(30)
      .optional()
      .describe('Levels of each section from the bottom, e.g. [5, 4]; must add up to layout.levels.'),
  })
  .strict()
  .refine((s) => s.maxSidePanelLength === undefined || s.levelsPerSection === undefined, {
    message: 'give maxSidePanelLength or levelsPerSection, not both',
    path: ['levelsPerSection'],
  })
  .describe('How a tall rack is split into stacking sections.');

export const RackBase = z
  .object({
    casterCount: count('Casters (default 4, or 6 when the rack is wider than 48 in)', 3, 12).optional(),
    lockingCasters: count('Casters with a brake', 0, 12).default(2),
    casterHeight: length('Overall caster height, plate to floor (default 3 1/2 in)').optional(),
    casterRating: mass('Rated load of one caster (default 200 lb)').optional(),
    lumberStockLengths: z
      .array(length('Stock length'))
      .min(1)
      .max(10)
      .optional()
      .describe('Lengths the 2x4 comes in (default 8, 10, 12, 14 and 16 ft).'),
  })
  .strict()
  .refine((b) => b.casterCount === undefined || b.lockingCasters <= b.casterCount, {
    message: 'lockingCasters must not exceed casterCount',
    path: ['lockingCasters'],
  })
  .describe('The rolling base: a 2x4 frame on casters.');

export const RackHeat = z
  .object({
    enabled: z.boolean().default(true).describe('Plan heat tape (one strip per level).'),
    wattsPerFoot: z
      .number()
      .positive()
      .max(100)
      .default(10)
      .describe("Heat tape power per foot of length, W/ft; makers differ, read your tape's label (default 10)."),
    endMargin: gap('Tape stops this far short of each end of the shelf (default 1 in)').optional(),
    supplyVoltage: z.number().positive().max(480).default(120).describe('Supply voltage, V (default 120).'),
    thermostatRatingW: z
      .number()
      .positive()
      .max(10_000)
      .default(500)
      .describe("Most watts one thermostat may switch; use the maker's rating (default 500)."),
  })
  .strict()
  .describe('Heat tape and thermostats.');

export const RackJoints = z
  .object({
    screwsPerCorner: count('Flat-head screws per corner joining a top or bottom to a side', 1, 10).default(3),
    screwsPerShelfEnd: count('Screws at each end of an interior shelf', 1, 10).default(2),
    screwsPerDividerEnd: count('Screws through a shelf into each end of a divider piece', 0, 10).default(2),
    screwsPerBaseCorner: count('Screws per base frame corner', 1, 10).default(2),
    screwsPerBraceEnd: count('Screws per centre brace end', 1, 10).default(2),
    screwsPerCasterPlate: count('Screws per caster plate', 1, 10).default(3),
    dowelsPerJoint: count('Dowels per section joint', 0, 10).default(2),
  })
  .strict()
  .describe('How joints are fastened; defaults are common practice.');

export const RackLimits = z
  .object({
    maxShelfSag: gap('Shelf sag above which a mid-span support is added (default 1/16 in)').optional(),
    bindGap: z
      .number()
      .min(-MAX_LENGTH)
      .max(MAX_LENGTH)
      .optional()
      .describe('Effective lid gap below which a tub binds, in the request unit (default 0)'),
    escapeGap: gap('Effective lid gap above which an animal may escape (default 1/4 in)').optional(),
    tipRatio: z
      .number()
      .positive()
      .max(20)
      .default(2.5)
      .describe('Height to depth ratio above which the rack must be anchored to the wall (default 2.5).'),
    doorwayHeight: length('Doorway clearance a section must pass (default 80 in)').optional(),
    ceilingHeight: length('Ceiling height the rack is stood up under (default 96 in)').optional(),
  })
  .strict()
  .describe('Thresholds of the checks; defaults are common practice.');

export const RackPrices = z
  .object(
    Object.fromEntries(
      PRICE_KEY_LIST.map((k) => [k, z.number().min(0).max(1_000_000).optional().describe(PRICE_KEYS[k])]),
    ) as Record<PriceKey, z.ZodOptional<z.ZodNumber>>,
  )
  .strict()
  .describe("Prices overriding the calculator's defaults, by price-list key.");

const defaults = <T extends z.ZodType>(schema: T) => schema.default(schema.parse({}) as never);

export const RackCuttingOptions = z
  .object({
    include: z.boolean().default(true).describe('Nest the parts onto sheets and boards and count sheets from the layouts (default true); false uses an area estimate.'),
    timeLimitMs: z.number().int().min(50).max(10000).default(500).describe('Time allowed for the nesting search, milliseconds (default 500); the best layout found is returned with its lower bound.'),
  })
  .strict()
  .describe('Cutting plan options.');

export const RackPlanRequest = z
  .object({
    unit: z.enum(LENGTH_UNITS).default('in').describe('Unit of every length in the request and the response: in or mm.'),
    tub: RackTub,
    layout: RackLayout,
    allowances: defaults(RackAllowances),
    construction: defaults(RackConstruction),
    sections: defaults(RackSections),
    base: defaults(RackBase),
    heat: defaults(RackHeat),
    joints: defaults(RackJoints),
    limits: defaults(RackLimits),
    prices: defaults(RackPrices),
    cutting: defaults(RackCuttingOptions),
  })
  .strict()
  .superRefine((req, ctx) => {
    const perSection = req.sections.levelsPerSection;
    if (perSection) {
      const total = perSection.reduce((a, b) => a + b, 0);
      if (total !== req.layout.levels) {
        ctx.addIssue({
          code: 'custom',
          path: ['sections', 'levelsPerSection'],
          message: `levelsPerSection adds up to ${total}, but layout.levels is ${req.layout.levels}`,
        });
      }
    }
  })
  .describe(`A tub and a layout; everything else has defaults.\n\n${RACK_PLAN_RULES}`);

export type RackPlanRequest = z.output<typeof RackPlanRequest>;
/** What a client may send (defaults not yet applied). */
export type RackPlanRequestInput = z.input<typeof RackPlanRequest>;

export const RACK_PLAN_EXAMPLE = {
  unit: 'in',
  tub: { length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 },
  layout: { levels: 9, columns: 3, dividers: 0 },
  allowances: { lidGap: 0.125, sidePlay: 0.5, depthPlay: 0.5 },
  construction: {
    panelThickness: 0.5,
    dividerThickness: 0.5,
    carcassMaterial: 'pvc-rigid',
    bottomMaterial: 'plywood',
    kerf: 0.125,
    sheet: { length: 96, width: 48 },
    backPanel: false,
  },
  sections: { maxSidePanelLength: 96 },
  heat: { wattsPerFoot: 10, supplyVoltage: 120, thermostatRatingW: 500 },
} satisfies RackPlanRequestInput;

// ---------------------------------------------------------------------------------------------
// Response

const outLength = (what: string) => z.number().describe(`${what}, in the request unit`);
const Severity = z.enum(['info', 'warning', 'danger']).describe('info: for the record; warning: act on it; danger: do not build or use as is.');

export const RackDimensions = z
  .object({
    levelOpening: outLength('Clear height of one level: tub height + lid gap'),
    interiorShelfLength: outLength('Interior shelf length: columns x tub width + side play + (dividers + supportColumns) x divider thickness'),
    outerShelfLength: outLength('Top and bottom panel length: interior shelf + 2 x panel thickness'),
    depth: outLength('Depth of every panel: tub length + depth play'),
    carcassHeight: outLength('Bottom panel + every section (side panel + top panel)'),
    baseHeight: outLength('2x4 on edge plus caster height'),
    overallHeight: outLength('Carcass plus base'),
    overallWidth: outLength('Outside width (the top and bottom panel length)'),
    overallDepth: outLength('Outside depth, back panel included'),
  })
  .strict()
  .describe('Main dimensions.');

export const RackSection = z
  .object({
    index: z.number().int().describe('1 for the lowest section.'),
    levels: z.number().int().describe('Levels in this section.'),
    firstLevel: z.number().int().describe('Number of its lowest level, counting from 1 at the bottom of the rack.'),
    sidePanelHeight: outLength('k x levelOpening + (k - 1) x panelThickness'),
    height: outLength('Side panel + top panel, + bottom panel for the lowest section'),
    hasBottomPanel: z.boolean().describe('Only the lowest section has a bottom panel.'),
    dowels: z.number().int().describe('Dowels locating this section on the one below (0 for the lowest).'),
  })
  .strict();

export const RackPart = z
  .object({
    key: z.string().describe('Stable part key, e.g. side-panel, interior-shelf, base-rail.'),
    name: z.string().describe('Name for the cut list.'),
    material: z.string().describe('Material id (sheet material or lumber-2x4).'),
    length: outLength('Length'),
    width: outLength('Width'),
    thickness: outLength('Thickness'),
    quantity: z.number().int().describe('How many.'),
    section: z.number().int().nullable().describe('Section index (1 = lowest); null for the base.'),
    note: z.string().optional().describe('Cutting or fitting note.'),
  })
  .strict();

export const RackHardware = z
  .object({
    key: z.string().describe('Price-list key of the item.'),
    name: z.string(),
    quantity: z.number().describe('How many, in `unit`.'),
    unit: z.string().describe('each, can, ft.'),
    note: z.string().optional(),
    basis: z.string().describe('The joint rule or count behind the quantity.'),
  })
  .strict();

const Circuit = z
  .object({
    ratingA: z.number().describe('Branch circuit rating, A.'),
    voltageV: z.number().describe('Circuit voltage, V (120).'),
    capacityW: z.number().describe('ratingA x voltageV.'),
    continuousLimitW: z.number().describe('80 % of capacity (NFPA 70, 210.19/210.20).'),
    share: z.number().describe('Heat tape watts / continuousLimitW; above 1 the rack needs more than this circuit.'),
  })
  .strict();

export const RackHeatPlan = z
  .object({
    enabled: z.boolean(),
    strips: z.number().int().describe('Strips, one per level.'),
    stripLength: outLength('Length of each strip: interior shelf - 2 x end margin'),
    stripPowerW: z.number().describe('Watts of one strip.'),
    wattsPerFoot: z.number().describe('Tape power per foot, W/ft.'),
    totalTapeFeet: z.number().describe('Tape length of all strips, ft.'),
    totalPowerW: z.number().describe('Watts of all strips.'),
    supplyVoltageV: z.number(),
    currentA: z.number().describe('totalPowerW / supplyVoltageV, A.'),
    thermostats: z.number().int().describe('Thermostats so that none carries more than its rating.'),
    stripsPerThermostat: z.number().int(),
    thermostatRatingW: z.number(),
    circuits: z.array(Circuit).describe('15 A and 20 A 120 V branch circuits.'),
    cautions: z.array(z.string()).min(1).describe('Always present: electrical cautions.'),
  })
  .strict();

const LevelGap = z
  .object({
    level: z.number().int().describe('1 at the bottom.'),
    floorSag: outLength('Mid-span sag of the panel the tub stands on'),
    ceilingSag: outLength('Mid-span sag of the panel above the tub (its lid)'),
    lidGap: outLength('Effective lid gap at mid-span: lidGap + floorSag - ceilingSag'),
  })
  .strict();

export const RackLoads = z
  .object({
    emptyMassLb: z.number(),
    emptyMassKg: z.number(),
    tubsMassLb: z.number(),
    tubsMassKg: z.number(),
    loadedMassLb: z.number(),
    loadedMassKg: z.number(),
    casters: z.number().int(),
    loadPerCasterLb: z.number().describe('Loaded mass over (casters - 1): one caster assumed unloaded.'),
    loadPerCasterKg: z.number(),
    casterRatingLb: z.number(),
    casterRatingKg: z.number(),
    shelfMaterial: z.string(),
    shelfModulusPsi: z.number().describe('Modulus used for the shelves (heated where known), psi.'),
    shelfModulusMPa: z.number(),
    shelfModulusHeated: z.boolean().describe('True when the heated modulus was used.'),
    longestSpanUnsupported: outLength('Longest clear span between supports without support blocks'),
    sagUnsupported: outLength('Largest shelf sag without support blocks (5wL^4/384EI)'),
    longestSpanSupported: outLength('Longest clear span with support blocks').nullable(),
    sagSupported: outLength('Largest shelf sag with support blocks').nullable(),
    supportBlocksUsed: z.boolean(),
    supportColumns: z.number().int().describe('Columns of support blocks (each one pair of blocks per level).'),
    levels: z.array(LevelGap),
    heightToDepth: z.number().describe('overallHeight / overallDepth.'),
  })
  .strict();

export const RackCheck = z
  .object({
    code: z.string().describe('Stable code, e.g. shelf_sag, caster_load.'),
    severity: Severity,
    message: z.string().describe('Plain message.'),
    basis: z.string().describe('Formula and source.'),
  })
  .strict();

export const RackCostLine = z
  .object({
    key: z.string().describe('Price-list key.'),
    description: z.string(),
    quantity: z.number(),
    unit: z.string(),
    unitPrice: z.number(),
    amount: z.number(),
  })
  .strict();

export const RackCost = z
  .object({
    lines: z.array(RackCostLine),
    subtotals: z
      .object({ materials: z.number(), hardware: z.number(), heat: z.number(), labor: z.number() })
      .strict(),
    subtotal: z.number(),
    laborMinutes: z.number(),
    labor: z.number(),
    marginPercent: z.number(),
    margin: z.number(),
    total: z.number(),
    sheets: z
      .array(
        z
          .object({
            material: z.string(),
            thickness: outLength('Sheet thickness'),
            count: z.number().int(),
            method: z.enum(['area-estimate', 'nested']),
          })
          .strict(),
      )
      .describe('Sheets to buy per material and thickness.'),
    notes: z.array(z.string()),
  })
  .strict()
  .describe('Price in the currency of the price list.');

const DisplayPart = z
  .object({ key: z.string(), length: z.string(), width: z.string(), thickness: z.string() })
  .strict();

export const RackDisplay = z
  .object({
    dimensions: z.record(z.string(), z.string()).describe('Each dimension in fractional inches to 1/16, e.g. "34 1/8".'),
    sections: z.array(z.object({ index: z.number().int(), sidePanelHeight: z.string(), height: z.string() }).strict()),
    parts: z.array(DisplayPart),
  })
  .strict()
  .describe('Fractional-inch strings to 1/16 in, whatever the request unit.');

export const RackPlanResponse = z
  .object({
    unit: z.enum(LENGTH_UNITS),
    dimensions: RackDimensions,
    sections: z.array(RackSection),
    parts: z.array(RackPart),
    hardware: z.array(RackHardware),
    heat: RackHeatPlan,
    loads: RackLoads,
    checks: z.array(RackCheck),
    cost: RackCost,
    display: RackDisplay,
    cutting: CuttingPlanResponse.optional().describe('Sheet layouts and board cut lists for every part, nested to the fewest stock pieces (see POST /api/v1/calc/cutting-plan); the cost counts these sheets.'),
  })
  .strict()
  .describe(`A complete rack plan.\n\n${RACK_PLAN_RULES}`);

export type RackPlanResponse = z.output<typeof RackPlanResponse>;
export type RackCheck = z.output<typeof RackCheck>;
export type RackPart = z.output<typeof RackPart>;
export type RackHardware = z.output<typeof RackHardware>;
export type RackCostLine = z.output<typeof RackCostLine>;
