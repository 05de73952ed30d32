import { BOARD_MATERIALS, SHEET_MATERIALS, baseMaterialName, formatLength } from '@tubwright/kit';
import type { StockItem, StockKind } from './orders-types';

/*
 * Mirrors of the API's stock lists (shared/api/stock.ts, shared/api/rack-plan.ts) as plain
 * values, the material lists from the kit: importing the schemas would put zod into the bundle.
 * The spec checks they agree.
 */

export const STOCK_KINDS: readonly StockKind[] = ['sheet', 'board', 'hardware'];
export { BOARD_MATERIALS, SHEET_MATERIALS };

/** Materials a sheet or a board may be; hardware is named freely. */
export function materialsFor(kind: StockKind): readonly string[] {
  return kind === 'sheet' ? SHEET_MATERIALS : kind === 'board' ? BOARD_MATERIALS : [];
}

export const KIND_LABELS: Record<StockKind, { one: string; many: string }> = {
  sheet: { one: 'Sheet', many: 'Sheets' },
  board: { one: 'Board', many: 'Boards' },
  hardware: { one: 'Hardware', many: 'Hardware' },
};

/** `pvc-rigid` → `Rigid PVC`; a cutting key `pvc-rigid@0.5` → `Rigid PVC, 1/2 in`; hardware names stay as they are. */
export function materialName(key: string): string {
  const thickness = key.split('@')[1];
  const name = baseMaterialName(key);
  return thickness ? `${name}, ${formatLength(Number(thickness))}` : name;
}

/** `96 x 48 in`, `96 in` or an empty string for hardware. */
export function stockSize(item: Pick<StockItem, 'lengthIn' | 'widthIn'>): string {
  if (item.lengthIn === null) return '';
  if (item.widthIn === null) return formatLength(item.lengthIn);
  return `${formatLength(item.lengthIn).replace(/ in$/, '')} x ${formatLength(item.widthIn)}`;
}

/** A stock item as one line: `Rigid PVC, 96 x 48 in (offcut)` or `Caster, 3 in`. */
export function stockItemLabel(item: Pick<StockItem, 'material' | 'lengthIn' | 'widthIn' | 'offcut'>): string {
  const size = stockSize(item);
  return `${materialName(item.material)}${size ? `, ${size}` : ''}${item.offcut ? ' (offcut)' : ''}`;
}
