import { ChangeDetectionStrategy, Component, ElementRef, afterNextRender, computed, inject, input, linkedSignal, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { ErrorBanner } from '@tubwright/kit';
import { Observable, map, switchMap } from 'rxjs';
import { FieldCheck } from '../core/field-check';
import { MoneyPipe, centsToInput, formatCents, parseMoneyToCents } from '../core/money';
import { OrdersApi, newIdempotencyKey } from '../core/orders-api';
import type { Order, Refund } from '../core/orders-types';
import { Action } from '../core/remote';
import { refundAmountProblem } from './calculations/refunds';

type Field = 'amount' | 'reason';

export interface RefundResult {
  refunds: Refund[];
  /** The cancelled order, when the refund came with cancelling it. */
  order: Order | null;
}

let nextId = 0;

/**
 * Gives money back through the payment provider: everything refundable unless the person types
 * less, with a reason. When it comes with cancelling, the refund is asked first so a refused
 * amount leaves the order as it was; then the order is cancelled.
 */
@Component({
  selector: 'tw-refund-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, ErrorBanner, MoneyPipe],
  template: `
    <section class="panel" role="group" [class.cancelling]="cancelling()" [attr.aria-labelledby]="uid + '-title'">
      <h3 [id]="uid + '-title'">{{ cancelling() ? 'Cancel order ' + order().number + '?' : 'Refund the customer' }}</h3>
      <p class="lead">
        @if (cancelling()) {
          Cancelling cannot be undone. {{ refundableCents() | money: order().currency }} paid can go back to the customer’s card.
        } @else {
          Up to {{ refundableCents() | money: order().currency }} can go back to the customer’s card.
        }
      </p>
      @if (action.error(); as message) {
        <tw-error-banner [message]="message" />
      }
      <form (submit)="$event.preventDefault(); refund()" novalidate [attr.aria-labelledby]="uid + '-title'">
        <div class="fields">
          <mat-form-field appearance="outline" subscriptSizing="dynamic" [class.tw-invalid]="check.problem('amount')">
            <mat-label>Amount to refund ({{ order().currency.toUpperCase() }})</mat-label>
            <input matInput class="amount" inputmode="decimal" required [value]="amountText()" (input)="edit('amount', $event)" [attr.aria-invalid]="!!check.problem('amount')" />
            @if (check.problem('amount'); as problem) {
              <mat-hint class="tw-field-error">{{ problem }}</mat-hint>
            } @else {
              <mat-hint>Everything refundable unless you type less</mat-hint>
            }
          </mat-form-field>
          <mat-form-field appearance="outline" subscriptSizing="dynamic" class="reason" [class.tw-invalid]="check.problem('reason')">
            <mat-label>Reason</mat-label>
            <input matInput required maxlength="500" [value]="reason()" (input)="edit('reason', $event)" [attr.aria-invalid]="!!check.problem('reason')" />
            @if (check.problem('reason'); as problem) {
              <mat-hint class="tw-field-error">{{ problem }}</mat-hint>
            } @else {
              <mat-hint>Kept with the refund and the order’s history</mat-hint>
            }
          </mat-form-field>
        </div>
        <p class="tw-muted tw-small">The refund counts on the order once the payment provider confirms it, usually within seconds.</p>
        <div class="tw-actions">
          <button mat-flat-button type="submit" [class.danger-fill]="cancelling()" [disabled]="action.busy()">{{ submitText() }}</button>
          @if (cancelling()) {
            <button mat-button type="button" (click)="cancelOnly()" [disabled]="action.busy()">Cancel without a refund</button>
          }
          <button mat-button type="button" (click)="dismissed.emit()" [disabled]="action.busy()">{{ cancelling() ? 'Keep the order' : 'Close' }}</button>
        </div>
      </form>
    </section>
  `,
  styles: `
    :host { display: block; }
    .panel { margin: 12px 0; padding: 12px 16px; border-radius: var(--mat-sys-corner-medium, 12px); background: var(--mat-sys-surface-container); }
    .panel.cancelling { background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }
    h3 { margin: 0 0 4px; font: var(--mat-sys-title-small); }
    .lead { margin: 0 0 12px; }
    .fields { display: grid; grid-template-columns: minmax(160px, 220px) minmax(200px, 1fr); gap: 12px; margin-bottom: 8px; }
    @media (max-width: 600px) { .fields { grid-template-columns: 1fr; } }
    .danger-fill { --mat-button-filled-container-color: var(--mat-sys-error); --mat-button-filled-label-text-color: var(--mat-sys-on-error); }
  `,
})
export class RefundDialog {
  readonly order = input.required<Order>();
  readonly refundableCents = input.required<number>();
  /** The refund comes with cancelling the order (the stage list's Cancel order). */
  readonly cancelling = input(false);
  /** The note for the order's history when it is cancelled; the reason when empty. */
  readonly stageNote = input('');
  readonly done = output<RefundResult>();
  readonly dismissed = output<void>();

  private readonly api = inject(OrdersApi);
  protected readonly uid = `refund-${nextId++}`;
  protected readonly amountText = linkedSignal(() => centsToInput(this.refundableCents()));
  protected readonly reason = signal('');
  protected readonly action = new Action();
  protected readonly check = new FieldCheck<Field>({
    amount: computed(() => refundAmountProblem(this.amountText(), this.refundableCents(), this.order().currency)),
    reason: computed(() => (this.reason().trim() ? null : 'Give a reason for the refund')),
  });
  protected readonly submitText = computed(() => {
    if (this.action.busy()) return this.cancelling() ? 'Refunding and cancelling…' : 'Refunding…';
    const cents = parseMoneyToCents(this.amountText());
    const amount = cents === null ? '' : ` ${formatCents(cents, this.order().currency)}`;
    return this.cancelling() ? `Refund${amount} and cancel` : `Refund${amount}`;
  });
  /** Kept across retries of one refund, so a repeated press never refunds twice. */
  private refundKey = newIdempotencyKey();

  constructor() {
    const host: HTMLElement = inject(ElementRef).nativeElement;
    afterNextRender(() => host.querySelector<HTMLInputElement>('input.amount')?.focus());
  }

  protected edit(field: Field, event: Event): void {
    const text = (event.target as HTMLInputElement).value;
    (field === 'amount' ? this.amountText : this.reason).set(text);
    this.check.edited(field);
  }

  protected refund(): void {
    if (!this.check.ready()) return;
    const order = this.order();
    const reason = this.reason().trim();
    const body = { amountCents: parseMoneyToCents(this.amountText())!, reason };
    const refunds = this.api.post<{ items: Refund[] }>(`/orders/${order.id}/refunds`, body, { idempotencyKey: this.refundKey }).pipe(map((list) => list.items));
    const work: Observable<RefundResult> = this.cancelling()
      ? refunds.pipe(switchMap((made) => this.cancel(order, this.stageNote().trim() || reason).pipe(map((cancelled) => ({ refunds: made, order: cancelled })))))
      : refunds.pipe(map((made) => ({ refunds: made, order: null })));
    this.action.run(
      work,
      (result) => {
        this.refundKey = newIdempotencyKey();
        this.done.emit(result);
      },
      (error) => this.check.placeServerError(error, { amountCents: 'amount' }),
    );
  }

  protected cancelOnly(): void {
    const order = this.order();
    this.action.run(this.cancel(order, this.stageNote().trim()), (cancelled) => this.done.emit({ refunds: [], order: cancelled }));
  }

  private cancel(order: Order, note: string) {
    return this.api.post<Order>(`/orders/${order.id}/stage`, { stage: 'cancelled', note });
  }
}
