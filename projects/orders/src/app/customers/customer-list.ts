import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ApiClient, DataTable, ListDefaults, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { Customer, placeOf } from './customer';

export const CUSTOMER_LIST_DEFAULTS: ListDefaults = { sort: 'name', limit: 25 };

/** People and shops who buy racks: who they are and how to reach them. */
@Component({
  selector: 'tw-customer-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, DataTable, PageHeader, DatePipe],
  templateUrl: './customer-list.html',
  styleUrl: './customer-list.scss',
})
export class CustomerList {
  readonly query = input.required<ListQuery>();
  readonly queryChange = output<ListQuery>();

  private readonly api = inject(ApiClient);
  protected readonly list = pagedList(this.query, (q) => this.api.list<Customer>('/customers', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['name', 'email', 'phone', 'city', 'createdAt'];
  protected readonly placeOf = placeOf;

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 });
  }
}
