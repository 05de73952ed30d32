import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';
import { SHEET_MATERIAL_IDS } from './rack-plan.js';

export const BOARD_MATERIAL_IDS = ['lumber-2x4'] as const;

/** sheet: sheet goods (PVC, plywood); board: lumber such as 2x4; hardware: screws, casters, dowels, heat tape. */
export const STOCK_KINDS = ['sheet', 'board', 'hardware'] as const;

export const StockItem = z.object({
  id: z.number().int(),
  kind: z.enum(STOCK_KINDS),
  material: z.string().describe('For sheets and boards the material key of the price list (as in rack-plan parts); for hardware its name.'),
  description: z.string(),
  lengthIn: z.number().nullable().describe('Sheets and boards: length, inches; null for hardware.'),
  widthIn: z.number().nullable().describe('Sheets: width, inches; null for boards and hardware.'),
  quantity: z.number().int().describe('Pieces on hand (hardware: units as priced).'),
  offcut: z.boolean().describe('A piece left over from earlier cutting, kept for reuse; batch cutting uses offcuts first.'),
  location: z.string(),
  createdAt: IsoDateTime,
});
export const StockListQuery = listQuery(['kind', 'material', 'lengthIn', 'quantity', 'createdAt']).extend({
  kind: z.enum(STOCK_KINDS).optional(),
});
export const StockPage = page(StockItem);

const length = (what: string) => z.number().positive(`must be above 0`).max(240, `must be at most 240 in`).describe(`${what}, inches`);
const StockFields = {
  kind: z.enum(STOCK_KINDS),
  material: z.string().trim().min(1, 'is required').max(120),
  description: z.string().trim().max(300).default(''),
  lengthIn: length('Length').nullable().default(null),
  widthIn: length('Width').nullable().default(null),
  quantity: z.number().int('must be a whole number').min(0, 'must be 0 or more').max(100_000),
  offcut: z.boolean().default(false),
  location: z.string().trim().max(120).default(''),
};

/** Sheets need a length and a width, boards a length; hardware has neither. */
function sizeRules(item: { kind?: string; material?: string; lengthIn?: number | null; widthIn?: number | null }, ctx: z.RefinementCtx): void {
  const materials: Record<string, readonly string[]> = { sheet: SHEET_MATERIAL_IDS, board: BOARD_MATERIAL_IDS };
  const allowed = item.kind ? materials[item.kind] : undefined;
  if (allowed && !allowed.includes(item.material ?? '')) ctx.addIssue({ code: 'custom', path: ['material'], message: `must be one of ${allowed.join(', ')} for a ${item.kind}` });
  if (item.kind === 'sheet' && (item.lengthIn == null || item.widthIn == null)) {
    ctx.addIssue({ code: 'custom', path: [item.lengthIn == null ? 'lengthIn' : 'widthIn'], message: 'is required for a sheet' });
  }
  if (item.kind === 'board' && item.lengthIn == null) ctx.addIssue({ code: 'custom', path: ['lengthIn'], message: 'is required for a board' });
  if (item.kind === 'board' && item.widthIn != null) ctx.addIssue({ code: 'custom', path: ['widthIn'], message: 'must be empty for a board (its cross-section comes with the material)' });
}

export const CreateStockItemRequest = z.object(StockFields).strict().superRefine(sizeRules);
export const UpdateStockItemRequest = z
  .object({
    description: StockFields.description.unwrap(),
    quantity: StockFields.quantity,
    offcut: StockFields.offcut.unwrap(),
    location: StockFields.location.unwrap(),
  })
  .partial()
  .strict();

export const StockReservation = z.object({
  id: z.number().int(),
  stockItemId: z.number().int(),
  orderId: z.number().int(),
  orderNumber: z.string(),
  quantity: z.number().int(),
  createdBy: z.string(),
  createdAt: IsoDateTime,
});
export const StockReservationList = z.object({ items: z.array(StockReservation) });
export const StockReservationQuery = z
  .object({
    orderId: z.coerce.number().int().positive().optional(),
    stockItemId: z.coerce.number().int().positive().optional(),
  })
  .strict();
export const CreateStockReservationRequest = z
  .object({
    stockItemId: z.number().int().positive(),
    orderId: z.number().int().positive(),
    quantity: z.number().int('must be a whole number').positive('must be above 0'),
  })
  .strict();

export const CREATE_STOCK_ITEM_EXAMPLE = { kind: 'sheet', material: 'pvc-rigid', description: 'Full sheet, white', lengthIn: 96, widthIn: 48, quantity: 12, offcut: false, location: 'rack A' };
