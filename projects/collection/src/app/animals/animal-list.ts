import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ApiClient, DataTable, ListDefaults, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { Animal, formatWeight, sexLabel, statusLabel } from './animal';

export const ANIMAL_LIST_DEFAULTS: ListDefaults = { sort: 'code', limit: 25 };

/** Every animal in the collection, with where it lives and how it is doing. */
@Component({
  selector: 'tw-animal-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, DataTable, PageHeader],
  templateUrl: './animal-list.html',
  styleUrl: './animal-list.scss',
})
export class AnimalList {
  readonly query = input.required<ListQuery>();
  readonly queryChange = output<ListQuery>();

  private readonly api = inject(ApiClient);
  protected readonly list = pagedList(this.query, (q) => this.api.list<Animal>('/animals', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['code', 'name', 'species', 'morph', 'sex', 'hatchDate', 'weightG', 'status', 'location'];
  protected readonly statusLabel = statusLabel;
  protected readonly sexLabel = sexLabel;
  protected readonly formatWeight = formatWeight;

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 });
  }
}
