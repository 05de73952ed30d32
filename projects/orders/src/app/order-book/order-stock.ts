import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner } from '@tubwright/kit';
import { forkJoin } from 'rxjs';
import { FieldCheck, wholeProblem } from '../core/field-check';
import { OrdersApi } from '../core/orders-api';
import type { Order, StockReservation } from '../core/orders-types';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { KIND_LABELS, STOCK_KINDS, stockItemLabel } from '../core/stock-materials';
import { StockApi } from '../stock/stock-api';

type Field = 'stockItemId' | 'quantity';

/** Orders past their hand-over hold nothing (the API refuses them). */
const FINISHED = ['delivered', 'picked_up', 'closed', 'cancelled'];

/** Sheets, boards and hardware held for one order, so nobody cuts them into another. */
@Component({
  selector: 'tw-order-stock',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, MatIcon, MatProgressBar, ErrorBanner, ShellLink],
  template: `
    @if (data.loading() && !data.value()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading the stock" />
    }
    @if (data.error() ?? release.error(); as message) {
      <tw-error-banner [message]="message" [retryable]="!!data.error()" (retry)="data.reload()" />
    }
    @if (data.value()) {
      @if (held().length) {
        <div class="tw-table-scroll">
          <table class="tw-plain-table" aria-label="Stock set aside for this order">
            <thead><tr><th>Item</th><th class="tw-num">Pieces</th><th class="tw-num">Still free</th><th>By</th>@if (canEdit()) {<th><span class="tw-visually-hidden">Release</span></th>}</tr></thead>
            <tbody>
              @for (h of held(); track h.hold.id) {
                <tr>
                  <td>{{ h.label }}</td>
                  <td class="tw-num">{{ h.hold.quantity }}</td>
                  <td class="tw-num">{{ h.free }}</td>
                  <td class="tw-small">{{ h.hold.createdBy }}</td>
                  @if (canEdit()) {
                    <td><button mat-button type="button" (click)="releaseHold(h.hold)" [disabled]="release.busy()">Release</button></td>
                  }
                </tr>
              }
            </tbody>
          </table>
        </div>
      } @else {
        <p class="tw-muted">Nothing set aside for this order yet.</p>
      }

      @if (canEdit() && !finished()) {
        <form class="hold" (submit)="$event.preventDefault(); setAside()" novalidate aria-label="Set stock aside">
          <mat-form-field appearance="outline" subscriptSizing="dynamic" class="item" [class.tw-invalid]="check.problem('stockItemId')">
            <mat-label>Stock item</mat-label>
            <select matNativeControl (change)="pick($event)" [attr.aria-invalid]="!!check.problem('stockItemId')">
              <option value="" [selected]="itemId() === null">Pick from stock…</option>
              @for (group of choices(); track group.kind) {
                <optgroup [label]="group.label">
                  @for (c of group.items; track c.id) {
                    <option [value]="c.id" [selected]="itemId() === c.id">{{ c.label }} — {{ c.free }} free</option>
                  }
                </optgroup>
              }
            </select>
            @if (check.problem('stockItemId'); as problem) {
              <mat-hint class="tw-field-error">{{ problem }}</mat-hint>
            }
          </mat-form-field>
          <mat-form-field appearance="outline" subscriptSizing="dynamic" class="qty" [class.tw-invalid]="check.problem('quantity')">
            <mat-label>Pieces for this order</mat-label>
            <input matInput inputmode="numeric" [value]="quantityText()" (input)="typeQuantity($event)" [attr.aria-invalid]="!!check.problem('quantity')" />
            @if (check.problem('quantity'); as problem) {
              <mat-hint class="tw-field-error">{{ problem }}</mat-hint>
            } @else {
              <mat-hint>The order’s total of this item</mat-hint>
            }
          </mat-form-field>
          <button mat-flat-button type="submit" [disabled]="save.busy()"><mat-icon>inventory</mat-icon>Set aside</button>
        </form>
        @if (save.error(); as message) {
          <tw-error-banner [message]="message" />
        }
      } @else if (canEdit() && finished()) {
        <p class="tw-muted tw-small">This order is {{ order().status === 'cancelled' ? 'cancelled' : 'handed over' }}: release what it still holds.</p>
      }
      <p class="tw-small"><a twLink="stock">All stock</a></p>
    }
  `,
  styles: `
    :host { display: block; }
    .hold { display: flex; flex-wrap: wrap; gap: 12px; align-items: flex-start; margin-top: 12px; }
    .item { flex: 1 1 280px; }
    .qty { flex: 0 1 180px; }
    .hold button { margin-top: 8px; }
  `,
})
export class OrderStock {
  readonly order = input.required<Order>();
  readonly canEdit = input(false);

  private readonly api = inject(OrdersApi);
  private readonly stock = inject(StockApi);
  private readonly orderId = computed(() => this.order().id);
  protected readonly data = remote(() => this.orderId(), () => forkJoin({ items: this.stock.items(), holds: this.stock.reservations() }));
  protected readonly save = new Action();
  protected readonly release = new Action();
  protected readonly finished = computed(() => FINISHED.includes(this.order().status));

  protected readonly itemId = signal<number | null>(null);
  /** What the order holds of the picked item, as the starting count. */
  protected readonly quantityText = linkedSignal(() => {
    const id = this.itemId();
    const mine = this.data.value()?.holds.find((h) => h.orderId === this.orderId() && h.stockItemId === id);
    return String(mine?.quantity ?? 1);
  });

  /** Per item: what other orders hold, so what this order may have is on hand less that. */
  private readonly heldByOthers = computed(() => {
    const totals = new Map<number, number>();
    for (const h of this.data.value()?.holds ?? []) if (h.orderId !== this.orderId()) totals.set(h.stockItemId, (totals.get(h.stockItemId) ?? 0) + h.quantity);
    return totals;
  });
  private readonly freeFor = (itemId: number, quantity: number) => quantity - (this.heldByOthers().get(itemId) ?? 0);

  protected readonly held = computed(() => {
    const data = this.data.value();
    if (!data) return [];
    const items = new Map(data.items.map((i) => [i.id, i]));
    return data.holds
      .filter((h) => h.orderId === this.orderId())
      .map((hold) => {
        const item = items.get(hold.stockItemId);
        return { hold, label: item ? stockItemLabel(item) : `Stock item ${hold.stockItemId} (removed)`, free: item ? this.freeFor(item.id, item.quantity) - hold.quantity : 0 };
      });
  });
  protected readonly choices = computed(() => {
    const items = this.data.value()?.items ?? [];
    return STOCK_KINDS.map((kind) => ({
      kind,
      label: KIND_LABELS[kind].many,
      items: items.filter((i) => i.kind === kind).map((i) => ({ id: i.id, label: stockItemLabel(i), free: this.freeFor(i.id, i.quantity) })),
    })).filter((g) => g.items.length > 0);
  });

  protected readonly check = new FieldCheck<Field>({
    stockItemId: computed(() => (this.itemId() === null ? 'Pick a stock item' : null)),
    quantity: computed(() => {
      const problem = wholeProblem(this.quantityText(), 1, 100_000, 'pieces');
      if (problem) return problem;
      const id = this.itemId();
      const item = this.data.value()?.items.find((i) => i.id === id);
      const free = item ? this.freeFor(item.id, item.quantity) : Infinity;
      return Number(this.quantityText()) > free ? `Only ${Math.max(0, free)} free for this order` : null;
    }),
  });

  protected pick(event: Event): void {
    const value = (event.target as HTMLSelectElement).value;
    this.itemId.set(value ? Number(value) : null);
    this.check.edited('stockItemId');
  }

  protected typeQuantity(event: Event): void {
    this.quantityText.set((event.target as HTMLInputElement).value);
    this.check.edited('quantity');
  }

  protected setAside(): void {
    if (!this.check.ready()) return;
    const body = { stockItemId: this.itemId()!, orderId: this.orderId(), quantity: Number(this.quantityText().trim()) };
    this.save.run(
      this.api.post<StockReservation>('/stock-reservations', body),
      () => {
        this.itemId.set(null);
        this.check.tried.set(false);
        this.data.reload();
      },
      (error) => this.check.placeServerError(error),
    );
  }

  protected releaseHold(hold: StockReservation): void {
    this.release.run(this.api.delete(`/stock-reservations/${hold.id}`), () => this.data.reload());
  }
}
