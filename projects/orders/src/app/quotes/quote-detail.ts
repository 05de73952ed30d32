import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner, Page, PageHeader, injectShellNavigate } from '@tubwright/kit';
import { DocumentOpener } from '../core/document-opener';
import { MoneyPipe } from '../core/money';
import { OrdersApi } from '../core/orders-api';
import type { MailLogEntry, Order, Quote } from '../core/orders-types';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { StatusChip } from '../core/status-chip';

interface DeliveryDraft {
  method: 'pickup' | 'delivery';
  date: string;
  address: string;
  notes: string;
}

const KIND_LABELS: Record<string, string> = { rack: 'Rack', item: 'Item', labor: 'Labor', delivery: 'Delivery', discount: 'Discount' };

/** One quote: lines and totals, its PDF, sending it, and recording the customer's answer. */
@Component({
  selector: 'tw-quote-detail',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PageHeader, ErrorBanner, MatButton, MatIcon, MatProgressBar, MatFormFieldModule, MatInput, ShellLink, StatusChip, MoneyPipe, DatePipe],
  templateUrl: './quote-detail.html',
  styleUrl: './quote-detail.scss',
})
export class QuoteDetail {
  readonly id = input.required<number>();

  private readonly api = inject(OrdersApi);
  private readonly navigate = injectShellNavigate();
  protected readonly documents = inject(DocumentOpener);
  protected readonly quote = remote(() => this.id(), (id) => this.api.get<Quote>(`/quotes/${id}`));
  protected readonly mail = remote(
    () => ({ id: this.id(), sent: this.quote.value()?.sentAt ?? null }),
    ({ id }) => this.api.get<Page<MailLogEntry>>('/mail-log', { entity: 'quote', entityId: id, sort: '-sentAt', limit: 20 }),
  );
  protected readonly action = new Action();
  protected readonly notice = signal<string | null>(null);
  protected readonly accepting = signal(false);
  protected readonly delivery = signal<DeliveryDraft>({ method: 'pickup', date: '', address: '', notes: '' });
  protected readonly kindLabel = (kind: string) => KIND_LABELS[kind] ?? kind;
  protected readonly open = computed(() => ['draft', 'sent'].includes(this.quote.value()?.status ?? ''));

  protected value(event: Event): string {
    return (event.target as HTMLInputElement).value;
  }

  protected setDelivery(change: Partial<DeliveryDraft>): void {
    this.delivery.update((d) => ({ ...d, ...change }));
  }

  protected pdf(quote: Quote): void {
    this.documents.open(`/quotes/${quote.id}/pdf`, `${quote.number}.pdf`);
  }

  protected send(quote: Quote): void {
    this.notice.set(null);
    this.action.run(this.api.post<Quote>(`/quotes/${quote.id}/send`, {}), (sent) => {
      this.quote.set(sent);
      this.notice.set(`Quote ${sent.number} was e-mailed to ${sent.customerName} with the PDF attached.`);
    });
  }

  protected decline(quote: Quote): void {
    this.notice.set(null);
    this.action.run(this.api.post<Quote>(`/quotes/${quote.id}/decline`, {}), (declined) => {
      this.quote.set(declined);
      this.notice.set(`Recorded that ${declined.customerName} declined.`);
    });
  }

  /** The customer said yes (by phone, in the shop): the quote becomes an order awaiting the deposit. */
  protected accept(quote: Quote): void {
    const d = this.delivery();
    const body = { deliveryMethod: d.method, deliveryDate: d.date || null, deliveryAddress: d.method === 'delivery' ? d.address : '', notes: d.notes };
    this.action.run(this.api.post<Order>(`/quotes/${quote.id}/accept`, body), (order) => this.navigate(`orders/${order.id}`));
  }
}
