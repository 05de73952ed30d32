import { CurrencyPipe, DatePipe, DOCUMENT } from '@angular/common';
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, input, signal } from '@angular/core';
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
  orderStatus: string | null;
  paidCents: number;
  depositDueNowCents: number;
}

/** After the provider's page sends the customer back, its event may take a moment: ask again this often, this many times. */
const CONFIRM_POLL_MS = 1500;
const CONFIRM_POLLS = 20;

/**
 * `/quote/:token`: the page a customer opens from the quote's e-mail, with no account, to accept or
 * decline, and then to pay the deposit on the payment provider's page. Coming back from there
 * (`?payment=received`) proves nothing: the page waits for the shop to hear from the provider.
 */
@Component({
  selector: 'tw-customer-quote',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [CurrencyPipe, DatePipe, FormsModule, MatButton, MatProgressSpinner, ErrorBanner],
  templateUrl: './customer-quote.html',
  styleUrl: './customer-quote.scss',
})
export class CustomerQuotePage {
  readonly token = input.required<string>();
  /** Set by the payment provider's return links: `received` or `cancelled`. */
  readonly payment = input<string | undefined>();

  private readonly http = inject(HttpClient);
  private readonly document = inject(DOCUMENT);
  private pollTimer: ReturnType<typeof setTimeout> | undefined;
  protected readonly confirming = signal(false);
  /** How long to wait between asks while confirming (shorter in tests). */
  protected pollMs = CONFIRM_POLL_MS;
  protected readonly quote = signal<CustomerQuote | null>(null);
  protected readonly failure = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected delivery: 'pickup' | 'delivery' = 'pickup';
  protected address = '';
  protected readonly currency = computed(() => (this.quote()?.currency ?? 'usd').toUpperCase());
  protected readonly open = computed(() => this.quote()?.status === 'sent');

  private readonly url = computed(() => `${API_BASE}/quote-links/${encodeURIComponent(this.token())}`);

  constructor() {
    effect(() => this.load(this.payment() === 'received' ? CONFIRM_POLLS : 0));
    inject(DestroyRef).onDestroy(() => clearTimeout(this.pollTimer));
  }

  private load(pollsLeft: number): void {
    this.http.get<CustomerQuote>(this.url()).subscribe({
      next: (q) => {
        this.quote.set(q);
        const waiting = pollsLeft > 0 && q.depositDueNowCents > 0;
        this.confirming.set(waiting);
        if (waiting) this.pollTimer = setTimeout(() => this.load(pollsLeft - 1), this.pollMs);
      },
      error: (e: unknown) => this.failure.set(describeApiError(toApiError(e))),
    });
  }

  /** Leaves the console for the provider's page (a seam for tests). */
  protected leaveFor(url: string): void {
    this.document.location.assign(url);
  }

  /** Opens the payment provider's page for the deposit still due. */
  protected payDeposit(): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.failure.set(null);
    this.http.post<{ checkoutUrl: string }>(`${this.url()}/pay`, {}).subscribe({
      next: ({ checkoutUrl }) => this.leaveFor(checkoutUrl),
      error: (e: unknown) => {
        this.busy.set(false);
        this.failure.set(describeApiError(toApiError(e)));
      },
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
