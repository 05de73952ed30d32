import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ApiClient, DataTable, LengthPipe, ListDefaults, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { TubModel } from './tub-model';

export const TUB_MODEL_LIST_DEFAULTS: ListDefaults = { sort: 'name', limit: 25 };

/** The shop's tub models: the outside sizes every rack is planned around. */
@Component({
  selector: 'tw-tub-model-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, DataTable, PageHeader, LengthPipe],
  templateUrl: './tub-model-list.html',
  styleUrl: './tub-model-list.scss',
})
export class TubModelList {
  readonly query = input.required<ListQuery>();
  readonly queryChange = output<ListQuery>();

  private readonly api = inject(ApiClient);
  protected readonly list = pagedList(this.query, (q) => this.api.list<TubModel>('/tub-models', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['name', 'maker', 'lengthIn', 'widthIn', 'heightIn', 'volumeQt'];

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 });
  }
}
