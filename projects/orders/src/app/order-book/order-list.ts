import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { AuthSession, DataTable, ListQuery, PageHeader, fromSortParam, injectShellNavigate, pagedList, toSortParam } from '@tubwright/kit';
import { MoneyPipe } from '../core/money';
import { OrdersApi } from '../core/orders-api';
import { listPath } from '../core/orders-routes';
import type { OrderStatus, OrderSummary } from '../core/orders-types';
import { ShellLink } from '../core/shell-link';
import { StatusChip } from '../core/status-chip';
import { ORDER_STATUSES, statusLabel } from '../core/statuses';

/** The order book: every order with its stage and money, filtered by stage. */
@Component({
  selector: 'tw-order-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatFormFieldModule, MatInput, DataTable, PageHeader, ShellLink, StatusChip, MoneyPipe, DatePipe],
  template: `
    <tw-page-header heading="Orders" subheading="Accepted quotes, from the deposit to the hand-over." />
    <tw-data-table
      [query]="query()"
      [total]="list.total()"
      [loading]="list.loading()"
      [error]="list.error()"
      filterLabel="Filter by number or customer"
      itemsLabel="orders"
      (queryChange)="queryChange.emit($event)"
      (retry)="list.reload()"
    >
      <mat-form-field twTableActions appearance="outline" subscriptSizing="dynamic" class="stage-filter">
        <mat-label>Stage</mat-label>
        <select matNativeControl (change)="filter($event)">
          <option value="" [selected]="status() === null">Every stage</option>
          @for (s of statuses; track s) {
            <option [value]="s" [selected]="status() === s">{{ label(s) }}</option>
          }
        </select>
      </mat-form-field>
      <table mat-table [dataSource]="list.items()" matSort [matSortActive]="sort().active" [matSortDirection]="sort().direction" (matSortChange)="sortBy($event)" aria-label="Orders">
        <ng-container matColumnDef="number">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Number</th>
          <td mat-cell *matCellDef="let o"><a [twLink]="'orders/' + o.id">{{ o.number }}</a></td>
        </ng-container>
        <ng-container matColumnDef="customer">
          <th mat-header-cell *matHeaderCellDef>Customer</th>
          <td mat-cell *matCellDef="let o">
            @if (canSeeCustomers()) {
              <a [twLink]="'customers/' + o.customerId">{{ o.customerName }}</a>
            } @else {
              {{ o.customerName }}
            }
          </td>
        </ng-container>
        <ng-container matColumnDef="status">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Stage</th>
          <td mat-cell *matCellDef="let o"><tw-status-chip [status]="o.status" /></td>
        </ng-container>
        <ng-container matColumnDef="deliveryDate">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Hand-over</th>
          <td mat-cell *matCellDef="let o" class="tw-nowrap">{{ o.deliveryMethod === 'delivery' ? 'Delivery' : 'Pickup' }}{{ o.deliveryDate ? ', ' + (o.deliveryDate | date: 'mediumDate') : '' }}</td>
        </ng-container>
        <ng-container matColumnDef="totalCents">
          <th mat-header-cell *matHeaderCellDef mat-sort-header arrowPosition="before" class="tw-num">Total</th>
          <td mat-cell *matCellDef="let o" class="tw-num">{{ o.totalCents | money: o.currency }}</td>
        </ng-container>
        <ng-container matColumnDef="balanceCents">
          <th mat-header-cell *matHeaderCellDef class="tw-num">Balance</th>
          <td mat-cell *matCellDef="let o" class="tw-num">{{ o.balanceCents | money: o.currency }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns"></tr>
        <tr mat-row *matRowDef="let row; columns: columns"></tr>
      </table>
    </tw-data-table>
  `,
  styles: `.stage-filter { width: 220px; }`,
})
export class OrderList {
  readonly query = input.required<ListQuery>();
  readonly status = input<OrderStatus | null>(null);
  readonly queryChange = output<ListQuery>();

  private readonly api = inject(OrdersApi);
  private readonly navigate = injectShellNavigate();
  private readonly role = inject(AuthSession).role;
  // The status is part of the request so that changing it loads again.
  private readonly request = computed(() => ({ ...this.query(), status: this.status() }));
  protected readonly list = pagedList(this.request, (q) => this.api.list<OrderSummary>('/orders', q, { status: this.status() }));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['number', 'customer', 'status', 'deliveryDate', 'totalCents', 'balanceCents'];
  protected readonly statuses = ORDER_STATUSES;
  protected readonly label = statusLabel;
  protected readonly canSeeCustomers = computed(() => this.role() === 'owner' || this.role() === 'sales');

  protected filter(event: Event): void {
    const status = (event.target as HTMLSelectElement).value || null;
    this.navigate(listPath('orders', { ...this.query(), offset: 0 }, status), { replace: true });
  }

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 });
  }
}
