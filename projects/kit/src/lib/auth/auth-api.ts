import { Injectable, inject } from '@angular/core';
import { Observable, tap } from 'rxjs';
import { ApiClient } from '../api/api-client';
import { AuthSession } from './auth-session';
import { Session, SessionUser } from './session';

@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly api = inject(ApiClient);
  private readonly auth = inject(AuthSession);

  signIn(email: string, password: string): Observable<Session> {
    return this.api.post<Session>('/auth/login', { email, password }).pipe(tap((s) => this.auth.set(s)));
  }

  me(): Observable<{ user: SessionUser }> {
    return this.api.get<{ user: SessionUser }>('/auth/me');
  }

  signOut(): void {
    this.auth.clear();
  }
}
