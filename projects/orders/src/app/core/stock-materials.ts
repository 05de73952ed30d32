import { formatLength } from '@tubwright/kit';
import type { StockItem, StockKind } from './orders-types';

/*
 * Mirrors of the API's stock lists (shared/api/stock.ts, shared/api/rack-plan.ts) as plain
 * values: importing the schemas would put zod into the bundle. The spec checks they agree.
 */

export const STOCK_KINDS: readonly StockKind[] = ['sheet', 'board', 'hardware'];
export const SHEET_MATERIALS = ['pvc-rigid', 'pvc-expanded', 'melamine-particleboard', 'plywood'] as const;
export const BOARD_MATERIALS = ['lumber-2x4'] as const;

/** Materials a sheet or a board may be; hardware is named freely. */
export function materialsFor(kind: StockKind): readonly string[] {
  return kind === 'sheet' ? SHEET_MATERIALS : kind === 'board' ? BOARD_MATERIALS : [];
}

export const KIND_LABELS: Record<StockKind, { one: string; many: string }> = {
  sheet: { one: 'Sheet', many: 'Sheets' },
  board: { one: 'Board', many: 'Boards' },
  hardware: { one: 'Hardware', many: 'Hardware' },
};

const NAMES: Record<string, string> = {
  'pvc-rigid': 'Rigid PVC',
  'pvc-expanded': 'Foamed PVC',
  'melamine-particleboard': 'Melamine particleboard',
  plywood: 'Plywood',
  'lumber-2x4': '2x4 lumber',
};

/** `pvc-rigid` → `Rigid PVC`; a cutting key `pvc-rigid@0.5` → `Rigid PVC, 1/2 in`; hardware names stay as they are. */
export function materialName(key: string): string {
  const [material = key, thickness] = key.split('@');
  const name = NAMES[material] ?? material;
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
