import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ApiClient, DataTable, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { ShellLink } from '../core/shell-link';
import { Customer, placeOf, sourceLabel } from './customer';

/** People and shops who buy racks: who they are and how to reach them. */
@Component({
  selector: 'tw-customer-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatButton, MatIcon, DataTable, PageHeader, DatePipe, ShellLink],
  templateUrl: './customer-list.html',
  styleUrl: './customer-list.scss',
})
export class CustomerList {
  readonly query = input.required<ListQuery>();
  readonly queryChange = output<ListQuery>();

  private readonly api = inject(ApiClient);
  protected readonly list = pagedList(this.query, (q) => this.api.list<Customer>('/customers', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['name', 'email', 'phone', 'city', 'source', 'createdAt'];
  protected readonly placeOf = placeOf;
  protected readonly sourceLabel = sourceLabel;

  /** A several-line address on one line, as the list has room for. */
  protected oneLine(address: string): string {
    return address.split(/\s*\n\s*/).filter(Boolean).join(', ');
  }

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 });
  }
}
