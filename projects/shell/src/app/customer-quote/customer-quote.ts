import { CurrencyPipe, DatePipe } from '@angular/common';
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatProgressSpinner } from '@angular/material/progress-spinner';
import { API_BASE, ErrorBanner, describeApiError, toApiError } from '@tubwright/kit';

interface CustomerQuote {
  number: string;
  shop: string;
  customerName: string;
  status: 'draft' | 'sent' | 'accepted' | 'declined' | 'expired';
  validUntil: string;
  currency: string;
  lines: { description: string; quantity: number; unitPriceCents: number; amountCents: number }[];
  itemsCents: number;
  discountCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
  orderNumber: string | null;
}

/** `/quote/:token`: the page a customer opens from the quote's e-mail, with no account, to accept or decline. */
@Component({
  selector: 'tw-customer-quote',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [CurrencyPipe, DatePipe, FormsModule, MatButton, MatProgressSpinner, ErrorBanner],
  templateUrl: './customer-quote.html',
  styleUrl: './customer-quote.scss',
})
export class CustomerQuotePage {
  readonly token = input.required<string>();

  private readonly http = inject(HttpClient);
  protected readonly quote = signal<CustomerQuote | null>(null);
  protected readonly failure = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected delivery: 'pickup' | 'delivery' = 'pickup';
  protected address = '';
  protected readonly currency = computed(() => (this.quote()?.currency ?? 'usd').toUpperCase());
  protected readonly open = computed(() => this.quote()?.status === 'sent');

  private readonly url = computed(() => `${API_BASE}/quote-links/${encodeURIComponent(this.token())}`);

  constructor() {
    effect(() => {
      this.http.get<CustomerQuote>(this.url()).subscribe({ next: (q) => this.quote.set(q), error: (e: unknown) => this.failure.set(describeApiError(toApiError(e))) });
    });
  }

  protected accept(): void {
    this.decide('accept', { deliveryMethod: this.delivery, deliveryAddress: this.delivery === 'delivery' ? this.address.trim() : '' });
  }

  protected decline(): void {
    this.decide('decline', {});
  }

  private decide(what: 'accept' | 'decline', body: object): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.failure.set(null);
    this.http.post<CustomerQuote>(`${this.url()}/${what}`, body).subscribe({
      next: (q) => {
        this.busy.set(false);
        this.quote.set(q);
      },
      error: (e: unknown) => {
        this.busy.set(false);
        this.failure.set(describeApiError(toApiError(e)));
      },
    });
  }
}
