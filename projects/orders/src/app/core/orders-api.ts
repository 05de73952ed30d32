import { HttpClient, HttpHeaders, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { API_BASE, ListQuery, Page, toApiError } from '@tubwright/kit';
import { Observable, catchError, throwError } from 'rxjs';

type Params = Record<string, string | number | boolean | undefined | null>;

/**
 * The orders module's calls to /api/v1. Beyond the kit's ApiClient it sends an Idempotency-Key
 * (payments and quotes may be retried) and fetches PDFs, which need the bearer token a plain
 * link cannot carry. Errors arrive as the kit's ApiError.
 */
@Injectable({ providedIn: 'root' })
export class OrdersApi {
  private readonly http = inject(HttpClient);

  get<T>(path: string, params: Params = {}): Observable<T> {
    return this.http.get<T>(API_BASE + path, { params: toParams(params) }).pipe(catchError(rethrow));
  }

  list<T>(path: string, query: ListQuery, filters: Params = {}): Observable<Page<T>> {
    return this.get<Page<T>>(path, { limit: query.limit, offset: query.offset, sort: query.sort || undefined, q: query.q.trim() || undefined, ...filters });
  }

  post<T>(path: string, body: unknown, options: { idempotencyKey?: string } = {}): Observable<T> {
    const headers = options.idempotencyKey ? new HttpHeaders({ 'Idempotency-Key': options.idempotencyKey }) : undefined;
    return this.http.post<T>(API_BASE + path, body, { headers }).pipe(catchError(rethrow));
  }

  patch<T>(path: string, body: unknown): Observable<T> {
    return this.http.patch<T>(API_BASE + path, body).pipe(catchError(rethrow));
  }

  delete(path: string): Observable<void> {
    return this.http.delete<void>(API_BASE + path).pipe(catchError(rethrow));
  }

  blob(path: string): Observable<Blob> {
    return this.http.get(API_BASE + path, { responseType: 'blob' }).pipe(catchError(rethrow));
  }
}

/** A fresh key per attempt at one write; the same key is sent again when the user retries. */
export function newIdempotencyKey(): string {
  return globalThis.crypto?.randomUUID?.() ?? `${Date.now()}-${Math.random().toString(36).slice(2)}`;
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
