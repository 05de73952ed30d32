import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom } from 'rxjs';
import { AuthSession } from '../auth/auth-session';
import { SESSION_STORAGE_KEY, Session } from '../auth/session';
import { authInterceptor } from './auth-interceptor';

const session = (n: number): Session => ({
  accessToken: `access-${n}`,
  refreshToken: `refresh-${n}`,
  expiresIn: 900,
  user: { id: 1, email: 'owner@example.test', name: 'Olive Owner', role: 'owner' },
});

describe('authInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let auth: AuthSession;

  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([authInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    auth = TestBed.inject(AuthSession);
    auth.set(session(1));
  });

  afterEach(() => backend.verify());

  it('sends the bearer token to the API only', () => {
    http.get('/api/v1/animals').subscribe();
    http.get('/media/font.woff2').subscribe();
    expect(backend.expectOne('/api/v1/animals').request.headers.get('Authorization')).toBe('Bearer access-1');
    expect(backend.expectOne('/media/font.woff2').request.headers.has('Authorization')).toBe(false);
  });

  it('refreshes once on a 401 and retries with the new token', async () => {
    const result = firstValueFrom(http.get<{ ok: boolean }>('/api/v1/animals'));
    backend.expectOne('/api/v1/animals').flush({ error: { code: 'unauthorized', message: 'expired' } }, { status: 401, statusText: 'Unauthorized' });

    const refresh = backend.expectOne('/api/v1/auth/refresh');
    expect(refresh.request.body).toEqual({ refreshToken: 'refresh-1' });
    expect(refresh.request.headers.has('Authorization')).toBe(false);
    refresh.flush(session(2));

    const retry = backend.expectOne('/api/v1/animals');
    expect(retry.request.headers.get('Authorization')).toBe('Bearer access-2');
    retry.flush({ ok: true });

    expect(await result).toEqual({ ok: true });
    expect(JSON.parse(localStorage.getItem(SESSION_STORAGE_KEY)!).accessToken).toBe('access-2');
  });

  it('signs out when the refresh fails, and passes the 401 on', async () => {
    const result = firstValueFrom(http.get('/api/v1/animals')).catch((e: { status: number }) => e.status);
    backend.expectOne('/api/v1/animals').flush(null, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush(null, { status: 401, statusText: 'Unauthorized' });

    expect(await result).toBe(401);
    expect(auth.signedIn()).toBe(false);
    expect(localStorage.getItem(SESSION_STORAGE_KEY)).toBeNull();
  });

  it('does not loop when the retried request is refused again', async () => {
    const result = firstValueFrom(http.get('/api/v1/users')).catch((e: { status: number }) => e.status);
    backend.expectOne('/api/v1/users').flush(null, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush(session(2));
    backend.expectOne('/api/v1/users').flush(null, { status: 401, statusText: 'Unauthorized' });

    expect(await result).toBe(401);
    backend.expectNone('/api/v1/auth/refresh');
  });
});
