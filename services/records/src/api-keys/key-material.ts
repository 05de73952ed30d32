import { createHash, randomBytes } from 'node:crypto';

/**
 * Keys are 32 random bytes behind a readable prefix. They carry full entropy, so a fast hash is
 * enough to store them (a slow password hash would only slow every API call).
 */
export function newApiKey(kind: 'publishable' | 'secret'): { key: string; prefix: string; hash: string } {
  const key = `${kind === 'publishable' ? 'tw_pk' : 'tw_sk'}_${randomBytes(32).toString('base64url')}`;
  return { key, prefix: key.slice(0, 12), hash: hashApiKey(key) };
}

export const hashApiKey = (key: string): string => createHash('sha256').update(key).digest('hex');
