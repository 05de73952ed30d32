import { ElementRef, Signal, effect, inject } from '@angular/core';
import { AuthSession } from '../auth/auth-session';
import { Session } from '../auth/session';
import { navigateEvent } from './shell-bridge';

/** For a module element's root: asks the shell to show another sub-path of this module. */
export function injectShellNavigate(): (path: string, options?: { replace?: boolean }) => void {
  const host: HTMLElement = inject(ElementRef).nativeElement;
  return (path, options = {}) => host.dispatchEvent(navigateEvent({ path, replace: options.replace ?? false }));
}

/** For a module element's root: uses the session the shell hands in (property `session`). */
export function adoptShellSession(session: Signal<Session | null | undefined>): void {
  const auth = inject(AuthSession);
  effect(() => {
    const current = session();
    if (current) auth.adopt(current);
  });
}
