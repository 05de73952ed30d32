import { createHash, randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { nowIso } from '../db/knex.js';

/** A reset link is good for this long and for one use. */
export const RESET_TTL_MINUTES = 30;

const hashToken = (token: string) => createHash('sha256').update(token).digest('base64url');

export function passwordResetStore(db: Knex) {
  return {
    /** A new token for the user; only its hash is stored. Earlier unused tokens stop working. */
    async issue(userId: number): Promise<string> {
      const token = randomBytes(32).toString('base64url');
      const now = nowIso();
      await db('password_resets').where({ user_id: userId }).whereNull('used_at').update({ used_at: now, updated_at: now });
      await db('password_resets').insert({
        user_id: userId,
        token_hash: hashToken(token),
        expires_at: new Date(Date.now() + RESET_TTL_MINUTES * 60_000).toISOString(),
        created_at: now,
        updated_at: now,
      });
      return token;
    },

    /** Marks the token used and answers its user, or null when it is unknown, used or expired. */
    async spend(token: string, trx: Knex.Transaction): Promise<number | null> {
      const now = nowIso();
      const row = (await trx('password_resets').where({ token_hash: hashToken(token) }).first()) as
        | { id: number; user_id: number; expires_at: string; used_at: string | null }
        | undefined;
      if (!row || row.used_at || row.expires_at <= now) return null;
      // The guard on used_at makes two racing uses of one token spend it once.
      const changed = await trx('password_resets').where({ id: row.id }).whereNull('used_at').update({ used_at: now, updated_at: now });
      return changed === 1 ? row.user_id : null;
    },
  };
}
