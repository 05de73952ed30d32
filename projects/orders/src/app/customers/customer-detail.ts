import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner, Page, PageHeader } from '@tubwright/kit';
import { forkJoin, map, of } from 'rxjs';
import { MoneyPipe } from '../core/money';
import { OrdersApi } from '../core/orders-api';
import type { MailLogEntry, OrderSummary, Payment, QuoteSummary } from '../core/orders-types';
import { paymentStatusLabel, viaLabel } from '../core/payment-labels';
import { remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { StatusChip } from '../core/status-chip';
import { Customer, placeOf, sourceLabel } from './customer';

type PaymentRow = Payment & { orderNumber: string };

const RECENT = { limit: 50, offset: 0 };

/** One customer with everything the shop has exchanged with them: quotes, orders, payments and mail. */
@Component({
  selector: 'tw-customer-detail',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PageHeader, ErrorBanner, MatButton, MatIcon, MatProgressBar, ShellLink, StatusChip, MoneyPipe, DatePipe],
  templateUrl: './customer-detail.html',
  styleUrl: './customer-detail.scss',
})
export class CustomerDetail {
  readonly id = input.required<number>();

  private readonly api = inject(OrdersApi);
  protected readonly customer = remote(() => this.id(), (id) => this.api.get<Customer>(`/customers/${id}`));
  protected readonly quotes = remote(() => this.id(), (customerId) =>
    this.api.get<Page<QuoteSummary>>('/quotes', { ...RECENT, sort: '-createdAt', customerId }),
  );
  protected readonly orders = remote(() => this.id(), (customerId) =>
    this.api.get<Page<OrderSummary>>('/orders', { ...RECENT, sort: '-createdAt', customerId }),
  );
  protected readonly mail = remote(() => this.id(), (customerId) =>
    this.api.get<Page<MailLogEntry>>('/mail-log', { ...RECENT, sort: '-sentAt', customerId }),
  );
  /** Payments hang off orders: one request per order shown (a customer has a handful). */
  protected readonly payments = remote(
    () => this.orders.value()?.items ?? null,
    (orders) =>
      orders.length === 0
        ? of<PaymentRow[]>([])
        : forkJoin(
            orders.map((order) =>
              this.api.get<{ items: Payment[] }>(`/orders/${order.id}/payments`).pipe(map((page) => page.items.map((p) => ({ ...p, orderNumber: order.number })))),
            ),
          ).pipe(map((lists) => lists.flat().sort((a, b) => b.createdAt.localeCompare(a.createdAt)))),
  );
  protected readonly place = computed(() => {
    const c = this.customer.value();
    return c ? placeOf(c) : '';
  });
  protected readonly loadError = computed(
    () => this.customer.error() ?? this.quotes.error() ?? this.orders.error() ?? this.payments.error() ?? this.mail.error(),
  );

  protected readonly sourceLabel = sourceLabel;
  protected readonly viaLabel = viaLabel;
  protected readonly paymentLabel = paymentStatusLabel;

  protected mailKind(kind: string): string {
    const words = kind.replace(/_/g, ' ');
    return words.charAt(0).toUpperCase() + words.slice(1);
  }
}
