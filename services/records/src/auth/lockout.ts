/**
 * After this many wrong passwords in a row an account is locked for a while. Ten attempts and a
 * lock measured in minutes follow OWASP's authentication guidance (common practice): enough for
 * typing slips, far too few for guessing.
 */
export const LOCKOUT_AFTER_FAILURES = 10;
export const LOCKOUT_MINUTES = 15;

export function isLocked(lockedUntil: string | null | undefined, now = new Date()): boolean {
  return Boolean(lockedUntil && lockedUntil > now.toISOString());
}

/** The user's counters after one more wrong password. */
export function afterFailure(failedLogins: number, now = new Date()): { failed_logins: number; locked_until: string | null } {
  const failed = failedLogins + 1;
  if (failed < LOCKOUT_AFTER_FAILURES) return { failed_logins: failed, locked_until: null };
  return { failed_logins: 0, locked_until: new Date(now.getTime() + LOCKOUT_MINUTES * 60_000).toISOString() };
}
