import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LOCKOUT_AFTER_FAILURES } from '../../services/records/src/auth/lockout.js';
import { REUSE_LEEWAY_MS } from '../../services/records/src/auth/session-store.js';
import { gatewayTestStack } from './test-support.js';

let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
beforeAll(async () => {
  stack = await gatewayTestStack();
});
afterAll(() => stack.close());

const login = (email: string, password = 'tubwright-demo') => request(stack.app).post('/api/v1/auth/login').send({ email, password });
const refresh = (refreshToken: string) => request(stack.app).post('/api/v1/auth/refresh').send({ refreshToken });
const me = (token: string) => request(stack.app).get('/api/v1/auth/me').set('authorization', `Bearer ${token}`);

describe('refresh rotation', () => {
  it('spends a refresh token once and ends the sign-in when a spent one comes back', async () => {
    const first = (await login('keeper@demo.tubwright.test')).body;
    const second = await refresh(first.refreshToken);
    expect(second.status).toBe(200);
    expect(second.body.refreshToken).not.toBe(first.refreshToken);

    // Two module elements refreshing at once are forgiven for a few seconds.
    expect((await refresh(first.refreshToken)).status).toBe(200);
    // Later, the copied first token comes back: refused, and every successor dies with it.
    await stack.db('auth_sessions').whereNotNull('replaced_by').update({ revoked_at: new Date(Date.now() - REUSE_LEEWAY_MS - 1000).toISOString() });
    const replay = await refresh(first.refreshToken);
    expect(replay.status).toBe(401);
    expect(replay.body.error.message).toMatch(/already used/);
    expect((await refresh(second.body.refreshToken)).status).toBe(401);
  });
});

describe('sign-out', () => {
  it('stops both the access token and the refresh token at once', async () => {
    const session = (await login('sales@demo.tubwright.test')).body;
    expect((await me(session.accessToken)).status).toBe(200);
    const out = await request(stack.app).post('/api/v1/auth/logout').set('authorization', `Bearer ${session.accessToken}`).send({ refreshToken: session.refreshToken });
    expect(out.status).toBe(204);
    expect((await me(session.accessToken)).status).toBe(401);
    expect((await refresh(session.refreshToken)).status).toBe(401);
    // Another sign-in of the same user is untouched.
    expect((await me((await login('sales@demo.tubwright.test')).body.accessToken)).status).toBe(200);
  });

  it('needs a signed-in caller', async () => {
    expect((await request(stack.app).post('/api/v1/auth/logout').send({})).status).toBe(401);
  });
});

describe('lockout', () => {
  it(`locks an account after ${LOCKOUT_AFTER_FAILURES} wrong passwords, even against the right one, until a reset`, async () => {
    const email = 'builder@demo.tubwright.test';
    for (let i = 0; i < LOCKOUT_AFTER_FAILURES; i++) expect((await login(email, `wrong-${i}`)).status).toBe(401);
    const locked = await login(email);
    expect(locked.status).toBe(429);
    expect(locked.body.error.code).toBe('account_locked');

    await request(stack.app).post('/api/v1/auth/password-reset').send({ email }).expect(202);
    const token = resetTokenFor(email);
    const done = await request(stack.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'a-new-long-password' });
    expect(done.status).toBe(200);
    expect((await login(email, 'a-new-long-password')).status).toBe(200);
  });
});

describe('password reset', () => {
  it('answers the same for an unknown address and sends nothing', async () => {
    const before = stack.recordsMail.list().length;
    const res = await request(stack.app).post('/api/v1/auth/password-reset').send({ email: 'nobody@example.test' });
    expect(res.status).toBe(202);
    expect(res.body.message).toMatch(/If that address belongs to an account/);
    expect(stack.recordsMail.list().length).toBe(before);
  });

  it('mails a single-use link that ends earlier sign-ins', async () => {
    const email = 'keeper@demo.tubwright.test';
    const old = (await login(email)).body;
    await request(stack.app).post('/api/v1/auth/password-reset').send({ email }).expect(202);
    const token = resetTokenFor(email);
    const mail = stack.recordsMail.list().find((m) => m.to.includes(email))!;
    // The link points at the configured public address, not at whatever Host the request named.
    expect(mail.text).toContain('http://127.0.0.1:4300/reset-password?token=');

    const weak = await request(stack.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.field).toBe('password');

    expect((await request(stack.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'keeper-new-password' })).status).toBe(200);
    const again = await request(stack.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'keeper-other-password' });
    expect(again.status).toBe(400);
    expect(again.body.error.field).toBe('token');

    expect((await refresh(old.refreshToken)).status).toBe(401);
    expect((await login(email)).status).toBe(401);
    expect((await login(email, 'keeper-new-password')).status).toBe(200);
  });

  it('refuses an expired link', async () => {
    const email = 'owner@demo.tubwright.test';
    await request(stack.app).post('/api/v1/auth/password-reset').send({ email }).expect(202);
    const token = resetTokenFor(email);
    await stack.db('password_resets').update({ expires_at: new Date(Date.now() - 1000).toISOString() });
    const res = await request(stack.app).post('/api/v1/auth/password-reset/confirm').send({ token, password: 'owner-new-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/older than 30 minutes/);
  });
});

/** The token from the newest reset mail to this address (the mail catcher keeps newest first). */
function resetTokenFor(email: string): string {
  const mail = stack.recordsMail.list().find((m) => m.to.includes(email) && /reset your password/.test(m.subject));
  const match = mail?.text.match(/token=([\w-]+)/);
  if (!match) throw new Error(`no reset mail to ${email}`);
  return decodeURIComponent(match[1]!);
}
