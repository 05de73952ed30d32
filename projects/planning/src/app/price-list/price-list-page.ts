import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, PageHeader, ShellLink, describeApiError, toApiError } from '@tubwright/kit';
import { formatMoney } from '../shared/money';
import { PlanApi } from '../shared/plan-api';
import type { PriceListItem } from '../shared/plan-types';
import { trimDecimals } from '../shared/plan-units';

const CATEGORY_LABELS: Record<PriceListItem['category'], string> = {
  sheet: 'Sheets',
  lumber: 'Lumber',
  hardware: 'Hardware',
  heat: 'Heat',
  labor: 'Labor',
  margin: 'Margin',
  other: 'Other',
};

/** Prices that are not money: minutes and percent. */
const isAmount = (item: PriceListItem) => item.unit !== 'minutes' && item.unit !== 'percent' && !item.key.startsWith('labor.minutes') && item.key !== 'margin-percent';

/** The shop's price list; the owner edits prices, everyone else reads them. Materials have a page of their own. */
@Component({
  selector: 'tw-price-list-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatProgressBar, ErrorBanner, PageHeader, ShellLink],
  templateUrl: './price-list-page.html',
  styleUrl: './price-list-page.scss',
})
export class PriceListPage {
  private readonly api = inject(PlanApi);
  private readonly destroyRef = inject(DestroyRef);
  private readonly auth = inject(AuthSession);
  protected readonly canEdit = computed(() => this.auth.role() === 'owner');

  protected readonly items = signal<PriceListItem[]>([]);
  protected readonly loading = signal(true);
  protected readonly failure = signal<string | null>(null);
  protected readonly saving = signal(false);
  protected readonly saved = signal<string | null>(null);
  /** Typed prices by key, as text, until saved. */
  protected readonly edits = signal<Record<string, string>>({});
  protected readonly fieldErrors = signal<Record<string, string>>({});

  protected readonly groups = computed(() => {
    const byCategory = new Map<PriceListItem['category'], PriceListItem[]>();
    for (const item of this.items()) byCategory.set(item.category, [...(byCategory.get(item.category) ?? []), item]);
    return [...byCategory.entries()].map(([category, items]) => ({ category, label: CATEGORY_LABELS[category] ?? category, items }));
  });
  protected readonly changed = computed(() => {
    const edits = this.edits();
    return this.items().filter((item) => edits[item.key] !== undefined && Number(edits[item.key]) !== item.price);
  });

  protected readonly hasErrors = computed(() => Object.keys(this.fieldErrors()).length > 0);

  constructor() {
    this.load();
  }

  protected load(): void {
    this.loading.set(true);
    this.failure.set(null);
    this.api
      .priceList()
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (items) => {
          this.items.set(items);
          this.loading.set(false);
        },
        error: (error: unknown) => {
          this.loading.set(false);
          this.failure.set(describeApiError(error));
        },
      });
  }

  protected priceText(item: PriceListItem): string {
    return this.edits()[item.key] ?? String(item.price);
  }

  protected edit(item: PriceListItem, event: Event): void {
    const value = (event.target as HTMLInputElement).value;
    this.edits.update((e) => ({ ...e, [item.key]: value }));
    this.saved.set(null);
    const number = Number(value);
    this.fieldErrors.update((errors) => {
      const next = { ...errors };
      if (value.trim() === '' || !Number.isFinite(number) || number < 0) next[item.key] = 'A price of 0 or more';
      else if (number > 1_000_000) next[item.key] = 'At most 1,000,000';
      else delete next[item.key];
      return next;
    });
  }

  protected shown(item: PriceListItem): string {
    return isAmount(item) ? formatMoney(item.price) : trimDecimals(item.price, 2);
  }

  protected save(): void {
    const changed = this.changed();
    if (!changed.length || this.saving() || Object.keys(this.fieldErrors()).length) return;
    this.saving.set(true);
    this.failure.set(null);
    this.api
      .updatePrices(changed.map((item) => ({ key: item.key, price: Number(this.edits()[item.key]) })))
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (items) => {
          this.saving.set(false);
          this.items.set(items);
          this.edits.set({});
          this.saved.set(`Saved ${changed.length} ${changed.length === 1 ? 'price' : 'prices'}. New plans and recalculations use them.`);
        },
        error: (error: unknown) => {
          this.saving.set(false);
          const apiError = toApiError(error);
          const index = /^items\[(\d+)\]/.exec(apiError.field ?? '')?.[1];
          const key = index !== undefined ? changed[Number(index)]?.key : undefined;
          if (key) this.fieldErrors.update((e) => ({ ...e, [key]: apiError.message }));
          this.failure.set(describeApiError(apiError));
        },
      });
  }

  protected discard(): void {
    this.edits.set({});
    this.fieldErrors.set({});
  }
}
