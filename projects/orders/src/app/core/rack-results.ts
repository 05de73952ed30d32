import { Injectable, inject } from '@angular/core';
import { Observable, shareReplay } from 'rxjs';
import { OrdersApi } from './orders-api';
import type { RackPlanResponse } from './orders-types';

/**
 * Rack-plan results for the specs of quoted racks, computed by the calculator and kept for the
 * session: the doorway check and batch cutting ask for the same racks again and again.
 */
@Injectable({ providedIn: 'root' })
export class RackResults {
  private readonly api = inject(OrdersApi);
  private readonly cache = new Map<string, Observable<RackPlanResponse>>();

  /**
   * Parts, sections and checks of a spec. `nested` also nests the rack on its own, so its sheet
   * count is a real layout rather than an area estimate (batch cutting compares against it).
   */
  resultFor(spec: Record<string, unknown>, nested = false): Observable<RackPlanResponse> {
    const body = { ...spec, cutting: nested ? { include: true, timeLimitMs: 500 } : { include: false } };
    const key = JSON.stringify(body);
    let result = this.cache.get(key);
    if (!result) {
      result = this.api.post<RackPlanResponse>('/calc/rack-plan', body).pipe(shareReplay({ bufferSize: 1, refCount: false }));
      this.cache.set(key, result);
      // A failed request is not kept: the next caller tries again.
      result.subscribe({ error: () => this.cache.delete(key) });
    }
    return result;
  }
}
