import { randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { nowIso } from '../db/knex.js';

interface SessionRow {
  id: string;
  user_id: number;
  family: string;
  expires_at: string;
  revoked_at: string | null;
  replaced_by: string | null;
}

const newId = () => randomBytes(18).toString('base64url');

/**
 * Several module elements on one page may refresh with the same token at the same moment; a
 * spent token presented again this soon after its rotation is taken as that race, not a theft.
 */
export const REUSE_LEEWAY_MS = 15_000;

export type Rotation = { ok: true; userId: number; sessionId: string } | { ok: false; reason: 'unknown' | 'expired' | 'revoked' | 'reused' };

/**
 * Sign-ins kept on the server so a refresh token can be spent once and a sign-out ends it.
 * A spent token presented again means it was copied: the whole family is revoked.
 */
export function sessionStore(db: Knex, ttlS: number) {
  const expiry = () => new Date(Date.now() + ttlS * 1000).toISOString();
  return {
    async create(userId: number, family = newId()): Promise<string> {
      const id = newId();
      const now = nowIso();
      await db('auth_sessions').insert({ id, user_id: userId, family, expires_at: expiry(), created_at: now, updated_at: now });
      return id;
    },

    async rotate(id: string): Promise<Rotation> {
      return db.transaction(async (trx) => {
        const row = (await trx<SessionRow>('auth_sessions').where({ id }).first()) as SessionRow | undefined;
        if (!row) return { ok: false, reason: 'unknown' } as const;
        const now = nowIso();
        if (row.replaced_by && row.revoked_at && Date.parse(row.revoked_at) > Date.now() - REUSE_LEEWAY_MS) {
          const successor = (await trx<SessionRow>('auth_sessions').where({ id: row.replaced_by }).first()) as SessionRow | undefined;
          if (successor && !successor.revoked_at) {
            const twin = newId();
            await trx('auth_sessions').insert({ id: twin, user_id: row.user_id, family: row.family, expires_at: successor.expires_at, created_at: now, updated_at: now });
            return { ok: true, userId: row.user_id, sessionId: twin } as const;
          }
        }
        if (row.replaced_by) {
          await trx('auth_sessions').where({ family: row.family }).whereNull('revoked_at').update({ revoked_at: now, updated_at: now });
          return { ok: false, reason: 'reused' } as const;
        }
        if (row.revoked_at) return { ok: false, reason: 'revoked' } as const;
        if (row.expires_at <= now) return { ok: false, reason: 'expired' } as const;
        const next = newId();
        await trx('auth_sessions').insert({ id: next, user_id: row.user_id, family: row.family, expires_at: expiry(), created_at: now, updated_at: now });
        await trx('auth_sessions').where({ id }).update({ replaced_by: next, revoked_at: now, updated_at: now });
        return { ok: true, userId: row.user_id, sessionId: next } as const;
      });
    },

    /** Ends one sign-in (its whole rotation family). */
    async revoke(id: string): Promise<boolean> {
      const row = (await db<SessionRow>('auth_sessions').where({ id }).first()) as SessionRow | undefined;
      if (!row) return false;
      const now = nowIso();
      await db('auth_sessions').where({ family: row.family }).whereNull('revoked_at').update({ revoked_at: now, updated_at: now });
      return true;
    },

    async revokeAllOf(userId: number): Promise<void> {
      const now = nowIso();
      await db('auth_sessions').where({ user_id: userId }).whereNull('revoked_at').update({ revoked_at: now, updated_at: now });
    },
  };
}
