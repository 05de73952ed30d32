import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { DataTable, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { MoneyPipe } from '../core/money';
import { OrdersApi } from '../core/orders-api';
import { listPath } from '../core/orders-routes';
import type { QuoteStatus, QuoteSummary } from '../core/orders-types';
import { ShellLink } from '../core/shell-link';
import { StatusChip } from '../core/status-chip';
import { QUOTE_STATUSES, statusLabel } from '../core/statuses';

/** Every quote, newest first, filtered by status. */
@Component({
  selector: 'tw-quote-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatButton, MatIcon, DataTable, PageHeader, ShellLink, StatusChip, MoneyPipe, DatePipe],
  template: `
    <tw-page-header heading="Quotes" subheading="Priced racks, add-ons and animals, sent to customers by e-mail.">
      <a mat-flat-button twLink="quotes/new"><mat-icon>add</mat-icon>New quote</a>
    </tw-page-header>
    <nav class="tw-filters" aria-label="Quote status">
      <a [twLink]="pathFor(null)" [twLinkReplace]="true" [class.active]="status() === null" [attr.aria-current]="status() === null ? 'true' : null">All</a>
      @for (s of statuses; track s) {
        <a [twLink]="pathFor(s)" [twLinkReplace]="true" [class.active]="status() === s" [attr.aria-current]="status() === s ? 'true' : null">{{ label(s) }}</a>
      }
    </nav>
    <tw-data-table
      [query]="query()"
      [total]="list.total()"
      [loading]="list.loading()"
      [error]="list.error()"
      filterLabel="Filter by number or customer"
      itemsLabel="quotes"
      (queryChange)="queryChange.emit($event)"
      (retry)="list.reload()"
    >
      <table mat-table [dataSource]="list.items()" matSort [matSortActive]="sort().active" [matSortDirection]="sort().direction" (matSortChange)="sortBy($event)" aria-label="Quotes">
        <ng-container matColumnDef="number">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Number</th>
          <td mat-cell *matCellDef="let q"><a [twLink]="'quotes/' + q.id">{{ q.number }}</a></td>
        </ng-container>
        <ng-container matColumnDef="customer">
          <th mat-header-cell *matHeaderCellDef>Customer</th>
          <td mat-cell *matCellDef="let q"><a [twLink]="'customers/' + q.customerId">{{ q.customerName }}</a></td>
        </ng-container>
        <ng-container matColumnDef="status">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Status</th>
          <td mat-cell *matCellDef="let q"><tw-status-chip [status]="q.status" /></td>
        </ng-container>
        <ng-container matColumnDef="validUntil">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Valid until</th>
          <td mat-cell *matCellDef="let q" class="tw-nowrap">{{ q.validUntil | date: 'mediumDate' }}</td>
        </ng-container>
        <ng-container matColumnDef="totalCents">
          <th mat-header-cell *matHeaderCellDef mat-sort-header arrowPosition="before" class="tw-num">Total</th>
          <td mat-cell *matCellDef="let q" class="tw-num">{{ q.totalCents | money: q.currency }}</td>
        </ng-container>
        <ng-container matColumnDef="createdAt">
          <th mat-header-cell *matHeaderCellDef mat-sort-header arrowPosition="before" class="tw-num">Created</th>
          <td mat-cell *matCellDef="let q" class="tw-num">{{ q.createdAt | date: 'mediumDate' }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns"></tr>
        <tr mat-row *matRowDef="let row; columns: columns"></tr>
      </table>
    </tw-data-table>
  `,
})
export class QuoteList {
  readonly query = input.required<ListQuery>();
  readonly status = input<QuoteStatus | null>(null);
  readonly queryChange = output<ListQuery>();

  private readonly api = inject(OrdersApi);
  // The status is part of the request so that changing it loads again.
  private readonly request = computed(() => ({ ...this.query(), status: this.status() }));
  protected readonly list = pagedList(this.request, (q) => this.api.list<QuoteSummary>('/quotes', q, { status: this.status() }));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['number', 'customer', 'status', 'validUntil', 'totalCents', 'createdAt'];
  protected readonly statuses = QUOTE_STATUSES;
  protected readonly label = statusLabel;

  protected pathFor(status: QuoteStatus | null): string {
    return listPath('quotes', { ...this.query(), offset: 0 }, status);
  }

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 });
  }
}
