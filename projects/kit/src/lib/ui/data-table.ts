import { ChangeDetectionStrategy, Component, DestroyRef, inject, input, linkedSignal, output } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatIconButton } from '@angular/material/button';
import { MatInput } from '@angular/material/input';
import { MatPaginator, PageEvent } from '@angular/material/paginator';
import { MatProgressBar } from '@angular/material/progress-bar';
import { Subject, debounceTime, distinctUntilChanged } from 'rxjs';
import { ListQuery } from '../api/page';
import { PAGE_SIZES } from '../list/list-query';
import { EmptyState } from './empty-state';
import { ErrorBanner } from './error-banner';

let nextId = 0;

/**
 * Frame around a server-paged `mat-table`: text filter, progress, error, empty state and paginator.
 * The table itself is projected; the frame only turns user actions into a new ListQuery.
 */
@Component({
  selector: 'tw-data-table',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatIcon, MatIconButton, MatPaginator, MatProgressBar, EmptyState, ErrorBanner],
  template: `
    <div class="toolbar">
      <mat-form-field appearance="outline" subscriptSizing="dynamic" class="filter">
        <mat-label>{{ filterLabel() }}</mat-label>
        <mat-icon matPrefix aria-hidden="true">search</mat-icon>
        <input matInput type="search" [id]="filterId" [value]="filterText()" (input)="onFilterInput($event)" autocomplete="off" />
        @if (filterText()) {
          <button matIconButton matSuffix type="button" aria-label="Clear the filter" (click)="clearFilter()">
            <mat-icon>close</mat-icon>
          </button>
        }
      </mat-form-field>
      <ng-content select="[twTableActions]" />
    </div>

    @if (error(); as message) {
      <tw-error-banner [message]="message" [retryable]="true" (retry)="retry.emit()" />
    }

    <div class="frame" [attr.aria-busy]="loading()">
      <div class="progress">
        @if (loading()) {
          <mat-progress-bar mode="indeterminate" aria-label="Loading" />
        }
      </div>
      <div class="scroller" [class.stale]="loading()">
        <ng-content />
      </div>
      @if (!loading() && !error() && total() === 0) {
        <tw-empty-state
          [icon]="query().q ? 'search_off' : 'inventory_2'"
          [heading]="query().q ? 'Nothing matches “' + query().q + '”' : 'No ' + itemsLabel() + ' yet'"
          [hint]="query().q ? 'Try a shorter or different filter.' : ''"
        />
      }
      <mat-paginator
        [length]="total()"
        [pageIndex]="pageIndex()"
        [pageSize]="query().limit"
        [pageSizeOptions]="pageSizes"
        [showFirstLastButtons]="true"
        [attr.aria-label]="'Pages of ' + itemsLabel()"
        (page)="onPage($event)"
      />
    </div>
  `,
  styles: `
    :host { display: block; }
    .toolbar { display: flex; flex-wrap: wrap; gap: 12px; align-items: center; margin-bottom: 16px; }
    .filter { flex: 1 1 260px; max-width: 420px; }
    .frame { border: 1px solid var(--mat-sys-outline-variant); border-radius: var(--mat-sys-corner-large, 16px); overflow: hidden; background: var(--mat-sys-surface); }
    .progress { height: 4px; }
    .scroller { overflow-x: auto; transition: opacity 120ms; }
    /* Columns keep their natural width; narrow screens scroll sideways instead of wrapping every word. */
    .scroller ::ng-deep > table { width: 100%; min-width: max-content; }
    .scroller.stale { opacity: 0.6; }
    mat-paginator { border-top: 1px solid var(--mat-sys-outline-variant); }
  `,
})
export class DataTable {
  readonly query = input.required<ListQuery>();
  readonly total = input(0);
  readonly loading = input(false);
  readonly error = input<string | null>(null);
  readonly filterLabel = input('Filter');
  readonly itemsLabel = input('rows');
  readonly queryChange = output<ListQuery>();
  readonly retry = output<void>();

  protected readonly filterId = `tw-data-table-filter-${nextId++}`;
  protected readonly pageSizes = [...PAGE_SIZES];
  /** Follows the query (back/forward) but also what the user is typing. */
  protected readonly filterText = linkedSignal(() => this.query().q);
  private readonly typed = new Subject<string>();

  constructor() {
    this.typed
      .pipe(debounceTime(300), distinctUntilChanged(), takeUntilDestroyed(inject(DestroyRef)))
      .subscribe((q) => this.applyFilter(q));
  }

  protected pageIndex(): number {
    const { offset, limit } = this.query();
    return Math.floor(offset / limit);
  }

  protected onFilterInput(event: Event): void {
    const value = (event.target as HTMLInputElement).value;
    this.filterText.set(value);
    this.typed.next(value);
  }

  protected clearFilter(): void {
    this.filterText.set('');
    this.typed.next('');
    this.applyFilter('');
  }

  protected onPage(event: PageEvent): void {
    this.queryChange.emit({ ...this.query(), limit: event.pageSize, offset: event.pageIndex * event.pageSize });
  }

  private applyFilter(q: string): void {
    if (q.trim() === this.query().q.trim()) return;
    this.queryChange.emit({ ...this.query(), q, offset: 0 });
  }
}
