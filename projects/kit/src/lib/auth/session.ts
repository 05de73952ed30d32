import type { z } from 'zod';
import type { SessionResponse, SessionUser as SessionUserSchema } from '@tubwright/shared/api/auth';
import type { RoleName } from '@tubwright/shared/api/common';

export type Role = RoleName;
export type SessionUser = z.infer<typeof SessionUserSchema>;

/** What the shell hands to every module element (property `session`) and keeps in localStorage. */
export type Session = z.infer<typeof SessionResponse>;

/** localStorage key shared by the shell and elements running alone in development. */
export const SESSION_STORAGE_KEY = 'tw.session';

/** Window event every app on the page listens to, so a refresh made by one is seen by all. */
export const SESSION_EVENT = 'tw-session';

export function isSession(value: unknown): value is Session {
  if (!value || typeof value !== 'object') return false;
  const v = value as Partial<Session>;
  return (
    typeof v.accessToken === 'string' &&
    typeof v.refreshToken === 'string' &&
    !!v.user &&
    typeof v.user.email === 'string' &&
    typeof v.user.role === 'string'
  );
}

export function parseStoredSession(raw: string | null): Session | null {
  if (!raw) return null;
  try {
    const value: unknown = JSON.parse(raw);
    return isSession(value) ? value : null;
  } catch {
    return null;
  }
}
