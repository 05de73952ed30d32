import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed, toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner, Page, PageHeader, injectShellNavigate, toApiError } from '@tubwright/kit';
import { parseInches } from '@tubwright/shared/units';
import { debounceTime, distinctUntilChanged, of, switchMap, catchError } from 'rxjs';
import { Customer } from '../customers/customer';
import { MoneyPipe, formatCents, parseMoneyToCents, unitsToCents } from '../core/money';
import { OrdersApi, newIdempotencyKey } from '../core/orders-api';
import type { ForSaleAnimal, OrderSettings, PlanListItem, PriceListItem, Quote, QuoteLineKind, RackPlanResponse } from '../core/orders-types';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { previewTotals } from './calculations/quote-preview';
import {
  DraftLine, addOnLine, animalLine, effectivePriceCents, fromQuoteLine, lineProblem, planLine, plainLine, specFor, specLine, toLineInput,
} from './quote-draft';

type AddMode = 'plan' | 'spec' | 'addon' | 'animal' | 'delivery' | 'other';

const ADD_MODES: Array<{ mode: AddMode; label: string; icon: string }> = [
  { mode: 'plan', label: 'Saved plan', icon: 'shelves' },
  { mode: 'spec', label: 'Rack from a tub', icon: 'straighten' },
  { mode: 'addon', label: 'Add-on', icon: 'heat' },
  { mode: 'animal', label: 'Animal', icon: 'pets' },
  { mode: 'delivery', label: 'Delivery', icon: 'local_shipping' },
  { mode: 'other', label: 'Other line', icon: 'add_notes' },
];

/** Price-list categories a customer can buy on their own (sheets and labor rates are the calculator's). */
const ADD_ON_CATEGORIES = ['heat', 'hardware', 'other'];

/** Writes a draft quote: rack lines from saved plans or a tub, add-ons, animals, delivery; totals as the server will count them. */
@Component({
  selector: 'tw-quote-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, MatIconButton, MatIcon, MatProgressBar, ErrorBanner, PageHeader, ShellLink, MoneyPipe],
  templateUrl: './quote-form.html',
  styleUrl: './quote-form.scss',
})
export class QuoteForm {
  readonly id = input<number | null>(null);
  readonly customerId = input<number | null>(null);

  private readonly api = inject(OrdersApi);
  private readonly navigate = injectShellNavigate();

  protected readonly existing = remote(() => this.id(), (id) => this.api.get<Quote>(`/quotes/${id}`));
  protected readonly settings = remote(() => true, () => this.api.get<OrderSettings>('/order-settings'));
  protected readonly plans = remote(() => true, () => this.api.get<Page<PlanListItem>>('/plans', { status: 'active', sort: 'name', limit: 200 }));
  protected readonly priceList = remote(() => true, () => this.api.get<{ items: PriceListItem[] }>('/price-list'));
  protected readonly forSale = remote(() => true, () => this.api.get<{ items: ForSaleAnimal[] }>('/collection/for-sale'));

  /** The customer picked here (null: cleared to pick another), else the one from the address or the quote being changed. */
  protected readonly pickedCustomerId = signal<number | null | undefined>(undefined);
  protected readonly chosenCustomerId = computed(() => {
    const picked = this.pickedCustomerId();
    return picked !== undefined ? picked : (this.customerId() ?? this.existing.value()?.customerId ?? null);
  });
  protected readonly customer = remote(() => this.chosenCustomerId(), (id) => this.api.get<Customer>(`/customers/${id}`));
  protected readonly customerSearch = signal('');
  protected readonly customerMatches = toSignal(
    toObservable(this.customerSearch).pipe(
      debounceTime(250),
      distinctUntilChanged(),
      switchMap((q) => (q.trim() ? this.api.get<Page<Customer>>('/customers', { q: q.trim(), limit: 8, sort: 'name' }).pipe(catchError(() => of(null))) : of(null))),
    ),
    { initialValue: null },
  );

  protected readonly lines = signal<DraftLine[]>([]);
  protected readonly discountText = signal('0');
  protected readonly validUntil = signal('');
  protected readonly notes = signal('');

  protected readonly modes = ADD_MODES;
  protected readonly mode = signal<AddMode>('plan');
  protected readonly addError = signal<string | null>(null);
  protected readonly pricing = new Action();
  protected readonly save = new Action();
  private readonly idempotencyKey = newIdempotencyKey();

  // The add panel's fields, one set per mode.
  protected readonly planId = signal<number | null>(null);
  protected readonly quantityText = signal('1');
  protected readonly tub = signal({ length: '', width: '', height: '', levels: '', columns: '' });
  protected readonly addOnKey = signal('');
  protected readonly animalId = signal<number | null>(null);
  protected readonly priceText = signal('');
  protected readonly descriptionText = signal('');
  protected readonly otherKind = signal<QuoteLineKind>('item');

  protected readonly addOns = computed(() => (this.priceList.value()?.items ?? []).filter((i) => ADD_ON_CATEGORIES.includes(i.category)));
  protected readonly selectedPlan = computed(() => this.plans.value()?.items.find((p) => p.id === this.planId()) ?? null);
  protected readonly quotedAnimalIds = computed(() => new Set(this.lines().map((l) => l.animalId).filter((id) => id !== null)));
  protected readonly discountPercent = computed(() => {
    const n = Number(this.discountText().replace(',', '.'));
    return Number.isFinite(n) && n >= 0 && n <= 100 ? Math.round(n * 100) / 100 : null;
  });
  protected readonly preview = computed(() => {
    const s = this.settings.value();
    if (!s) return null;
    return previewTotals(
      this.lines().map((l) => ({ kind: l.kind, quantity: l.quantity, unitPriceCents: effectivePriceCents(l) })),
      { taxRatePercent: s.taxRatePercent, discountPercent: this.discountPercent() ?? 0, depositPercent: s.depositPercent },
    );
  });
  protected readonly currency = computed(() => this.existing.value()?.currency ?? this.settings.value()?.currency ?? 'usd');
  protected readonly problems = computed(() => this.lines().map(lineProblem));
  protected readonly editable = computed(() => this.id() === null || this.existing.value()?.status === 'draft');

  constructor() {
    effect(() => {
      const quote = this.existing.value();
      if (!quote) return;
      this.lines.set(quote.lines.map(fromQuoteLine));
      this.discountText.set(String(quote.discountPercent));
      this.validUntil.set(quote.validUntil);
      this.notes.set(quote.notes);
    });
    // A new mode starts with its own defaults rather than the last mode's leftovers.
    toObservable(this.mode)
      .pipe(takeUntilDestroyed())
      .subscribe((mode) => {
        this.addError.set(null);
        this.quantityText.set('1');
        this.priceText.set('');
        this.descriptionText.set(mode === 'delivery' ? 'Delivery' : '');
      });
  }

  protected value(event: Event): string {
    return (event.target as HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement).value;
  }

  protected setTub(field: 'length' | 'width' | 'height' | 'levels' | 'columns', event: Event): void {
    const text = this.value(event);
    this.tub.update((t) => ({ ...t, [field]: text }));
  }

  protected pickCustomer(customer: Customer): void {
    this.pickedCustomerId.set(customer.id);
    this.customerSearch.set('');
  }

  protected deliveryHint(): string {
    const fee = this.settings.value()?.deliveryFeeCents;
    return fee === undefined ? 'Leave empty for the shop’s delivery fee' : `Leave empty for the shop’s fee of ${formatCents(fee, this.currency())}`;
  }

  protected validHint(): string {
    const days = this.settings.value()?.quoteValidDays;
    return days ? `Leave empty for ${days} days from today` : 'Leave empty for the shop’s default';
  }

  protected add(): void {
    this.addError.set(null);
    const quantity = Number(this.quantityText());
    const needsQuantity = this.mode() !== 'animal';
    if (needsQuantity && (!Number.isInteger(quantity) || quantity < 1 || quantity > 10_000)) {
      this.addError.set('Quantity must be a whole number from 1 to 10,000.');
      return;
    }
    switch (this.mode()) {
      case 'plan': {
        const plan = this.selectedPlan();
        if (!plan) return this.addError.set('Pick a saved plan.');
        return this.push(planLine(plan, quantity));
      }
      case 'spec':
        return this.addSpec(quantity);
      case 'addon': {
        const item = this.addOns().find((i) => i.key === this.addOnKey());
        if (!item) return this.addError.set('Pick an add-on.');
        return this.push(addOnLine(item, quantity));
      }
      case 'animal': {
        const animal = this.forSale.value()?.items.find((a) => a.id === this.animalId());
        if (!animal) return this.addError.set('Pick an animal marked for sale.');
        const cents = parseMoneyToCents(this.priceText());
        if (cents === null) return this.addError.set('Enter the asking price, like 350 or 349.99.');
        this.animalId.set(null);
        return this.push(animalLine(animal, cents));
      }
      case 'delivery': {
        if (this.priceText().trim() && parseMoneyToCents(this.priceText()) === null) return this.addError.set('Price must be an amount like 45 or 45.50.');
        const fee = this.settings.value()?.deliveryFeeCents ?? null;
        return this.push(plainLine('delivery', this.descriptionText().trim() || 'Delivery', quantity, this.priceText().trim(), fee));
      }
      case 'other': {
        if (!this.descriptionText().trim()) return this.addError.set('Describe the line.');
        if (parseMoneyToCents(this.priceText()) === null) return this.addError.set('Enter a price like 45 or 45.50.');
        return this.push(plainLine(this.otherKind(), this.descriptionText().trim(), quantity, this.priceText().trim()));
      }
    }
  }

  /** A rack from a measured tub: priced by the calculator now, so the totals are known before saving. */
  private addSpec(quantity: number): void {
    const t = this.tub();
    const lengthIn = parseInches(t.length);
    const widthIn = parseInches(t.width);
    const heightIn = parseInches(t.height);
    const levels = Number(t.levels);
    const columns = Number(t.columns);
    if (!lengthIn || !widthIn || !heightIn || lengthIn <= 0 || widthIn <= 0 || heightIn <= 0) {
      return this.addError.set('Enter the tub’s length, width and height in inches, e.g. 23 or 16 1/4.');
    }
    if (!Number.isInteger(levels) || levels < 1 || levels > 30 || !Number.isInteger(columns) || columns < 1 || columns > 12) {
      return this.addError.set('Levels must be 1 to 30 and columns 1 to 12.');
    }
    const tub = { lengthIn, widthIn, heightIn, levels, columns };
    this.pricing.run(
      this.api.post<RackPlanResponse>('/calc/rack-plan', { ...specFor(tub), cutting: { include: true } }),
      (plan) => {
        const dangers = plan.checks.filter((c) => c.severity === 'danger');
        this.push(specLine(tub, quantity, unitsToCents(plan.cost.total), `Rack, ${levels} x ${columns} tubs`));
        if (dangers.length) this.addError.set(`Added, but the calculator warns: ${dangers.map((d) => d.message).join(' ')}`);
      },
      (error) => {
        this.addError.set(`The calculator could not price it: ${toApiError(error).message}`);
        return true;
      },
    );
  }

  private push(line: DraftLine): void {
    this.lines.update((lines) => [...lines, line]);
    // Ready for the next line of the same kind; the picked plan or add-on stays for a repeat.
    this.quantityText.set('1');
    this.priceText.set('');
    if (this.mode() === 'other') this.descriptionText.set('');
  }

  protected updateLine(key: number, change: Partial<Pick<DraftLine, 'quantity' | 'priceText' | 'description'>>): void {
    this.lines.update((lines) => lines.map((l) => (l.key === key ? { ...l, ...change } : l)));
  }

  protected removeLine(key: number): void {
    this.lines.update((lines) => lines.filter((l) => l.key !== key));
  }

  protected lineAmount(line: DraftLine): number | null {
    const price = effectivePriceCents(line);
    if (price === null) return null;
    return line.kind === 'discount' ? -price * line.quantity : price * line.quantity;
  }

  protected submit(): void {
    const customerId = this.chosenCustomerId();
    if (!customerId) return this.save.error.set('Pick the customer the quote is for.');
    if (this.lines().length === 0) return this.save.error.set('Add at least one line.');
    const at = this.problems().findIndex((p) => p !== null);
    if (at >= 0) return this.save.error.set(`Line ${at + 1}: ${this.problems()[at]}`);
    const discountPercent = this.discountPercent();
    if (discountPercent === null) return this.save.error.set('Discount must be a percentage from 0 to 100.');
    const body: Record<string, unknown> = { lines: this.lines().map(toLineInput), discountPercent, notes: this.notes() };
    if (this.validUntil()) body['validUntil'] = this.validUntil();
    const id = this.id();
    const request = id
      ? this.api.patch<Quote>(`/quotes/${id}`, body)
      : this.api.post<Quote>('/quotes', { customerId, ...body }, { idempotencyKey: this.idempotencyKey });
    this.save.run(request, (quote) => this.navigate(`quotes/${quote.id}`, { replace: !!id }));
  }
}
