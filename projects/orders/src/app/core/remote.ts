import { Signal, computed, signal } from '@angular/core';
import { takeUntilDestroyed, toObservable } from '@angular/core/rxjs-interop';
import { describeApiError } from '@tubwright/kit';
import { EMPTY, Observable, catchError, map, of, switchMap } from 'rxjs';

export interface Remote<T> {
  readonly value: Signal<T | undefined>;
  readonly loading: Signal<boolean>;
  readonly error: Signal<string | null>;
  reload(): void;
  /** The answer of a write (the changed record) replaces what was loaded. */
  set(value: T): void;
}

interface State<T> {
  value: T | undefined;
  loading: boolean;
  error: string | null;
}

/**
 * Loads whatever `params` points at whenever it changes (null: nothing to load); a newer request
 * cancels the older one. Call in an injection context.
 */
export function remote<P, T>(params: () => P | null, fetch: (params: P) => Observable<T>): Remote<T> {
  const state = signal<State<T>>({ value: undefined, loading: false, error: null });
  const reloads = signal(0);
  const request = computed(() => ({ params: params(), reload: reloads() }));

  toObservable(request)
    .pipe(
      switchMap(({ params }) => {
        if (params === null) {
          state.set({ value: undefined, loading: false, error: null });
          return EMPTY;
        }
        state.update((s) => ({ ...s, loading: true, error: null }));
        return fetch(params).pipe(
          map((value): Partial<State<T>> => ({ value, error: null })),
          catchError((error: unknown) => of<Partial<State<T>>>({ error: describeApiError(error) })),
        );
      }),
      takeUntilDestroyed(),
    )
    .subscribe((result) => state.update((s) => ({ ...s, ...result, loading: false })));

  return {
    value: computed(() => state().value),
    loading: computed(() => state().loading),
    error: computed(() => state().error),
    reload: () => reloads.update((n) => n + 1),
    set: (value) => state.update((s) => ({ ...s, value, error: null })),
  };
}

/** One write at a time, with its failure as a sentence; `run` ignores clicks while busy. */
export class Action {
  readonly busy = signal(false);
  readonly error = signal<string | null>(null);

  run<T>(request: Observable<T>, done: (value: T) => void = () => undefined, failed?: (error: unknown) => boolean): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    request.subscribe({
      next: (value) => {
        this.busy.set(false);
        done(value);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        // A caller may place the error on a form field instead of the banner.
        if (!failed?.(error)) this.error.set(describeApiError(error));
      },
    });
  }
}
