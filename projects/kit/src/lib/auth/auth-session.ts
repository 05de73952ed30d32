import { DOCUMENT, Injectable, computed, inject, signal } from '@angular/core';
import { SESSION_EVENT, SESSION_STORAGE_KEY, Session, parseStoredSession } from './session';

/**
 * The signed-in session of this app. Every Angular app on the page (shell and module elements)
 * has its own instance; they agree through localStorage and a window event.
 */
@Injectable({ providedIn: 'root' })
export class AuthSession {
  private readonly window = inject(DOCUMENT).defaultView;
  private readonly state = signal<Session | null>(this.readStored());

  readonly session = this.state.asReadonly();
  readonly user = computed(() => this.state()?.user ?? null);
  readonly role = computed(() => this.state()?.user.role ?? null);
  readonly signedIn = computed(() => this.state() !== null);

  constructor() {
    this.window?.addEventListener(SESSION_EVENT, (event) => {
      const next = (event as CustomEvent<Session | null>).detail ?? null;
      if (!sameTokens(next, this.state())) this.state.set(next);
    });
    this.window?.addEventListener('storage', (event) => {
      if (event.key === SESSION_STORAGE_KEY) this.state.set(parseStoredSession(event.newValue));
    });
  }

  accessToken(): string | null {
    return this.state()?.accessToken ?? null;
  }

  /** A new session from sign-in or refresh: store it and tell the other apps on the page. */
  set(session: Session): void {
    this.state.set(session);
    this.store(session);
    this.broadcast(session);
  }

  /** A session handed in by the shell: take it over without echoing it back. */
  adopt(session: Session | null): void {
    if (!sameTokens(session, this.state())) this.state.set(session);
  }

  clear(): void {
    this.state.set(null);
    this.store(null);
    this.broadcast(null);
  }

  /** The session another app on the page may have stored since this one last looked. */
  readStored(): Session | null {
    try {
      return parseStoredSession(this.window?.localStorage.getItem(SESSION_STORAGE_KEY) ?? null);
    } catch {
      return null;
    }
  }

  private store(session: Session | null): void {
    try {
      if (session) this.window?.localStorage.setItem(SESSION_STORAGE_KEY, JSON.stringify(session));
      else this.window?.localStorage.removeItem(SESSION_STORAGE_KEY);
    } catch {
      // Storage may be disabled (private mode, embedded widget); the in-memory session still works.
    }
  }

  private broadcast(session: Session | null): void {
    this.window?.dispatchEvent(new CustomEvent(SESSION_EVENT, { detail: session }));
  }
}

function sameTokens(a: Session | null, b: Session | null): boolean {
  return a?.accessToken === b?.accessToken && a?.refreshToken === b?.refreshToken;
}
