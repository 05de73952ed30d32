import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { DataTable, ErrorBanner, ListQuery, Page, PageHeader, describeApiError, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import { AnimalFilters, AnimalSexFilter, AnimalStatusFilter } from '../core/collection-routes';
import { ShellLink } from '../core/shell-link';
import { Animal, SEX_OPTIONS, STATUS_OPTIONS, formatWeight, sexLabel, statusLabel } from './animal';


export interface AnimalListState {
  query: ListQuery;
  filters: AnimalFilters;
}

/** Every animal in the collection, with where it lives and how it is doing. */
@Component({
  selector: 'tw-animal-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatFormFieldModule, MatInput, MatButton, MatAnchor, MatIcon, DataTable, ErrorBanner, PageHeader, ShellLink],
  templateUrl: './animal-list.html',
  styleUrl: './animal-list.scss',
})
export class AnimalList {
  readonly query = input.required<ListQuery>();
  readonly filters = input<AnimalFilters>({ status: null, sex: null });
  readonly stateChange = output<AnimalListState>();

  private readonly api = inject(CollectionApi);
  /** The page and its filters in one signal, so a filter change is one request. */
  private readonly request = computed(() => ({ ...this.query(), ...this.filters() }));
  protected readonly list = pagedList(this.request, (query) => {
    const r = query as ListQuery & AnimalFilters;
    return this.api.get<Page<Animal>>('/animals', { limit: r.limit, offset: r.offset, sort: r.sort, q: r.q.trim(), status: r.status, sex: r.sex });
  });
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['code', 'name', 'species', 'morph', 'sex', 'hatchDate', 'weightG', 'status', 'location'];
  protected readonly statusOptions = STATUS_OPTIONS;
  protected readonly sexOptions = SEX_OPTIONS;
  protected readonly statusLabel = statusLabel;
  protected readonly sexLabel = sexLabel;
  protected readonly formatWeight = formatWeight;

  protected readonly exportError = signal<string | null>(null);

  /** Every animal, or every husbandry event, as the CSV the records service writes. */
  protected exportCsv(what: 'animals' | 'events'): void {
    this.exportError.set(null);
    this.api.download(`/collection/${what}.csv`, `${what}.csv`).subscribe({ error: (error: unknown) => this.exportError.set(describeApiError(error)) });
  }

  protected sortBy(sort: Sort): void {
    this.stateChange.emit({ query: { ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 }, filters: this.filters() });
  }

  protected queryChange(query: ListQuery): void {
    this.stateChange.emit({ query, filters: this.filters() });
  }

  protected filterStatus(value: string): void {
    this.stateChange.emit({ query: { ...this.query(), offset: 0 }, filters: { ...this.filters(), status: (value || null) as AnimalStatusFilter | null } });
  }

  protected filterSex(value: string): void {
    this.stateChange.emit({ query: { ...this.query(), offset: 0 }, filters: { ...this.filters(), sex: (value || null) as AnimalSexFilter | null } });
  }
}
