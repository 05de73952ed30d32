import { ApiError, toApiError } from '@tubwright/kit';
import {
  EMPTY,
  Observable,
  SchedulerLike,
  asyncScheduler,
  catchError,
  debounceTime,
  distinctUntilChanged,
  map,
  merge,
  of,
  scan,
  share,
  startWith,
  switchMap,
  withLatestFrom,
} from 'rxjs';

/** What the results panels show while the user types. */
export interface CalcState<Q, R> {
  /** The newest result; kept while a newer request runs or the form is invalid, so panels do not blank. */
  result: R | null;
  /** The request `result` answers. */
  resultFor: Q | null;
  /** A request is on its way. */
  pending: boolean;
  /** The newest request failed (a field error or an unreachable calculator). */
  error: ApiError | null;
  /** The form is invalid: nothing is sent and `result` belongs to earlier values. */
  blocked: boolean;
}

type CalcEvent<Q, R> =
  | { kind: 'blocked' }
  | { kind: 'pending' }
  | { kind: 'done'; request: Q; result: R }
  | { kind: 'failed'; error: ApiError };

export interface CalcStreamOptions {
  debounceMs?: number;
  scheduler?: SchedulerLike;
  /** Each emission sends the newest request again (the "Try again" of a failed calculation). */
  retries?: Observable<unknown>;
}

export const initialCalcState = <Q, R>(): CalcState<Q, R> => ({ result: null, resultFor: null, pending: false, error: null, blocked: false });

/**
 * Turns a stream of requests (null while the form is invalid) into calculation states: waits for
 * the typing to pause, skips a request equal to the one before, and cancels the request in flight
 * when a newer one starts (switchMap unsubscribes, which aborts the HTTP call).
 */
export function calcStream<Q, R>(
  requests: Observable<Q | null>,
  calculate: (request: Q) => Observable<R>,
  options: CalcStreamOptions = {},
): Observable<CalcState<Q, R>> {
  const { debounceMs = 300, scheduler = asyncScheduler, retries = EMPTY } = options;
  const settled: Observable<Q | null> = requests.pipe(debounceTime(debounceMs, scheduler), distinctUntilChanged<Q | null>(sameRequest), share());
  const again: Observable<Q | null> = retries.pipe(
    withLatestFrom(settled),
    map(([, request]) => request),
  );

  return merge(settled, again).pipe(
    switchMap((request: Q | null): Observable<CalcEvent<Q, R>> => {
      if (request === null) return of({ kind: 'blocked' });
      return calculate(request).pipe(
        map((result): CalcEvent<Q, R> => ({ kind: 'done', request, result })),
        catchError((error: unknown) => of<CalcEvent<Q, R>>({ kind: 'failed', error: toApiError(error) })),
        startWith<CalcEvent<Q, R>>({ kind: 'pending' }),
      );
    }),
    scan(reduceCalc<Q, R>, initialCalcState<Q, R>()),
  );
}

function reduceCalc<Q, R>(state: CalcState<Q, R>, event: CalcEvent<Q, R>): CalcState<Q, R> {
  switch (event.kind) {
    case 'blocked':
      return { ...state, pending: false, error: null, blocked: true };
    case 'pending':
      return { ...state, pending: true, error: null, blocked: false };
    case 'done':
      return { result: event.result, resultFor: event.request, pending: false, error: null, blocked: false };
    case 'failed':
      return { ...state, pending: false, error: event.error, blocked: false };
  }
}

/** Requests are plain JSON: equal text, equal request. */
export function sameRequest(a: unknown, b: unknown): boolean {
  return a === b || JSON.stringify(a) === JSON.stringify(b);
}
