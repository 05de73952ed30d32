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
import { BatchRack, batchCuttingRequest, pieceCount, separateSheetCounts } from './calculations/batch-request';

interface BatchResult {
  request: CuttingPlanRequestInput;
  plan: CuttingPlanResponse;
  separate: Map<string, number>;
  orders: Order[];
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
      m.layouts.map((layout, i) => ({
        material: materialName(m.material),
        index: i + 1,
        of: m.layouts.length,
        count: layout.count,
        pieces: layout.placements.length,
        src: svgSource(r.plan.svg[drawing++] ?? ''),
      })),
    );
  });

  /** Stock pieces to buy, by size: sheets and boards as a shopping list. */
  protected readonly shopping = computed(() => {
    const r = this.result();
    if (!r) return [];
    const counts = new Map<number, number>();
    for (const m of r.plan.materials) for (const l of m.layouts) counts.set(l.stock, (counts.get(l.stock) ?? 0) + l.count);
    return [...counts.entries()].map(([index, count]) => {
      const stock = r.request.stock[index]!;
      const size = stock.kind === 'sheet' ? `${formatLength(stock.length)} x ${formatLength(stock.width)}` : formatLength(stock.length);
      return { count, text: `${materialName(stock.material)}, ${size}` };
    });
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
    const work = forkJoin(ids.map((id) => this.api.get<Order>(`/orders/${id}`))).pipe(
      tap(() => this.step.set('Working out every rack’s parts…')),
      switchMap((orders) => {
        const racks = orders.flatMap((order) => order.racks.filter((r) => r.spec).map((rack) => ({ order, rack })));
        if (racks.length === 0) throw new Error('None of these orders has a rack to cut.');
        return forkJoin(racks.map(({ rack }) => this.racks.resultFor(rack.spec!, true))).pipe(
          map((results) => ({
            orders,
            batch: results.map((result, i): BatchRack => ({ source: racks[i]!.order.number, quantity: racks[i]!.rack.quantity, spec: racks[i]!.rack.spec!, result })),
          })),
        );
      }),
      tap(() => this.step.set('Nesting the parts onto sheets and boards…')),
      switchMap(({ orders, batch }) => {
        const request = batchCuttingRequest(batch);
        return this.api.post<CuttingPlanResponse>('/calc/cutting-plan', request).pipe(map((plan) => ({ request, plan, orders, separate: separateSheetCounts(batch) })));
      }),
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

/** `pvc-rigid@0.5` → `pvc-rigid, 1/2 in`; `lumber-2x4` stays as it is. */
function materialName(key: string): string {
  const [material, thickness] = key.split('@');
  return thickness ? `${material}, ${formatLength(Number(thickness))}` : key;
}

function svgSource(svg: string): string {
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
}
