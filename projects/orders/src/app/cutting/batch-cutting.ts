import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner, Page, PageHeader, formatLength } from '@tubwright/kit';
import { forkJoin, map, of, switchMap, tap } from 'rxjs';
import { OrdersApi } from '../core/orders-api';
import type { CuttingPlanRequestInput, CuttingPlanResponse, Order, OrderSummary } from '../core/orders-types';
import { RackResults } from '../core/rack-results';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { statusLabel } from '../core/statuses';
import { materialName } from '../core/stock-materials';
import { StockApi } from '../stock/stock-api';
import { BatchRack, batchCuttingRequest, pieceCount, separateSheetCounts } from './calculations/batch-request';
import { MaterialUse, StockLine, StockSource, heldOutside, stockUse, withStockOnHand } from './calculations/stock-use';

interface BatchResult {
  request: CuttingPlanRequestInput;
  plan: CuttingPlanResponse;
  separate: Map<string, number>;
  orders: Order[];
  /** Per material: offcuts, stock on hand and pieces to buy. */
  use: Map<string, MaterialUse>;
  pull: StockLine[];
  buy: StockLine[];
  notes: string[];
  sources: StockSource[];
}

/** Nests the parts of several orders onto shared sheets and boards through the cutting-plan API. */
@Component({
  selector: 'tw-batch-cutting',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PageHeader, ErrorBanner, MatButton, MatIcon, MatProgressBar, ShellLink],
  templateUrl: './batch-cutting.html',
  styleUrl: './batch-cutting.scss',
})
export class BatchCutting {
  /** Orders picked on the board (from the address). */
  readonly orderIds = input<number[]>([]);

  private readonly api = inject(OrdersApi);
  private readonly racks = inject(RackResults);
  private readonly stock = inject(StockApi);
  protected readonly candidates = remote(
    () => true,
    () =>
      forkJoin(['deposit_paid', 'cutting'].map((status) => this.api.get<Page<OrderSummary>>('/orders', { status, sort: 'deliveryDate', limit: 100 }))).pipe(
        map((pages) => pages.flatMap((p) => p.items)),
      ),
  );
  protected readonly selected = linkedSignal<ReadonlySet<number>>(() => new Set(this.orderIds()));
  protected readonly run = new Action();
  protected readonly step = signal('');
  protected readonly result = signal<BatchResult | null>(null);
  protected readonly label = statusLabel;

  protected readonly layouts = computed(() => {
    const r = this.result();
    if (!r) return [];
    let drawing = 0;
    return r.plan.materials.flatMap((m) =>
      m.layouts.map((layout, i) => {
        const stock = r.request.stock[layout.stock];
        const size = !stock ? '' : stock.kind === 'sheet' ? `${formatLength(stock.length).replace(/ in$/, '')} x ${formatLength(stock.width)}` : formatLength(stock.length);
        return {
          material: materialName(m.material),
          index: i + 1,
          of: m.layouts.length,
          count: layout.count,
          pieces: layout.placements.length,
          from: r.sources[layout.stock]?.from === 'offcut' ? `offcut ${size}` : size,
          src: svgSource(r.plan.svg[drawing++] ?? ''),
        };
      }),
    );
  });

  protected toggle(id: number, event: Event): void {
    const on = (event.target as HTMLInputElement).checked;
    this.selected.update((set) => {
      const next = new Set(set);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });
  }

  protected plan(): void {
    const ids = [...this.selected()];
    if (ids.length === 0) return;
    this.result.set(null);
    this.step.set('Reading the orders…');
    const work = forkJoin({
      orders: forkJoin(ids.map((id) => this.api.get<Order>(`/orders/${id}`))),
      items: this.stock.items(),
      holds: this.stock.reservations(),
    }).pipe(
      tap(() => this.step.set('Working out every rack’s parts…')),
      switchMap(({ orders, items, holds }) => {
        const racks = orders.flatMap((order) => order.racks.filter((r) => r.spec).map((rack) => ({ order, rack })));
        if (racks.length === 0) throw new Error('None of these orders has a rack to cut.');
        return forkJoin(racks.map(({ rack }) => this.racks.resultFor(rack.spec!, true))).pipe(
          map((results) => {
            const batch = results.map((result, i): BatchRack => ({ source: racks[i]!.order.number, quantity: racks[i]!.rack.quantity, spec: racks[i]!.rack.spec!, result }));
            // What the batch's own orders hold is theirs to cut; what other orders hold stays put.
            return { orders, batch, withStock: withStockOnHand(batchCuttingRequest(batch), items, heldOutside(holds, ids)) };
          }),
        );
      }),
      tap(() => this.step.set('Nesting the parts onto offcuts, sheets and boards…')),
      switchMap(({ orders, batch, withStock }) =>
        this.api.post<CuttingPlanResponse>('/calc/cutting-plan', withStock.request).pipe(
          map((plan): BatchResult => {
            const use = stockUse(withStock, plan);
            return {
              request: withStock.request,
              plan,
              orders,
              separate: separateSheetCounts(batch),
              use: new Map(use.materials.map((m) => [m.material, m])),
              pull: use.pull,
              buy: use.buy,
              notes: withStock.notes,
              sources: withStock.sources,
            };
          }),
        ),
      ),
    );
    this.run.run(
      work,
      (result) => {
        this.step.set('');
        this.result.set(result);
      },
      () => {
        this.step.set('');
        return false;
      },
    );
  }

  protected pieces(request: CuttingPlanRequestInput): number {
    return pieceCount(request);
  }

  protected readonly materialName = materialName;

  protected size(lengthIn: number, widthIn: number | undefined): string {
    return widthIn === undefined ? formatLength(lengthIn) : `${formatLength(lengthIn)} x ${formatLength(widthIn)}`;
  }

  protected orderNumbers(result: BatchResult): string {
    return result.orders.map((o) => o.number).join(', ');
  }

  protected percent(fraction: number): string {
    return `${Math.round(fraction * 1000) / 10} %`;
  }
}

function svgSource(svg: string): string {
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
}
