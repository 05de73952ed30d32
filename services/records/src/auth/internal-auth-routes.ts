import { Router } from 'express';
import {
  InternalPasswordResetRequest,
  InternalSessionRequest,
  LoginRequest,
  PasswordResetConfirm,
} from '../../../../shared/api/auth.js';
import { IdParams } from '../../../../shared/api/common.js';
import { json } from '../../../common/src/async-handler.js';
import { ApiError, NotFoundError, UnauthorizedError, ValidationError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { nowIso } from '../db/knex.js';
import { shopName } from '../orders/mail-notices.js';
import { hashPassword, verifyPassword } from '../users/passwords.js';
import { usersStore, type UserRow } from '../users/users-store.js';
import { afterFailure, isLocked } from './lockout.js';
import { passwordResetStore, RESET_TTL_MINUTES } from './password-reset-store.js';
import { resetMail } from './reset-mail.js';
import { sessionStore } from './session-store.js';

type LockableUser = UserRow & { failed_logins: number; locked_until: string | null };

const sessionUser = (row: UserRow) => ({ id: row.id, email: row.email, name: row.name, role: row.role, active: Boolean(row.active) });

/**
 * What only the gateway may ask (it signs with the system identity; nothing under /internal is
 * proxied): password checks with lockout, server-side sessions, password resets.
 */
export function internalAuthRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const users = usersStore(db);
  const sessions = sessionStore(db, deps.sessionTtlS ?? 7 * 24 * 3600);
  const resets = passwordResetStore(db);
  const router = Router();
  const system = allow();

  router.post(
    '/internal/auth/check',
    system,
    json(async (req) => {
      const { email, password } = parseOrThrow(LoginRequest, req.body);
      const row = (await users.findByEmail(email)) as LockableUser | undefined;
      if (row && isLocked(row.locked_until)) {
        throw new ApiError(429, 'account_locked', `Too many wrong passwords: this account is locked until ${row.locked_until!.slice(11, 16)} UTC. A password reset by e-mail unlocks it now.`);
      }
      const right = row ? await verifyPassword(password, row.password_hash) : false;
      if (row && !right) await db('users').where({ id: row.id }).update(afterFailure(row.failed_logins ?? 0));
      // Same answer for an unknown e-mail and a wrong password, so accounts cannot be probed.
      if (!row || !right || !row.active) throw new UnauthorizedError('E-mail or password is wrong, or the account is deactivated.');
      if (row.failed_logins) await db('users').where({ id: row.id }).update({ failed_logins: 0 });
      return { user: sessionUser(row), sessionId: await sessions.create(row.id) };
    }),
  );

  router.get(
    '/internal/users/:id',
    system,
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const row = await users.findById(id);
      if (!row) throw new NotFoundError('No such user.');
      return { user: sessionUser(row) };
    }),
  );

  router.post(
    '/internal/sessions/rotate',
    system,
    json(async (req) => {
      const { sessionId } = parseOrThrow(InternalSessionRequest, req.body);
      const turn = await sessions.rotate(sessionId);
      if (!turn.ok) {
        if (turn.reason === 'reused') await audit(db, req.identity, 'refresh token reused; sign-in ended', 'session', sessionId);
        throw new UnauthorizedError(turn.reason === 'reused' ? 'This refresh token was already used; the sign-in has been ended for safety. Sign in again.' : 'The session has ended; sign in again.');
      }
      const row = await users.findById(turn.userId);
      if (!row?.active) {
        await sessions.revoke(turn.sessionId);
        throw new UnauthorizedError('This account is deactivated.');
      }
      return { user: sessionUser(row), sessionId: turn.sessionId };
    }),
  );

  router.post(
    '/internal/sessions/revoke',
    system,
    json(async (req) => {
      const { sessionId } = parseOrThrow(InternalSessionRequest, req.body);
      return { revoked: await sessions.revoke(sessionId) };
    }),
  );

  router.post(
    '/internal/password-resets',
    system,
    json(async (req) => {
      const { email, link } = parseOrThrow(InternalPasswordResetRequest, req.body);
      const row = await users.findByEmail(email);
      if (row?.active) {
        const token = await resets.issue(row.id);
        const url = `${link}${link.includes('?') ? '&' : '?'}token=${encodeURIComponent(token)}`;
        // A mail failure is not told to the caller either: the answer must not reveal accounts.
        await deps.mailer.send(resetMail(row.name, row.email, url, await shopName(db), RESET_TTL_MINUTES)).catch(() => undefined);
        await audit(db, req.identity, 'password reset requested', 'user', row.id);
      }
      return { accepted: true as const, message: 'If that address belongs to an account, a reset link is on its way.' };
    }),
  );

  router.post(
    '/internal/password-resets/confirm',
    system,
    json(async (req) => {
      const { token, password } = parseOrThrow(PasswordResetConfirm, req.body);
      const passwordHash = await hashPassword(password);
      const userId = await db.transaction(async (trx) => {
        const id = await resets.spend(token, trx);
        if (id === null) return null;
        await trx('users').where({ id }).update({ password_hash: passwordHash, failed_logins: 0, locked_until: null, updated_at: nowIso() });
        return id;
      });
      if (userId === null) throw new ValidationError(`This reset link is unknown, already used or older than ${RESET_TTL_MINUTES} minutes; ask for a new one.`, 'token');
      // A new password ends every sign-in made with the old one.
      await sessions.revokeAllOf(userId);
      await audit(db, req.identity, 'password reset', 'user', userId);
      return { accepted: true as const, message: 'Password changed; sign in with the new one.' };
    }),
  );

  return router;
}

