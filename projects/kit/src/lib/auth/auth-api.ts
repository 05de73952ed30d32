import { HttpBackend, HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, tap } from 'rxjs';
import { ApiClient } from '../api/api-client';
import { API_BASE } from '../api/api-paths';
import { AuthSession } from './auth-session';
import { Session, SessionUser } from './session';

@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly api = inject(ApiClient);
  private readonly auth = inject(AuthSession);
  // Sign-out skips the interceptor: a refused token must not start a refresh on the way out.
  private readonly bare = new HttpClient(inject(HttpBackend));

  signIn(email: string, password: string): Observable<Session> {
    return this.api.post<Session>('/auth/login', { email, password }).pipe(tap((s) => this.auth.set(s)));
  }

  me(): Observable<{ user: SessionUser }> {
    return this.api.get<{ user: SessionUser }>('/auth/me');
  }

  /** Ends the session on the server too (so a copied token stops working), then forgets it here whatever the answer. */
  signOut(): void {
    const session = this.auth.session();
    this.auth.clear();
    if (!session) return;
    this.bare
      .post<void>(`${API_BASE}/auth/logout`, { refreshToken: session.refreshToken }, { headers: { authorization: `Bearer ${session.accessToken}` } })
      .subscribe({ error: () => undefined });
  }

  /** Mails a single-use reset link; the answer is the same whether or not the address has an account. */
  requestPasswordReset(email: string): Observable<{ accepted: true; message: string }> {
    return this.api.post('/auth/password-reset', { email });
  }

  resetPassword(token: string, password: string): Observable<{ accepted: true; message: string }> {
    return this.api.post('/auth/password-reset/confirm', { token, password });
  }
}
