import { HttpErrorResponse } from '@angular/common/http';
import { Signal, computed, signal } from '@angular/core';
import { takeUntilDestroyed, toObservable } from '@angular/core/rxjs-interop';
import { EMPTY, Observable, catchError, map, of, retry, switchMap, throwError, timer } from 'rxjs';
import { ApiError, describeApiError } from '../api/api-error';
import { ListQuery, Page } from '../api/page';

export interface PagedList<T> {
  readonly items: Signal<T[]>;
  readonly total: Signal<number>;
  readonly loading: Signal<boolean>;
  readonly error: Signal<string | null>;
  reload(): void;
}

interface State<T> {
  items: T[];
  total: number;
  loading: boolean;
  error: string | null;
}

/**
 * Loads the page `query` describes whenever it changes; a newer query cancels the older request.
 * Call in an injection context (a field initializer of a component or service).
 */
export function pagedList<T>(
  query: Signal<ListQuery | null>,
  fetchPage: (query: ListQuery) => Observable<Page<T>>,
): PagedList<T> {
  const state = signal<State<T>>({ items: [], total: 0, loading: false, error: null });
  const reloads = signal(0);
  const request = computed(() => ({ query: query(), reload: reloads() }));

  toObservable(request)
    .pipe(
      switchMap(({ query }) => {
        if (!query) return EMPTY;
        state.update((s) => ({ ...s, loading: true, error: null }));
        return fetchPage(query).pipe(
          retry({ count: 2, delay: (error, attempt) => (isTransient(error) ? timer(300 * attempt) : throwError(() => error)) }),
          map((page): Partial<State<T>> => ({ items: page.items, total: page.total, error: null })),
          catchError((error: unknown) => of<Partial<State<T>>>({ error: describeApiError(error) })),
        );
      }),
      takeUntilDestroyed(),
    )
    .subscribe((result) => state.update((s) => ({ ...s, ...result, loading: false })));

  return {
    items: computed(() => state().items),
    total: computed(() => state().total),
    loading: computed(() => state().loading),
    error: computed(() => state().error),
    reload: () => reloads.update((n) => n + 1),
  };
}

function isTransient(error: unknown): boolean {
  const status = error instanceof ApiError || error instanceof HttpErrorResponse ? error.status : -1;
  return status === 0 || status === 502 || status === 503 || status === 504;
}
