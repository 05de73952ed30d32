import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, catchError, throwError } from 'rxjs';
import { toApiError } from './api-error';
import { API_BASE } from './api-paths';
import { ListQuery, Page } from './page';

type Params = Record<string, string | number | boolean | undefined | null>;

/** The only way the console talks to the API: JSON under /api/v1, errors as ApiError. */
@Injectable({ providedIn: 'root' })
export class ApiClient {
  private readonly http = inject(HttpClient);

  get<T>(path: string, params: Params = {}): Observable<T> {
    return this.http.get<T>(API_BASE + path, { params: toParams(params) }).pipe(catchError(rethrow));
  }

  post<T>(path: string, body: unknown): Observable<T> {
    return this.http.post<T>(API_BASE + path, body).pipe(catchError(rethrow));
  }

  patch<T>(path: string, body: unknown): Observable<T> {
    return this.http.patch<T>(API_BASE + path, body).pipe(catchError(rethrow));
  }

  /** GET a paginated list: limit and offset always, sort and q when set. */
  list<T>(path: string, query: ListQuery): Observable<Page<T>> {
    return this.get<Page<T>>(path, {
      limit: query.limit,
      offset: query.offset,
      sort: query.sort || undefined,
      q: query.q.trim() || undefined,
    });
  }
}

function rethrow(error: unknown): Observable<never> {
  return throwError(() => toApiError(error));
}

function toParams(params: Params): HttpParams {
  let result = new HttpParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== null && value !== '') result = result.set(key, String(value));
  }
  return result;
}
