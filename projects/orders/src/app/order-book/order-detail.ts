import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, Page, PageHeader } from '@tubwright/kit';
import { DocumentOpener } from '../core/document-opener';
import { MoneyPipe } from '../core/money';
import { OrdersApi, newIdempotencyKey } from '../core/orders-api';
import type { Invoice, InvoiceDetail, Order, OrderStatus, Payment } from '../core/orders-types';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { StatusChip } from '../core/status-chip';
import { PRODUCTION_STAGES, moveLabel, statusLabel } from '../core/statuses';
import { DoorwayCheck } from './doorway-check';

interface DeliveryEdit {
  deliveryMethod: 'pickup' | 'delivery';
  deliveryDate: string;
  deliveryAddress: string;
  notes: string;
}

/** One order: its stage and history, the deposit and balance, the invoice, hand-over details and the doorway check. */
@Component({
  selector: 'tw-order-detail',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PageHeader, ErrorBanner, MatButton, MatIcon, MatProgressBar, MatFormFieldModule, MatInput, ShellLink, StatusChip, MoneyPipe, DatePipe, DoorwayCheck],
  templateUrl: './order-detail.html',
  styleUrl: './order-detail.scss',
})
export class OrderDetail {
  readonly id = input.required<number>();

  private readonly api = inject(OrdersApi);
  protected readonly documents = inject(DocumentOpener);
  private readonly role = inject(AuthSession).role;
  protected readonly sells = computed(() => this.role() === 'owner' || this.role() === 'sales');

  protected readonly order = remote(() => this.id(), (id) => this.api.get<Order>(`/orders/${id}`));
  /** Reloaded with the order: a payment or stage change moves both. */
  private readonly moneyKey = computed(() => (this.sells() && this.order.value() ? { id: this.id(), at: this.order.value()!.updatedAt } : null));
  protected readonly payments = remote(() => this.moneyKey(), ({ id }) => this.api.get<{ items: Payment[] }>(`/orders/${id}/payments`));
  protected readonly invoices = remote(() => this.moneyKey(), ({ id }) => this.api.get<Page<Invoice>>('/invoices', { orderId: id, limit: 10 }));

  protected readonly stageAction = new Action();
  protected readonly payAction = new Action();
  protected readonly invoiceAction = new Action();
  protected readonly deliveryAction = new Action();
  protected readonly stageNote = signal('');
  protected readonly confirmingCancel = signal(false);
  protected readonly editingDelivery = signal(false);
  protected readonly delivery = signal<DeliveryEdit>({ deliveryMethod: 'pickup', deliveryDate: '', deliveryAddress: '', notes: '' });
  protected readonly notice = signal<string | null>(null);
  private paymentKey = newIdempotencyKey();

  protected readonly label = statusLabel;
  protected readonly moveLabel = moveLabel;
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
  protected readonly invoice = computed(() => this.invoices.value()?.items[0] ?? null);
  protected readonly inProduction = computed(() => ['cutting', 'assembly', 'wiring', 'testing', 'ready', 'deposit_paid'].includes(this.order.value()?.status ?? ''));

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

  protected askPayment(order: Order, kind: 'deposit' | 'balance'): void {
    this.notice.set(null);
    this.payAction.run(this.api.post<Payment>(`/orders/${order.id}/payments`, { kind }, { idempotencyKey: this.paymentKey }), () => {
      this.paymentKey = newIdempotencyKey();
      this.payments.reload();
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
    });
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

  protected paymentText(payment: Payment): string {
    return payment.status === 'succeeded' ? 'Paid' : payment.status.charAt(0).toUpperCase() + payment.status.slice(1);
  }
}
