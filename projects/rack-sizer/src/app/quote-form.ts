import { ChangeDetectionStrategy, Component, ElementRef, Injector, afterNextRender, computed, inject, input, signal, viewChild } from '@angular/core';
import { formatMoney } from './calculations/plan-summary';
import { SizerStore } from './sizer-store';

type ContactField = 'name' | 'email' | 'note' | 'consent';

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** Name, e-mail, note and consent: turns the sized rack into a draft quote in the shop's order book. */
@Component({
  selector: 'tw-quote-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  templateUrl: './quote-form.html',
})
export class QuoteForm {
  readonly showPrices = input(false);
  readonly currency = input('usd');

  private readonly store = inject(SizerStore);
  private readonly injector = inject(Injector);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  protected readonly state = this.store.quoteState;
  protected readonly hasPlan = computed(() => !!this.store.planState().plan && !!this.store.planState().spec);
  protected readonly open = signal(false);
  protected readonly name = signal('');
  protected readonly email = signal('');
  protected readonly note = signal('');
  protected readonly consent = signal(false);
  protected readonly tried = signal(false);
  protected readonly opener = viewChild<ElementRef<HTMLButtonElement>>('opener');

  /** The visitor's own mistakes, shown once they tried to send. */
  protected readonly errors = computed<Partial<Record<ContactField, string>>>(() => {
    const errors: Partial<Record<ContactField, string>> = {};
    if (!this.name().trim()) errors.name = 'Enter your name';
    if (!this.email().trim()) errors.email = 'Enter your e-mail address';
    else if (!EMAIL.test(this.email().trim())) errors.email = 'That does not look like an e-mail address';
    if (this.note().length > 2000) errors.note = 'At most 2000 characters';
    if (!this.consent()) errors.consent = 'Tick the box so the shop may answer you';
    return errors;
  });

  protected errorOf(field: ContactField): string | null {
    const state = this.state();
    if (state.status === 'editing' && state.field === field) return state.error;
    return this.tried() ? (this.errors()[field] ?? null) : null;
  }

  /** A server error that no field of this form explains. */
  protected readonly formError = computed(() => {
    const state = this.state();
    if (state.status !== 'editing' || !state.error) return null;
    return state.field && ['name', 'email', 'note', 'consent'].includes(state.field) ? null : state.error;
  });

  protected readonly receipt = computed(() => {
    const state = this.state();
    return state.status === 'sent' ? state.receipt : null;
  });
  /** Null when the shop hides prices (its widget settings) or this page does not show them. */
  protected readonly estimate = computed(() => {
    const estimate = this.receipt()?.estimate;
    return estimate && this.showPrices() ? formatMoney(estimate.totalCents / 100, estimate.currency) : null;
  });

  protected text(field: 'name' | 'email' | 'note', event: Event): void {
    this[field].set((event.target as HTMLInputElement | HTMLTextAreaElement).value);
  }

  protected checked(event: Event): void {
    this.consent.set((event.target as HTMLInputElement).checked);
  }

  protected show(): void {
    this.open.set(true);
    this.focusAfterRender('#quote-name');
  }

  protected cancel(): void {
    this.open.set(false);
    this.tried.set(false);
    this.store.newQuote();
    afterNextRender(() => this.opener()?.nativeElement.focus(), { injector: this.injector });
  }

  protected async submit(event: Event): Promise<void> {
    event.preventDefault();
    this.tried.set(true);
    const first = (['name', 'email', 'note', 'consent'] as const).find((f) => this.errors()[f]);
    if (first) {
      this.focusAfterRender(`#quote-${first}`);
      return;
    }
    await this.store.requestQuote({ name: this.name().trim(), email: this.email().trim(), note: this.note().trim() });
    this.focusAfterRender(this.state().status === 'sent' ? '#quote-done' : '#quote-name');
  }

  protected another(): void {
    this.note.set('');
    this.tried.set(false);
    this.open.set(false);
    this.store.newQuote();
    afterNextRender(() => this.opener()?.nativeElement.focus(), { injector: this.injector });
  }

  private focusAfterRender(selector: string): void {
    afterNextRender(() => this.host.querySelector<HTMLElement>(selector)?.focus(), { injector: this.injector });
  }
}
