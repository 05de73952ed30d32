import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { API_BASE, ApiClient, ListQuery, Page, toApiError } from '@tubwright/kit';
import { Observable, catchError, map, throwError } from 'rxjs';
import { TubModel, TubModelPhoto } from '../tub-models/tub-model';
import { MaterialInput, Plan, PlanComparison, PlanListItem, PlanVersionListItem, PriceListItem, RackPlanRequest, RackPlanResponse, ShopMaterial } from './plan-types';

export type TubModelInput = Omit<TubModel, 'id' | 'photoId'>;

export interface PlanWrite {
  name?: string;
  notes?: string;
  tubModelId?: number | null;
  status?: 'active' | 'archived';
  spec?: RackPlanRequest;
}

/** Every call the planning module makes, in one place. */
@Injectable({ providedIn: 'root' })
export class PlanApi {
  private readonly api = inject(ApiClient);
  private readonly http = inject(HttpClient);

  calculate(spec: RackPlanRequest): Observable<RackPlanResponse> {
    return this.api.post<RackPlanResponse>('/calc/rack-plan', spec);
  }

  list(query: ListQuery, status: 'active' | 'archived' | null): Observable<Page<PlanListItem>> {
    return this.api.get<Page<PlanListItem>>('/plans', {
      limit: query.limit,
      offset: query.offset,
      sort: query.sort || undefined,
      q: query.q.trim() || undefined,
      status: status ?? undefined,
    });
  }

  get(id: number): Observable<Plan> {
    return this.api.get<Plan>(`/plans/${id}`);
  }

  create(body: { name: string; notes: string; tubModelId: number | null; spec: RackPlanRequest }): Observable<Plan> {
    return this.api.post<Plan>('/plans', body);
  }

  update(id: number, body: PlanWrite): Observable<Plan> {
    return this.api.patch<Plan>(`/plans/${id}`, body);
  }

  duplicate(id: number, name?: string): Observable<Plan> {
    return this.api.post<Plan>(`/plans/${id}/duplicate`, name ? { name } : {});
  }

  versions(id: number): Observable<Page<PlanVersionListItem>> {
    return this.api.get<Page<PlanVersionListItem>>(`/plans/${id}/versions`, { limit: 50, sort: '-version' });
  }

  version(id: number, version: number): Observable<PlanVersionListItem & { spec: RackPlanRequest; result: RackPlanResponse }> {
    return this.api.get(`/plans/${id}/versions/${version}`);
  }

  /** Two plans side by side, every length in plan A's unit. */
  compare(a: number, b: number): Observable<PlanComparison> {
    return this.api.get<PlanComparison>(`/plans/${a}/compare/${b}`);
  }

  priceList(): Observable<PriceListItem[]> {
    return this.api.get<{ items: PriceListItem[] }>('/price-list').pipe(map((r) => r.items));
  }

  updatePrices(items: Array<{ key: string; price: number | null }>): Observable<PriceListItem[]> {
    return this.http.put<{ items: PriceListItem[] }>(`${API_BASE}/price-list`, { items }).pipe(
      map((r) => r.items),
      catchError((e: unknown) => throwError(() => toApiError(e))),
    );
  }

  materials(): Observable<ShopMaterial[]> {
    return this.api.get<{ items: ShopMaterial[] }>('/materials').pipe(map((r) => r.items));
  }

  /** Replaces the whole material (the API's PUT); its price is mirrored to the price list. */
  putMaterial(key: string, body: MaterialInput): Observable<ShopMaterial> {
    return this.http.put<ShopMaterial>(`${API_BASE}/materials/${encodeURIComponent(key)}`, body).pipe(catchError((e: unknown) => throwError(() => toApiError(e))));
  }

  /** Tub models for the editor's picker: the first 200 by name is every shop's whole list. */
  tubModels(): Observable<TubModel[]> {
    return this.api.get<Page<TubModel>>('/tub-models', { limit: 200, sort: 'name' }).pipe(map((p) => p.items));
  }

  tubModel(id: number): Observable<TubModel> {
    return this.api.get<TubModel>(`/tub-models/${id}`);
  }

  saveTubModel(id: number | null, body: TubModelInput): Observable<TubModel> {
    return id === null ? this.api.post<TubModel>('/tub-models', body) : this.api.patch<TubModel>(`/tub-models/${id}`, body);
  }

  /** Retiring is the API's soft delete: plans sized for the tub keep their numbers. */
  retireTubModel(id: number): Observable<void> {
    return this.http.delete<void>(`${API_BASE}/tub-models/${id}`).pipe(catchError((e: unknown) => throwError(() => toApiError(e))));
  }

  /** Uploads (or replaces) a tub model's photo, with the small copy lists show when there is one. */
  uploadTubModelPhoto(id: number, photo: Blob, photoName: string, thumbnail: Blob | null): Observable<TubModelPhoto> {
    const body = new FormData();
    body.append('photo', photo, photoName);
    if (thumbnail) body.append('thumbnail', thumbnail, 'thumbnail.jpg');
    return this.api.post<TubModelPhoto>(`/tub-models/${id}/photo`, body);
  }

  removeTubModelPhoto(id: number): Observable<void> {
    return this.http.delete<void>(`${API_BASE}/tub-models/${id}/photo`).pipe(catchError((e: unknown) => throwError(() => toApiError(e))));
  }

  /** A file behind the bearer token (build sheet, cut list), as a Blob to hand to the browser. */
  file(path: string): Observable<Blob> {
    return this.http.get(`${API_BASE}${path}`, { responseType: 'blob' }).pipe(catchError((e: unknown) => throwError(() => toApiError(e))));
  }
}

/** Lets the browser save a Blob under a file name (the element cannot link to a URL that needs a token). */
export function saveBlob(blob: Blob, fileName: string, doc: Document = document): void {
  const url = URL.createObjectURL(blob);
  const link = doc.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  doc.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
