import { ChangeDetectionStrategy, Component, WritableSignal, computed, effect, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, PageHeader } from '@tubwright/kit';
import { FieldCheck, percentProblem, wholeProblem } from '../core/field-check';
import { MoneyPipe, centsToInput, parseMoneyToCents } from '../core/money';
import { OrdersApi } from '../core/orders-api';
import type { OrderSettings } from '../core/orders-types';
import { Action, remote } from '../core/remote';

type Field = 'taxRatePercent' | 'depositPercent' | 'deliveryFee' | 'quoteValidDays' | 'invoiceDueDays';

/** Tax rate, deposit, delivery fee and validity: the owner changes them, sales read them. */
@Component({
  selector: 'tw-order-settings-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, MatProgressBar, ErrorBanner, PageHeader, MoneyPipe],
  template: `
    <tw-page-header heading="Order settings" subheading="Applied to new quotes and to drafts when they are saved; sent quotes keep their rates." />
    @if (settings.loading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading the settings" />
    }
    @if (settings.error() ?? save.error(); as message) {
      <tw-error-banner [message]="message" />
    }
    @if (saved()) {
      <p class="tw-status" role="status">Settings saved.</p>
    }
    @if (settings.value(); as s) {
      @if (isOwner()) {
        <form class="tw-card" (submit)="$event.preventDefault(); submit()" novalidate aria-label="Order settings">
          <div class="tw-fields">
            @for (f of fields; track f.field) {
              <mat-form-field appearance="outline" subscriptSizing="dynamic" [class.tw-invalid]="check.problem(f.field)">
                <mat-label>{{ f.field === 'deliveryFee' ? 'Delivery fee (' + s.currency.toUpperCase() + ')' : f.label }}</mat-label>
                <input matInput inputmode="decimal" required [value]="values[f.field]()" (input)="set(f.field, $event)" [attr.aria-invalid]="!!check.problem(f.field)" />
                @if (check.problem(f.field); as problem) {
                  <mat-hint class="tw-field-error">{{ problem }}</mat-hint>
                } @else {
                  <mat-hint>{{ f.hint }}</mat-hint>
                }
              </mat-form-field>
            }
          </div>
          <div class="tw-actions">
            <button mat-flat-button type="submit" [disabled]="save.busy() || !changed()">{{ save.busy() ? 'Saving…' : 'Save settings' }}</button>
          </div>
        </form>
      } @else {
        <section class="tw-card" aria-label="Order settings">
          <dl class="tw-facts">
            <dt>Sales tax</dt>
            <dd>{{ s.taxRatePercent }} %, rounded half-up to the cent</dd>
            <dt>Deposit</dt>
            <dd>{{ s.depositPercent }} % of the total</dd>
            <dt>Delivery fee</dt>
            <dd>{{ s.deliveryFeeCents | money: s.currency }}</dd>
            <dt>Quotes valid for</dt>
            <dd>{{ s.quoteValidDays }} days</dd>
            <dt>Invoices due after</dt>
            <dd>{{ s.invoiceDueDays }} days</dd>
          </dl>
          <p class="tw-muted tw-small">Only the owner changes these.</p>
        </section>
      }
    }
  `,
})
export class OrderSettingsPage {
  private readonly api = inject(OrdersApi);
  private readonly role = inject(AuthSession).role;
  protected readonly isOwner = computed(() => this.role() === 'owner');
  protected readonly settings = remote(() => true, () => this.api.get<OrderSettings>('/order-settings'));
  protected readonly save = new Action();
  protected readonly saved = signal(false);
  protected readonly values: Record<Field, WritableSignal<string>> = {
    taxRatePercent: signal(''),
    depositPercent: signal(''),
    deliveryFee: signal(''),
    quoteValidDays: signal(''),
    invoiceDueDays: signal(''),
  };
  protected readonly fields: Array<{ field: Field; label: string; hint: string }> = [
    { field: 'taxRatePercent', label: 'Sales tax (%)', hint: 'Rounded half-up to the cent (common practice)' },
    { field: 'depositPercent', label: 'Deposit (%)', hint: 'Asked when a quote is accepted' },
    { field: 'deliveryFee', label: 'Delivery fee', hint: 'For a delivery line without its own price' },
    { field: 'quoteValidDays', label: 'Quotes valid for (days)', hint: 'From the day a quote is made' },
    { field: 'invoiceDueDays', label: 'Invoices due after (days)', hint: 'From the day an invoice is issued' },
  ];
  protected readonly check = new FieldCheck<Field>({
    taxRatePercent: computed(() => percentProblem(this.values.taxRatePercent())),
    depositPercent: computed(() => percentProblem(this.values.depositPercent())),
    deliveryFee: computed(() => (parseMoneyToCents(this.values.deliveryFee()) === null ? 'Enter an amount like 45 or 45.50' : null)),
    quoteValidDays: computed(() => wholeProblem(this.values.quoteValidDays(), 1, 365, 'days')),
    invoiceDueDays: computed(() => wholeProblem(this.values.invoiceDueDays(), 0, 365, 'days')),
  });
  private readonly loaded = signal<Record<Field, string> | null>(null);
  protected readonly changed = computed(() => {
    const loaded = this.loaded();
    return !loaded || (Object.keys(loaded) as Field[]).some((f) => loaded[f] !== this.values[f]());
  });

  constructor() {
    effect(() => {
      const s = this.settings.value();
      if (!s) return;
      const texts: Record<Field, string> = {
        taxRatePercent: String(s.taxRatePercent),
        depositPercent: String(s.depositPercent),
        deliveryFee: centsToInput(s.deliveryFeeCents),
        quoteValidDays: String(s.quoteValidDays),
        invoiceDueDays: String(s.invoiceDueDays),
      };
      for (const f of Object.keys(texts) as Field[]) this.values[f].set(texts[f]);
      this.loaded.set(texts);
    });
  }

  protected set(field: Field, event: Event): void {
    this.values[field].set((event.target as HTMLInputElement).value);
    this.check.edited(field);
    this.saved.set(false);
  }

  protected submit(): void {
    this.saved.set(false);
    if (!this.check.ready()) return;
    const v = this.values;
    const body = {
      taxRatePercent: Number(v.taxRatePercent()),
      depositPercent: Number(v.depositPercent()),
      deliveryFeeCents: parseMoneyToCents(v.deliveryFee()),
      quoteValidDays: Number(v.quoteValidDays()),
      invoiceDueDays: Number(v.invoiceDueDays()),
    };
    this.save.run(
      this.api.patch<OrderSettings>('/order-settings', body),
      (changed) => {
        this.settings.set(changed);
        this.saved.set(true);
      },
      (error) => this.check.placeServerError(error, { deliveryFeeCents: 'deliveryFee' }),
    );
  }
}
