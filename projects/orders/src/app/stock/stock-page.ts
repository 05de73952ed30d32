import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, PageHeader } from '@tubwright/kit';
import { forkJoin } from 'rxjs';
import type { StockKind } from '../core/orders-types';
import { remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { KIND_LABELS, STOCK_KINDS, materialName, stockSize } from '../core/stock-materials';
import { stockLevels } from './calculations/stock-levels';
import { StockApi } from './stock-api';

/** Sheets, boards and hardware on hand, what orders hold of them, and what is free. */
@Component({
  selector: 'tw-stock-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PageHeader, ErrorBanner, MatButton, MatIcon, MatProgressBar, ShellLink],
  templateUrl: './stock-page.html',
  styleUrl: './stock-page.scss',
})
export class StockPage {
  /** Only this kind (from the address), or every kind. */
  readonly kind = input<StockKind | null>(null);

  private readonly stock = inject(StockApi);
  private readonly role = inject(AuthSession).role;
  protected readonly writes = computed(() => this.role() === 'owner' || this.role() === 'builder');
  protected readonly data = remote(() => true, () => forkJoin({ items: this.stock.items(), reservations: this.stock.reservations() }));
  protected readonly groups = computed(() => {
    const data = this.data.value();
    if (!data) return [];
    const levels = stockLevels(data.items, data.reservations);
    const wanted = this.kind();
    return STOCK_KINDS.filter((k) => wanted === null || k === wanted).map((kind) => ({ kind, label: KIND_LABELS[kind].many, rows: levels.get(kind) ?? [] }));
  });
  protected readonly kinds = STOCK_KINDS;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly materialName = materialName;
  protected readonly size = stockSize;

  protected addPath(): string {
    return `stock/new?kind=${this.kind() ?? 'sheet'}`;
  }
}
