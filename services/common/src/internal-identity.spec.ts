import { describe, expect, it } from 'vitest';
import { signIdentity, verifyIdentity } from './internal-identity.js';

const secret = 'test-internal-secret';
const who = { kind: 'user' as const, sub: '7', role: 'keeper' as const, email: 'k@example.test' };

describe('signed identity header', () => {
  it('round-trips an identity signed with the shared secret', () => {
    expect(verifyIdentity(signIdentity(who, secret, 1000), secret, 1010)).toMatchObject(who);
  });

  it('refuses another secret, a changed payload, a missing signature and an old header', () => {
    const header = signIdentity(who, secret, 1000);
    expect(verifyIdentity(header, 'other-secret', 1000)).toBeNull();
    const [payload, mac] = header.split('.');
    const forged = Buffer.from(JSON.stringify({ ...who, role: 'owner', iat: 1000 })).toString('base64url');
    expect(verifyIdentity(`${forged}.${mac}`, secret, 1000)).toBeNull();
    expect(verifyIdentity(payload, secret, 1000)).toBeNull();
    expect(verifyIdentity(header, secret, 1000 + 61)).toBeNull();
    expect(verifyIdentity(undefined, secret)).toBeNull();
  });
});
