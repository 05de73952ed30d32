import { inject } from '@angular/core';
import { CanActivateFn, CanMatchFn, Router } from '@angular/router';
import { AuthSession } from '@tubwright/kit';
import { AreaName, canUse, homeFor } from './areas';

/** Console pages need a session; without one, go to sign-in and come back afterwards. */
export const signedIn: CanActivateFn = (_route, state) => {
  const auth = inject(AuthSession);
  if (auth.signedIn()) return true;
  return inject(Router).createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } });
};

/** The sign-in page is for signed-out visitors only. */
export const signedOut: CanMatchFn = () => {
  const auth = inject(AuthSession);
  return auth.signedIn() ? inject(Router).parseUrl(homeFor(auth.role())) : true;
};

/** The route matches only for roles that may use the area; others fall through to "not available". */
export function allowedFor(area: AreaName): CanMatchFn {
  return () => canUse(inject(AuthSession).role(), area);
}
