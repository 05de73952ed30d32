import type { CuttingPlanRequestInput, CuttingPlanResponse, StockItem, StockReservation } from '../../core/orders-types';
import { formatInches } from '@tubwright/shared/units';
import { materialName } from '../../core/stock-materials';

/*
 * Stock on hand in a batch cutting plan. Recorded offcuts (and full pieces of sizes the plan does
 * not buy) go to the cutting-plan API as stock with a quantity, which it uses first; the sizes the
 * shop buys stay unlimited, and what the plan cuts from them is taken from the free pieces on hand
 * before the rest goes on the list to buy. Lengths in inches, like the batch request.
 */

type CuttingStockInput = CuttingPlanRequestInput['stock'][number];

/** Where the pieces of one stock entry of the request come from. */
export type StockSource =
  | { from: 'offcut' | 'on-hand'; items: StockItem[] }
  /** A size the shop buys; `onHand` free pieces of it are cut first. */
  | { from: 'buy'; onHand: number; items: StockItem[] };

export interface StockedRequest {
  request: CuttingPlanRequestInput;
  /** Index-aligned with `request.stock`. */
  sources: StockSource[];
  /** What was left out, in a sentence each. */
  notes: string[];
}

export interface MaterialUse {
  material: string;
  kind: 'sheet' | 'board';
  used: number;
  fromOffcuts: number;
  fromStock: number;
  toBuy: number;
}

export interface StockLine {
  count: number;
  text: string;
  /** Where the pieces lie (stock to pull), empty for purchases. */
  location: string;
}

/** The cutting-plan API takes at most this many stock entries. */
export const MAX_STOCK_ENTRIES = 50;
/** Far below the area of any real size, so a size on hand always costs least. */
export const ON_HAND_PRICE = 0.001;
/** Sizes within 1/32 in are the same size. */
const SAME_SIZE_IN = 1 / 32;

/** Pieces other orders hold of each item: what this batch may not cut into. */
export function heldOutside(reservations: readonly Pick<StockReservation, 'stockItemId' | 'orderId' | 'quantity'>[], batchOrderIds: readonly number[]): Map<number, number> {
  const held = new Map<number, number>();
  for (const r of reservations) if (!batchOrderIds.includes(r.orderId)) held.set(r.stockItemId, (held.get(r.stockItemId) ?? 0) + r.quantity);
  return held;
}

/** The batch request with the free sheets and boards on hand added, and where each stock entry's pieces come from. */
export function withStockOnHand(request: CuttingPlanRequestInput, items: readonly StockItem[], held: ReadonlyMap<number, number>): StockedRequest {
  const base: CuttingStockInput[] = request.stock.map((s) => ({ ...s, quantity: null }));
  const sources: StockSource[] = base.map(() => ({ from: 'buy', onHand: 0, items: [] }));
  const extras: Array<{ entry: CuttingStockInput; source: StockSource; area: number }> = [];
  const notes: string[] = [];
  const skipped = new Set<string>();

  for (const item of items) {
    if (item.kind === 'hardware' || item.lengthIn === null) continue;
    const free = item.quantity - (held.get(item.id) ?? 0);
    if (free <= 0) continue;
    // Sheet keys carry the thickness (`pvc-rigid@0.5`); stock records do not, so one thickness per material is needed to match.
    const keys = [...new Set(base.filter((s) => s.kind === item.kind && s.material.split('@')[0] === item.material).map((s) => s.material))];
    if (keys.length === 0) continue;
    if (keys.length > 1) {
      if (!skipped.has(item.material)) {
        skipped.add(item.material);
        notes.push(`${materialName(item.material)} is cut in more than one thickness here and stock records no thickness, so its stock on hand was not counted.`);
      }
      continue;
    }
    const material = keys[0]!;
    if (item.kind === 'sheet' && item.widthIn === null) continue;
    if (!item.offcut) {
      const index = base.findIndex((s) => s.material === material && sameSize(s, item));
      const source = sources[index];
      if (source?.from === 'buy') {
        source.onHand += free;
        source.items.push(item);
        continue;
      }
    }
    const entry: CuttingStockInput =
      item.kind === 'sheet'
        ? { material, kind: 'sheet', length: item.lengthIn, width: item.widthIn!, quantity: free }
        : { material, kind: 'board', length: item.lengthIn, quantity: free };
    extras.push({ entry, source: { from: item.offcut ? 'offcut' : 'on-hand', items: [item] }, area: item.lengthIn * (item.widthIn ?? 1) });
  }

  // Between sizes the shop buys, the API picks the one whose count x price is least (area when no
  // price). A token price on sizes with free pieces on hand makes it cut those before buying others.
  base.forEach((entry, i) => {
    const source = sources[i];
    if (source?.from === 'buy' && source.onHand > 0) entry.price = ON_HAND_PRICE;
  });

  // The API fills pieces with a quantity in the order given: offcuts first, the smallest first, so small parts use up small pieces.
  extras.sort((a, b) => rank(a.source) - rank(b.source) || a.area - b.area);
  const room = Math.max(0, MAX_STOCK_ENTRIES - base.length);
  if (extras.length > room) notes.push(`${extras.length - room} of the offcuts and odd pieces on hand were left out: a plan takes at most ${MAX_STOCK_ENTRIES} stock sizes.`);
  const kept = extras.slice(0, room);
  return {
    request: { ...request, stock: [...base, ...kept.map((e) => e.entry)] },
    sources: [...sources, ...kept.map((e) => e.source)],
    notes,
  };
}

/**
 * Per material: pieces the plan cuts, and how many come from offcuts, from stock on hand and
 * from the store (cut from a bought size beyond its free pieces on hand).
 */
export function stockUse(stocked: StockedRequest, plan: Pick<CuttingPlanResponse, 'materials'>): { materials: MaterialUse[]; pull: StockLine[]; buy: StockLine[] } {
  const used = new Map<number, number>();
  for (const m of plan.materials) for (const l of m.layouts) used.set(l.stock, (used.get(l.stock) ?? 0) + l.count);

  const pull: StockLine[] = [];
  const buy: StockLine[] = [];
  const materials = plan.materials.map((m): MaterialUse => {
    const row: MaterialUse = { material: m.material, kind: m.kind, used: 0, fromOffcuts: 0, fromStock: 0, toBuy: 0 };
    const indexes = [...new Set(m.layouts.map((l) => l.stock))].sort((a, b) => a - b);
    for (const index of indexes) {
      const count = used.get(index) ?? 0;
      const source = stocked.sources[index];
      const entry = stocked.request.stock[index];
      if (!source || !entry || count === 0) continue;
      row.used += count;
      const text = `${materialName(entry.material)}, ${entrySize(entry)}`;
      if (source.from === 'buy') {
        const fromStock = Math.min(count, source.onHand);
        row.fromStock += fromStock;
        row.toBuy += count - fromStock;
        if (fromStock > 0) pull.push({ count: fromStock, text, location: locations(source.items) });
        if (count > fromStock) buy.push({ count: count - fromStock, text, location: '' });
      } else {
        if (source.from === 'offcut') row.fromOffcuts += count;
        else row.fromStock += count;
        pull.push({ count, text: source.from === 'offcut' ? `${text} (offcut)` : text, location: locations(source.items) });
      }
    }
    return row;
  });
  return { materials, pull, buy };
}

function rank(source: StockSource): number {
  return source.from === 'offcut' ? 0 : 1;
}

function sameSize(entry: CuttingStockInput, item: StockItem): boolean {
  const close = (a: number, b: number) => Math.abs(a - b) <= SAME_SIZE_IN;
  if (entry.kind === 'board') return close(entry.length, item.lengthIn!);
  const w = item.widthIn!;
  return (close(entry.length, item.lengthIn!) && close(entry.width, w)) || (close(entry.length, w) && close(entry.width, item.lengthIn!));
}

function entrySize(entry: CuttingStockInput): string {
  return entry.kind === 'sheet' ? `${formatInches(entry.length)} x ${formatInches(entry.width)} in` : `${formatInches(entry.length)} in`;
}

function locations(items: readonly StockItem[]): string {
  return [...new Set(items.map((i) => i.location).filter(Boolean))].join(', ');
}
