import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ApiClient, AuthSession, DataTable, LengthPipe, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { TubModel } from './tub-model';
import { TubPhoto } from './tub-photo';

/** The shop's tub models: the outside sizes every rack is planned around. */
@Component({
  selector: 'tw-tub-model-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatButton, DataTable, PageHeader, LengthPipe, TubPhoto],
  templateUrl: './tub-model-list.html',
  styleUrl: './tub-model-list.scss',
})
export class TubModelList {
  readonly query = input.required<ListQuery>();
  readonly queryChange = output<ListQuery>();
  /** A sub-path to show: a tub model's form, or a new plan for the tub. */
  readonly open = output<string>();

  private readonly api = inject(ApiClient);
  protected readonly list = pagedList(this.query, (q) => this.api.list<TubModel>('/tub-models', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['photo', 'name', 'maker', 'lengthIn', 'widthIn', 'heightIn', 'volumeQt', 'actions'];
  private readonly auth = inject(AuthSession);
  protected readonly canWrite = computed(() => ['owner', 'builder'].includes(this.auth.role() ?? ''));

  protected go(event: MouseEvent, path: string): void {
    if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey) return;
    event.preventDefault();
    this.open.emit(path);
  }

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 });
  }
}
