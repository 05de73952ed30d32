import { ChangeDetectionStrategy, Component, WritableSignal, computed, effect, inject, input, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner, PageHeader, injectShellNavigate } from '@tubwright/kit';
import { EMAIL, FieldCheck, required } from '../core/field-check';
import { OrdersApi } from '../core/orders-api';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { CUSTOMER_SOURCES, Customer, SOURCE_LABELS } from './customer';

type Field = 'name' | 'email' | 'phone' | 'city' | 'region' | 'address' | 'source' | 'notes';
/** Fields typed as several lines. */
const MULTI_LINE: readonly Field[] = ['address', 'notes'];

/** Adds a customer or changes one; the server's complaints land on the field they concern. */
@Component({
  selector: 'tw-customer-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, MatIcon, MatProgressBar, ErrorBanner, PageHeader, ShellLink],
  template: `
    <a class="tw-back" [twLink]="backPath()"><mat-icon aria-hidden="true">arrow_back</mat-icon>{{ id() ? 'Back to the customer' : 'Customers' }}</a>
    <tw-page-header [heading]="id() ? 'Change ' + (customer.value()?.name ?? 'customer') : 'New customer'" />
    @if (customer.loading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading the customer" />
    }
    @if (customer.error() ?? save.error(); as message) {
      <tw-error-banner [message]="message" />
    }
    <form class="tw-card" (submit)="$event.preventDefault(); submit()" novalidate aria-label="Customer">
      <div class="tw-fields">
        @for (f of textFields; track f.field) {
          <mat-form-field appearance="outline" subscriptSizing="dynamic" [class.tw-invalid]="check.problem(f.field)" [class.tw-wide]="multiLine(f.field)">
            <mat-label>{{ f.label }}</mat-label>
            @if (f.field === 'source') {
              <select matNativeControl (change)="set(f.field, $event)" [attr.aria-invalid]="!!check.problem(f.field)">
                @for (s of sources; track s) {
                  <option [value]="s" [selected]="values.source() === s">{{ sourceLabels[s] }}</option>
                }
              </select>
            } @else if (multiLine(f.field)) {
              <textarea
                matInput
                rows="3"
                [attr.maxlength]="f.max"
                [value]="values[f.field]()"
                (input)="set(f.field, $event)"
                [attr.aria-invalid]="!!check.problem(f.field)"
                [attr.autocomplete]="f.field === 'address' ? 'street-address' : 'off'"
              ></textarea>
            } @else {
              <input
                matInput
                [type]="f.type"
                [attr.maxlength]="f.max"
                [required]="f.required"
                [value]="values[f.field]()"
                (input)="set(f.field, $event)"
                [attr.aria-invalid]="!!check.problem(f.field)"
                autocomplete="off"
              />
            }
            @if (check.problem(f.field); as problem) {
              <mat-hint class="tw-field-error">{{ problem }}</mat-hint>
            } @else if (f.hint) {
              <mat-hint>{{ f.hint }}</mat-hint>
            }
          </mat-form-field>
        }
      </div>
      <div class="tw-actions">
        <button mat-flat-button type="submit" [disabled]="save.busy()">{{ save.busy() ? 'Saving…' : id() ? 'Save changes' : 'Add customer' }}</button>
        <a mat-button [twLink]="backPath()">Cancel</a>
      </div>
    </form>
  `,
})
export class CustomerForm {
  readonly id = input<number | null>(null);

  private readonly api = inject(OrdersApi);
  private readonly navigate = injectShellNavigate();
  protected readonly customer = remote(() => this.id(), (id) => this.api.get<Customer>(`/customers/${id}`));
  protected readonly save = new Action();
  protected readonly values: Record<Field, WritableSignal<string>> = {
    name: signal(''),
    email: signal(''),
    phone: signal(''),
    city: signal(''),
    region: signal(''),
    address: signal(''),
    source: signal('walk-in'),
    notes: signal(''),
  };
  protected readonly textFields: Array<{ field: Field; label: string; type: string; max: number; required: boolean; hint: string }> = [
    { field: 'name', label: 'Name', type: 'text', max: 160, required: true, hint: '' },
    { field: 'email', label: 'E-mail', type: 'email', max: 200, required: true, hint: 'Quotes and notices go here' },
    { field: 'phone', label: 'Phone', type: 'tel', max: 40, required: false, hint: '' },
    { field: 'city', label: 'City', type: 'text', max: 120, required: false, hint: '' },
    { field: 'region', label: 'State or region', type: 'text', max: 120, required: false, hint: '' },
    { field: 'source', label: 'How they found the shop', type: 'text', max: 40, required: false, hint: '' },
    { field: 'address', label: 'Address', type: 'text', max: 500, required: false, hint: 'Street, town and postcode, for delivery and invoices' },
    { field: 'notes', label: 'Notes', type: 'text', max: 4000, required: false, hint: 'Doorway or stair limits, colour wishes' },
  ];
  private readonly none = computed(() => null);
  protected readonly check = new FieldCheck<Field>({
    name: required(this.values.name, 'Enter a name'),
    email: computed(() => (!this.values.email().trim() ? 'Enter an e-mail address' : EMAIL.test(this.values.email().trim()) ? null : 'That does not look like an e-mail address')),
    phone: this.none,
    city: this.none,
    region: this.none,
    address: this.none,
    source: this.none,
    notes: this.none,
  });
  protected readonly sources = CUSTOMER_SOURCES;
  protected readonly sourceLabels = SOURCE_LABELS;
  protected readonly multiLine = (field: Field) => MULTI_LINE.includes(field);

  constructor() {
    effect(() => {
      const c = this.customer.value();
      if (!c) return;
      for (const field of Object.keys(this.values) as Field[]) this.values[field].set(c[field]);
    });
  }

  protected set(field: Field, event: Event): void {
    this.values[field].set((event.target as HTMLInputElement).value);
    this.check.edited(field);
  }

  protected backPath(): string {
    return this.id() ? `customers/${this.id()}` : 'customers';
  }

  protected submit(): void {
    if (!this.check.ready()) return;
    // Notes keep the person's spacing; the address keeps its lines but not stray blanks around them.
    const body = Object.fromEntries(
      (Object.keys(this.values) as Field[]).map((f) => [f, f === 'notes' ? this.values[f]() : f === 'address' ? tidyLines(this.values[f]()) : this.values[f]().trim()]),
    );
    const id = this.id();
    const request = id ? this.api.patch<Customer>(`/customers/${id}`, body) : this.api.post<Customer>('/customers', body);
    this.save.run(
      request,
      (saved) => this.navigate(`customers/${saved.id}`, { replace: !!id }),
      (error) => this.check.placeServerError(error),
    );
  }
}

/** Lines trimmed, blank lines dropped: `  12 Elm St \n\n Fresno ` → `12 Elm St\nFresno`. */
export function tidyLines(text: string): string {
  return text
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter(Boolean)
    .join('\n');
}
