import { HttpErrorResponse, HttpInterceptorFn, HttpRequest } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, defer, switchMap, throwError } from 'rxjs';
import { AuthSession } from '../auth/auth-session';
import { TokenRefresher } from '../auth/token-refresher';
import { isApiUrl, isAuthUrl } from './api-paths';

/** Adds the bearer token to API calls; on a 401 refreshes the session once and retries once. */
export const authInterceptor: HttpInterceptorFn = (req, next) => {
  if (!isApiUrl(req.url) || isAuthUrl(req.url)) return next(req);
  const auth = inject(AuthSession);
  const refresher = inject(TokenRefresher);
  const token = auth.accessToken();

  return next(withBearer(req, token)).pipe(
    catchError((error: unknown) => {
      if (!(error instanceof HttpErrorResponse) || error.status !== 401 || !auth.session()) {
        return throwError(() => error);
      }
      return defer(() => refresher.refresh(token)).pipe(
        catchError(() => {
          auth.clear();
          return throwError(() => error);
        }),
        // The retried request goes straight to `next`: a second 401 reaches the caller.
        switchMap((session) => next(withBearer(req, session.accessToken))),
      );
    }),
  );
};

function withBearer(req: HttpRequest<unknown>, token: string | null): HttpRequest<unknown> {
  return token ? req.clone({ setHeaders: { Authorization: `Bearer ${token}` } }) : req;
}
