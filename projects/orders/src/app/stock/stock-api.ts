import { Injectable, inject } from '@angular/core';
import type { Page } from '@tubwright/kit';
import { EMPTY, Observable, expand, map, reduce } from 'rxjs';
import { OrdersApi } from '../core/orders-api';
import type { StockItem, StockKind, StockReservation } from '../core/orders-types';

const PAGE = 200;

/** Reads of the shop's stock: a shop keeps a few dozen items, so pages are gathered into one list. */
@Injectable({ providedIn: 'root' })
export class StockApi {
  private readonly api = inject(OrdersApi);

  /** Every live stock item (of one kind when given), sheets first, then boards, then hardware. */
  items(kind: StockKind | null = null): Observable<StockItem[]> {
    const pageAt = (offset: number) => this.api.get<Page<StockItem>>('/stock', { limit: PAGE, offset, sort: 'kind', kind });
    return pageAt(0).pipe(
      expand((page) => (page.offset + page.items.length < page.total && page.items.length > 0 ? pageAt(page.offset + page.items.length) : EMPTY)),
      reduce((all, page) => all.concat(page.items), [] as StockItem[]),
    );
  }

  /** What orders hold: all of it, or one order's, or one item's. */
  reservations(filter: { orderId?: number; stockItemId?: number } = {}): Observable<StockReservation[]> {
    return this.api.get<{ items: StockReservation[] }>('/stock-reservations', filter).pipe(map((list) => list.items));
  }
}
