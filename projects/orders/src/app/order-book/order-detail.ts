import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, Page, PageHeader } from '@tubwright/kit';
import { Subject, switchMap, take, takeWhile, timer } from 'rxjs';
import { DocumentOpener } from '../core/document-opener';
import { MoneyPipe, formatCents } from '../core/money';
import { OrdersApi, newIdempotencyKey } from '../core/orders-api';
import type { Invoice, InvoiceDetail, Order, OrderStatus, Payment, Refund } from '../core/orders-types';
import { paymentStatusLabel, refundStatusLabel, viaLabel } from '../core/payment-labels';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { StatusChip } from '../core/status-chip';
import { PRODUCTION_STAGES, moveLabel, statusLabel } from '../core/statuses';
import { refundableCents } from './calculations/refunds';
import { DoorwayCheck } from './doorway-check';
import { DoorwayHeight } from './doorway-height';
import { OrderStock } from './order-stock';
import { PaymentLink } from './payment-link';
import { RefundDialog, RefundResult } from './refund-dialog';

/** A payment or refunds the page waits on, and what to say once the provider has answered. */
interface Awaited {
  paymentId?: number;
  refundIds?: number[];
  done: string;
}

interface DeliveryEdit {
  deliveryMethod: 'pickup' | 'delivery';
  deliveryDate: string;
  deliveryAddress: string;
  notes: string;
}

/** How often and how long to read the order again while the provider's event is on its way. */
const SOON = { everyMs: 1500, times: 10 };
/** A customer on the payment page takes longer than a card at the counter. */
const CUSTOMER_PAYING = { everyMs: 4000, times: 45 };

/** One order: its stage and history, payments and refunds, the invoice, hand-over, doorway check and stock held for it. */
@Component({
  selector: 'tw-order-detail',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    PageHeader, ErrorBanner, MatButton, MatIcon, MatProgressBar, MatFormFieldModule, MatInput, ShellLink, StatusChip, MoneyPipe, DatePipe,
    DoorwayCheck, DoorwayHeight, OrderStock, PaymentLink, RefundDialog,
  ],
  templateUrl: './order-detail.html',
  styleUrl: './order-detail.scss',
})
export class OrderDetail {
  readonly id = input.required<number>();

  private readonly api = inject(OrdersApi);
  protected readonly documents = inject(DocumentOpener);
  private readonly role = inject(AuthSession).role;
  protected readonly sells = computed(() => this.role() === 'owner' || this.role() === 'sales');
  /** Owner and builders hold stock for orders; sales see what is held. */
  protected readonly holdsStock = computed(() => this.role() === 'owner' || this.role() === 'builder');

  protected readonly order = remote(() => this.id(), (id) => this.api.get<Order>(`/orders/${id}`));
  /** Reloaded with the order: a payment, refund or stage change moves them all. */
  private readonly moneyKey = computed(() => (this.sells() && this.order.value() ? { id: this.id(), at: this.order.value()!.updatedAt } : null));
  protected readonly payments = remote(() => this.moneyKey(), ({ id }) => this.api.get<{ items: Payment[] }>(`/orders/${id}/payments`));
  protected readonly refunds = remote(() => this.moneyKey(), ({ id }) => this.api.get<{ items: Refund[] }>(`/orders/${id}/refunds`));
  protected readonly invoices = remote(() => this.moneyKey(), ({ id }) => this.api.get<Page<Invoice>>('/invoices', { orderId: id, limit: 10 }));

  protected readonly stageAction = new Action();
  protected readonly payAction = new Action();
  protected readonly invoiceAction = new Action();
  protected readonly deliveryAction = new Action();
  protected readonly stageNote = signal('');
  protected readonly confirmingCancel = signal(false);
  /** The refund panel: on its own (Refund…) or with cancelling the order. */
  protected readonly refunding = signal<'refund' | 'cancel' | null>(null);
  protected readonly editingDelivery = signal(false);
  protected readonly delivery = signal<DeliveryEdit>({ deliveryMethod: 'pickup', deliveryDate: '', deliveryAddress: '', notes: '' });
  protected readonly notice = signal<string | null>(null);
  private paymentKey = newIdempotencyKey();

  protected readonly label = statusLabel;
  protected readonly moveLabel = moveLabel;
  protected readonly viaLabel = viaLabel;
  protected readonly paymentText = paymentStatusLabel;
  protected readonly refundText = refundStatusLabel;
  /** Forward moves this role may make; cancelling has its own, guarded button. */
  protected readonly moves = computed(() => {
    const order = this.order.value();
    if (!order) return [];
    const forward = order.nextStages.filter((s) => s !== 'cancelled');
    return this.sells() ? forward : forward.filter((s) => PRODUCTION_STAGES.includes(s));
  });
  protected readonly canCancel = computed(() => this.sells() && !!this.order.value()?.nextStages.includes('cancelled'));
  protected readonly pending = computed(() => this.payments.value()?.items.find((p) => p.status === 'pending') ?? null);
  protected readonly depositOutstanding = computed(() => {
    const o = this.order.value();
    return o ? Math.max(0, o.depositDueCents - o.paidCents) : 0;
  });
  /** Known only once the refunds are read: until then nothing is offered. */
  protected readonly refundable = computed(() => {
    const o = this.order.value();
    const refunds = this.refunds.value();
    return o && refunds ? refundableCents(o.paidCents, refunds.items) : 0;
  });
  protected readonly refundsUnderWay = computed(() => !!this.refunds.value()?.items.some((r) => r.status === 'pending'));
  private readonly awaiting = computed(() => !!this.pending() || this.refundsUnderWay());
  protected readonly invoice = computed(() => this.invoices.value()?.items[0] ?? null);
  protected readonly inProduction = computed(() => ['cutting', 'assembly', 'wiring', 'testing', 'ready', 'deposit_paid'].includes(this.order.value()?.status ?? ''));

  /** Each start replaces the previous watch; it stops once nothing waits for the provider. */
  private readonly watch = new Subject<{ everyMs: number; times: number }>();
  private readonly awaited = signal<Awaited | null>(null);

  constructor() {
    // The notice follows the provider's answer, so "asked" turns into "paid" or "refunded" on its own.
    effect(() => {
      const awaited = this.awaited();
      if (!awaited) return;
      if (awaited.paymentId !== undefined) {
        const payment = this.payments.value()?.items.find((p) => p.id === awaited.paymentId);
        if (!payment || payment.status === 'pending') return;
        this.notice.set(payment.status === 'succeeded' ? awaited.done : `The payment is ${payment.status}${payment.failureMessage ? `: ${payment.failureMessage}` : ''}.`);
      } else {
        const ids = awaited.refundIds ?? [];
        const refunds = this.refunds.value()?.items.filter((r) => ids.includes(r.id)) ?? [];
        if (refunds.length < ids.length || refunds.some((r) => r.status === 'pending')) return;
        this.notice.set(refunds.every((r) => r.status === 'succeeded') ? awaited.done : 'The payment provider refused the refund: nothing went back. Try again, or refund the customer another way.');
      }
      this.awaited.set(null);
    });

    this.watch
      .pipe(
        switchMap(({ everyMs, times }) => timer(everyMs, everyMs).pipe(take(times), takeWhile(() => this.awaiting()))),
        takeUntilDestroyed(),
      )
      .subscribe(() => this.order.reload());
  }

  protected value(event: Event): string {
    return (event.target as HTMLInputElement).value;
  }

  protected move(order: Order, stage: OrderStatus): void {
    this.notice.set(null);
    this.stageAction.run(this.api.post<Order>(`/orders/${order.id}/stage`, { stage, note: this.stageNote().trim() }), (moved) => {
      this.order.set(moved);
      this.stageNote.set('');
      this.confirmingCancel.set(false);
      this.notice.set(`Order ${moved.number} is now ${statusLabel(moved.status).toLowerCase()}.`);
    });
  }

  /** Cancelling an order that holds money offers the refund with it. */
  protected askCancel(): void {
    this.notice.set(null);
    if (this.refundable() > 0) this.refunding.set('cancel');
    else this.confirmingCancel.set(true);
  }

  protected askPayment(order: Order, kind: 'deposit' | 'balance', via: 'card' | 'checkout'): void {
    this.notice.set(null);
    this.payAction.run(this.api.post<Payment>(`/orders/${order.id}/payments`, { kind, via }, { idempotencyKey: this.paymentKey }), (payment) => {
      this.paymentKey = newIdempotencyKey();
      this.payments.reload();
      if (via === 'checkout') {
        const amount = formatCents(payment.amountCents, payment.currency);
        this.notice.set(`A payment page for the ${amount} ${kind} is ready: send the link to ${order.customerName}.`);
        this.awaited.set({ paymentId: payment.id, done: `${order.customerName} paid the ${amount} ${kind} on the payment page.` });
        this.watch.next(CUSTOMER_PAYING);
      }
    });
  }

  /**
   * Demo only: the local stand-in charges a test card. The payment turns paid when the
   * provider's signed event reaches the records service, so the order is read again after.
   */
  protected payWithTestCard(payment: Payment, paymentMethod: 'pm_card_visa' | 'pm_card_chargeDeclined'): void {
    this.notice.set(null);
    this.payAction.run(this.api.post<Payment>(`/payments/${payment.id}/confirm`, { paymentMethod }), (confirmed) => {
      this.order.reload();
      this.payments.reload();
      this.notice.set(confirmed.status === 'succeeded' ? 'The payment went through.' : `The payment is ${confirmed.status}.`);
      if (confirmed.status === 'pending') {
        this.awaited.set({ paymentId: confirmed.id, done: 'The payment went through.' });
        this.watch.next(SOON);
      }
    });
  }

  /** Closes an unpaid payment at the provider (a link sent by mistake), so the order can be paid another way. */
  protected withdraw(payment: Payment): void {
    this.notice.set(null);
    this.payAction.run(this.api.post<Payment>(`/payments/${payment.id}/cancel`, {}), (closed) => {
      this.order.reload();
      this.payments.reload();
      this.notice.set(closed.status === 'canceled' ? 'The payment was withdrawn; nothing was charged.' : `The payment is ${closed.status}.`);
    });
  }

  /** Reads the order again now, and for a little while, for a provider's event still on its way. */
  protected checkAgain(): void {
    this.order.reload();
    this.watch.next(SOON);
  }

  protected refunded(result: RefundResult): void {
    this.refunding.set(null);
    if (result.order) {
      this.order.set(result.order);
      this.stageNote.set('');
    } else {
      this.order.reload();
    }
    const order = this.order.value()!;
    const total = result.refunds.reduce((sum, r) => sum + r.amountCents, 0);
    const cancelled = result.order ? `Order ${order.number} is cancelled. ` : '';
    this.notice.set(
      total > 0
        ? `${cancelled}A refund of ${formatCents(total, order.currency)} was asked of the payment provider; it counts once the provider confirms it.`
        : `${cancelled}Nothing was refunded.`,
    );
    if (total > 0) {
      this.awaited.set({ refundIds: result.refunds.map((r) => r.id), done: `${cancelled}The payment provider confirmed the refund of ${formatCents(total, order.currency)}.` });
      this.watch.next(SOON);
    }
  }

  protected issueInvoice(order: Order): void {
    this.notice.set(null);
    this.invoiceAction.run(this.api.post<InvoiceDetail>(`/orders/${order.id}/invoices`, {}), (invoice) => {
      this.invoices.reload();
      this.notice.set(`Invoice ${invoice.number} was issued and e-mailed to ${invoice.customerName}.`);
    });
  }

  protected openInvoice(invoice: Invoice): void {
    this.documents.open(`/invoices/${invoice.id}/pdf`, `${invoice.number}.pdf`);
  }

  protected editDelivery(order: Order): void {
    this.delivery.set({ deliveryMethod: order.deliveryMethod, deliveryDate: order.deliveryDate ?? '', deliveryAddress: order.deliveryAddress, notes: order.notes });
    this.editingDelivery.set(true);
  }

  protected setDelivery(change: Partial<DeliveryEdit>): void {
    this.delivery.update((d) => ({ ...d, ...change }));
  }

  protected saveDelivery(order: Order): void {
    const d = this.delivery();
    const body = { deliveryMethod: d.deliveryMethod, deliveryDate: d.deliveryDate || null, deliveryAddress: d.deliveryAddress, notes: d.notes };
    this.deliveryAction.run(this.api.patch<Order>(`/orders/${order.id}`, body), (changed) => {
      this.order.set(changed);
      this.editingDelivery.set(false);
    });
  }
}
