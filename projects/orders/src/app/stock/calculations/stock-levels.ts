import type { StockItem, StockKind, StockReservation } from '../../core/orders-types';

export interface StockLevel {
  item: StockItem;
  /** Sum of what orders hold of the item. */
  setAside: number;
  /** On hand less set aside; negative when the count on hand fell below what orders hold. */
  free: number;
}

/** What is set aside of each item, from the reservations of every order. */
export function setAsideByItem(reservations: readonly Pick<StockReservation, 'stockItemId' | 'quantity'>[]): Map<number, number> {
  const totals = new Map<number, number>();
  for (const r of reservations) totals.set(r.stockItemId, (totals.get(r.stockItemId) ?? 0) + r.quantity);
  return totals;
}

/** Items with their set-aside and free counts, grouped by kind in the shop's order (sheets, boards, hardware). */
export function stockLevels(items: readonly StockItem[], reservations: readonly Pick<StockReservation, 'stockItemId' | 'quantity'>[]): Map<StockKind, StockLevel[]> {
  const held = setAsideByItem(reservations);
  const groups = new Map<StockKind, StockLevel[]>([['sheet', []], ['board', []], ['hardware', []]]);
  for (const item of items) {
    const setAside = held.get(item.id) ?? 0;
    groups.get(item.kind)?.push({ item, setAside, free: item.quantity - setAside });
  }
  return groups;
}
