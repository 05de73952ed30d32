import { HttpBackend, HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, finalize, of, shareReplay, tap } from 'rxjs';
import { API_BASE } from '../api/api-paths';
import { AuthSession } from './auth-session';
import { Session } from './session';

/** Exchanges the refresh token for a new session; concurrent callers share one request. */
@Injectable({ providedIn: 'root' })
export class TokenRefresher {
  // Built on the backend directly so the refresh call itself skips the auth interceptor.
  private readonly http = new HttpClient(inject(HttpBackend));
  private readonly auth = inject(AuthSession);
  private inFlight: Observable<Session> | null = null;

  /** `failedToken` is the access token the server refused. */
  refresh(failedToken: string | null): Observable<Session> {
    // Another app on the page may already have refreshed: use its session instead of refreshing again.
    const stored = this.auth.readStored();
    if (stored && stored.accessToken !== failedToken) {
      this.auth.adopt(stored);
      return of(stored);
    }
    const current = this.auth.session();
    if (!current) throw new Error('No session to refresh');
    if (!this.inFlight) {
      this.inFlight = this.http
        .post<Session>(`${API_BASE}/auth/refresh`, { refreshToken: current.refreshToken })
        .pipe(
          tap((session) => this.auth.set(session)),
          finalize(() => (this.inFlight = null)),
          shareReplay({ bufferSize: 1, refCount: false }),
        );
    }
    return this.inFlight;
  }
}
