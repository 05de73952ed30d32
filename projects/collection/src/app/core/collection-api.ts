import { HttpClient, HttpHeaders, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { API_BASE, toApiError } from '@tubwright/kit';
import { Observable, catchError, map, throwError } from 'rxjs';

type Params = Record<string, string | number | boolean | undefined | null>;

/**
 * The collection's calls to /api/v1. The kit's ApiClient covers GET, POST and PATCH; the
 * collection also needs PUT, DELETE, uploads, image bytes and an Idempotency-Key on feeding day.
 * Errors arrive as the kit's ApiError either way.
 */
@Injectable({ providedIn: 'root' })
export class CollectionApi {
  private readonly http = inject(HttpClient);

  get<T>(path: string, params: Params = {}): Observable<T> {
    return this.http.get<T>(API_BASE + path, { params: toParams(params) }).pipe(catchError(rethrow));
  }

  post<T>(path: string, body: unknown, options: { idempotencyKey?: string } = {}): Observable<T> {
    const headers = options.idempotencyKey ? new HttpHeaders({ 'Idempotency-Key': options.idempotencyKey }) : undefined;
    return this.http.post<T>(API_BASE + path, body, { headers }).pipe(catchError(rethrow));
  }

  put<T>(path: string, body: unknown): Observable<T> {
    return this.http.put<T>(API_BASE + path, body).pipe(catchError(rethrow));
  }

  patch<T>(path: string, body: unknown): Observable<T> {
    return this.http.patch<T>(API_BASE + path, body).pipe(catchError(rethrow));
  }

  delete<T = void>(path: string): Observable<T> {
    return this.http.delete<T>(API_BASE + path).pipe(catchError(rethrow));
  }

  /** multipart/form-data with one file; the browser sets the boundary. */
  upload<T>(path: string, field: string, file: File): Observable<T> {
    const form = new FormData();
    form.append(field, file, file.name);
    return this.http.post<T>(API_BASE + path, form).pipe(catchError(rethrow));
  }

  /** A CSV file as the request body (`Content-Type: text/csv`). */
  postCsv<T>(path: string, csv: string, params: Params = {}): Observable<T> {
    const headers = new HttpHeaders({ 'Content-Type': 'text/csv' });
    return this.http.post<T>(API_BASE + path, csv, { headers, params: toParams(params) }).pipe(catchError(rethrow));
  }

  /** Saves what a signed-in GET returns (a CSV export) as a file, the way a download link would. */
  download(path: string, fileName: string, params: Params = {}): Observable<void> {
    return this.http.get(API_BASE + path, { params: toParams(params), responseType: 'blob' }).pipe(
      map((blob) => {
        const url = URL.createObjectURL(blob);
        const link = Object.assign(document.createElement('a'), { href: url, download: fileName });
        link.click();
        setTimeout(() => URL.revokeObjectURL(url), 1000);
      }),
      catchError(rethrow),
    );
  }

  /** Bytes behind a signed-in URL (an `<img src>` cannot send the bearer token). */
  blob(url: string): Observable<Blob> {
    return this.http.get(url, { responseType: 'blob' }).pipe(catchError(rethrow));
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
