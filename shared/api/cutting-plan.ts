import { z } from 'zod';

/**
 * Most pieces (sum of part quantities) one cutting-plan request may ask for. The HTTP layer
 * answers 413 when a request exceeds it: the schema reports that case as a custom issue on
 * `parts` whose params carry `reason: TOO_MANY_PARTS` and `limit`.
 */
export const MAX_PARTS = 5000;
export const TOO_MANY_PARTS = 'too_many_parts';

const length = (what: string) =>
  z.number().positive(`${what} must be greater than zero`).finite(`${what} must be a finite number`).describe(what);

const StockSheet = z
  .object({
    material: z.string().trim().min(1).max(60).describe('Material key shared by stock and parts, e.g. pvc-1/2.'),
    kind: z.literal('sheet').describe('A sheet: cut in two dimensions.'),
    length: length('Sheet length (x), in the request unit'),
    width: length('Sheet width (y), in the request unit'),
    quantity: z
      .number()
      .int()
      .positive()
      .nullable()
      .default(null)
      .describe('Pieces on hand; null or absent means unlimited. Stock with a quantity (recorded offcuts) is used first.'),
    price: z.number().min(0).finite().default(0).describe('Price of one piece, for choosing between unlimited stock sizes.'),
  })
  .strict();

const StockBoard = z
  .object({
    material: z.string().trim().min(1).max(60).describe('Material key shared by stock and parts, e.g. 2x4.'),
    kind: z.literal('board').describe('A board: cut in one dimension (cross-cuts only).'),
    length: length('Board length, in the request unit'),
    width: length('Board face width, for drawings only').optional(),
    quantity: z.number().int().positive().nullable().default(null).describe('Pieces on hand; null or absent means unlimited.'),
    price: z.number().min(0).finite().default(0).describe('Price of one piece.'),
  })
  .strict();

export const CuttingStock = z.discriminatedUnion('kind', [StockSheet, StockBoard]).describe('A stock size a material comes in.');

export const CuttingPart = z
  .object({
    name: z.string().trim().min(1).max(100).describe('Name shown in the cut list, e.g. side panel.'),
    material: z.string().trim().min(1).max(60).describe('Material key; some stock entry must have it.'),
    length: length('Part length, in the request unit'),
    width: length('Part width, in the request unit; required for sheet materials').optional(),
    quantity: z.number().int().positive().max(MAX_PARTS).default(1).describe('How many of this part.'),
    canRotate: z.boolean().default(true).describe('False when grain or finish forbids turning the part 90 degrees on the sheet.'),
    source: z.string().trim().max(100).optional().describe('Batch label: which rack plan or order the part belongs to.'),
  })
  .strict();

export const CuttingPlanRequest = z
  .object({
    unit: z.enum(['in', 'mm']).describe('Unit of every length in the request and the response.'),
    kerf: z.number().min(0).finite().describe('Width of material one saw cut removes, e.g. 0.125 in.'),
    trim: z
      .number()
      .min(0)
      .finite()
      .default(0)
      .describe('Margin removed at every edge of a stock piece (factory edges), kerf of the trim cut included.'),
    stock: z.array(CuttingStock).min(1).max(50).describe('Stock sizes per material.'),
    parts: z.array(CuttingPart).min(1).max(MAX_PARTS).describe(`Parts to cut; at most ${MAX_PARTS} pieces in all.`),
    timeLimitMs: z.number().int().min(10).max(60000).default(2000).describe('Time allowed for the search, milliseconds.'),
  })
  .strict()
  .superRefine((req, ctx) => {
    const total = req.parts.reduce((sum, p) => sum + p.quantity, 0);
    if (total > MAX_PARTS) {
      ctx.addIssue({
        code: 'custom',
        path: ['parts'],
        message: `at most ${MAX_PARTS} pieces per plan; this request has ${total}`,
        params: { reason: TOO_MANY_PARTS, limit: MAX_PARTS },
      });
    }
    const kindOf = new Map<string, string>();
    req.stock.forEach((s, i) => {
      const seen = kindOf.get(s.material);
      if (seen && seen !== s.kind) {
        ctx.addIssue({ code: 'custom', path: ['stock', i, 'kind'], message: `material ${s.material} is both sheet and board` });
      }
      kindOf.set(s.material, s.kind);
      const minSide = s.kind === 'sheet' ? Math.min(s.length, s.width) : s.length;
      if (2 * req.trim >= minSide) {
        ctx.addIssue({ code: 'custom', path: ['trim'], message: `trim leaves nothing of stock ${i}` });
      }
    });
    req.parts.forEach((p, i) => {
      const kind = kindOf.get(p.material);
      if (!kind) {
        ctx.addIssue({ code: 'custom', path: ['parts', i, 'material'], message: `no stock of material ${p.material}` });
      } else if (kind === 'sheet' && p.width === undefined) {
        ctx.addIssue({ code: 'custom', path: ['parts', i, 'width'], message: 'a part cut from sheet needs a width' });
      }
    });
  })
  .describe('Parts to cut and the stock to cut them from. Lengths in `unit`.');

const Placement = z.object({
  part: z.number().int().describe('Index of the part in the request (the cut list shows it as part + 1).'),
  x: z.number().describe('Position along the stock length.'),
  y: z.number().describe('Position along the stock width (0 for boards).'),
  length: z.number().describe('Extent along x.'),
  width: z.number().describe('Extent along y (0 for boards without a width).'),
  rotated: z.boolean().describe('True when the part length runs along y.'),
});

const Cut = z.object({
  step: z.number().int().describe('Order of the cut, from 1.'),
  axis: z.enum(['x', 'y']).describe('x: the cut line is x = at (a cross-cut); y: the cut line is y = at (a rip along the length).'),
  at: z.number().describe('Near edge of the kerf; the kerf occupies at to at + kerf.'),
  piece: z
    .number()
    .int()
    .describe('Piece being cut: 0 is the stock (trim removed); each cut makes two pieces numbered in order, the one below `at` first.'),
});

const Offcut = z.object({
  x: z.number(),
  y: z.number(),
  length: z.number(),
  width: z.number(),
});

export const CuttingLayout = z.object({
  stock: z.number().int().describe('Index of the stock entry in the request.'),
  count: z.number().int().positive().describe('How many stock pieces are cut to this same layout.'),
  placements: z.array(Placement),
  cuts: z.array(Cut).describe('Edge-to-edge cuts in saw order; they reproduce the placements.'),
  offcuts: z.array(Offcut).describe('Usable leftover pieces (both sides at least the smallest part side of the material).'),
});

export const CuttingMaterialPlan = z.object({
  material: z.string(),
  kind: z.enum(['sheet', 'board']),
  stockUsed: z.number().int().describe('Stock pieces used.'),
  lowerBound: z
    .number()
    .int()
    .describe('No plan can use fewer pieces (area, Martello-Toth L2 and centre-line bounds; recorded offcuts count as used).'),
  optimal: z.boolean().describe('True only when stockUsed equals lowerBound.'),
  yield: z.number().describe('Part area (boards: length) over stock area used, 0 to 1.'),
  layouts: z.array(CuttingLayout),
});

export const CuttingPlanResponse = z
  .object({
    unit: z.enum(['in', 'mm']),
    materials: z.array(CuttingMaterialPlan),
    svg: z.array(z.string()).describe('One SVG drawing per layout, in the order of materials[].layouts[].'),
    timedOut: z.boolean().describe('True when the time limit stopped the search before every material was proven optimal.'),
  })
  .describe('Saw-ready layouts per material with a lower bound on the stock needed.');

export type CuttingPlanRequest = z.infer<typeof CuttingPlanRequest>;
export type CuttingPlanRequestInput = z.input<typeof CuttingPlanRequest>;
export type CuttingPlanResponse = z.infer<typeof CuttingPlanResponse>;
export type CuttingMaterialPlan = z.infer<typeof CuttingMaterialPlan>;
export type CuttingLayout = z.infer<typeof CuttingLayout>;
export type CuttingStock = z.infer<typeof CuttingStock>;
export type CuttingPart = z.infer<typeof CuttingPart>;

export const CUTTING_PLAN_EXAMPLE: CuttingPlanRequestInput = {
  unit: 'in',
  kerf: 0.125,
  trim: 0,
  stock: [
    { material: 'pvc-1/2', kind: 'sheet', length: 96, width: 48, quantity: null, price: 0 },
    { material: '2x4', kind: 'board', length: 96 },
  ],
  parts: [
    { name: 'side panel', material: 'pvc-1/2', length: 63.625, width: 23.5, quantity: 2, canRotate: true },
    { name: 'shelf', material: 'pvc-1/2', length: 50.25, width: 23.5, quantity: 8, canRotate: true },
    { name: 'base rail', material: '2x4', length: 50.25, quantity: 2 },
  ],
  timeLimitMs: 2000,
};
