import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

describe('users and password checks', () => {
  it('refuses a request that did not come through the gateway', async () => {
    const res = await request(ctx.app).get('/api/v1/users');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
  });

  it('accepts the demo password and refuses a wrong one with the same message for unknown accounts', async () => {
    const gateway = asRole('system');
    const ok = await request(ctx.app).post('/internal/auth/check').set(gateway).send({ email: 'KEEPER@demo.tubwright.test', password: 'tubwright-demo' });
    expect(ok.status).toBe(200);
    expect(ok.body.user).toMatchObject({ email: 'keeper@demo.tubwright.test', role: 'keeper', active: true });
    const wrong = await request(ctx.app).post('/internal/auth/check').set(gateway).send({ email: 'keeper@demo.tubwright.test', password: 'nope' });
    const unknown = await request(ctx.app).post('/internal/auth/check').set(gateway).send({ email: 'ghost@demo.tubwright.test', password: 'nope' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
  });

  it('answers password checks only to the gateway itself, not to a signed-in user', async () => {
    const res = await request(ctx.app).post('/internal/auth/check').set(asRole('owner')).send({ email: 'a@b.test', password: 'x' });
    expect(res.status).toBe(403);
  });

  it('lets the owner create a user, refuses a duplicate and names the bad field', async () => {
    const owner = asRole('owner');
    const created = await request(ctx.app).post('/api/v1/users').set(owner).send({ email: 'new.builder@example.test', name: 'New Builder', role: 'builder', password: 'long-enough-pw' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ email: 'new.builder@example.test', role: 'builder', active: true });
    expect(created.body).not.toHaveProperty('passwordHash');
    const again = await request(ctx.app).post('/api/v1/users').set(owner).send({ email: 'new.builder@example.test', name: 'Twice', role: 'builder', password: 'long-enough-pw' });
    expect(again.status).toBe(409);
    const bad = await request(ctx.app).post('/api/v1/users').set(owner).send({ email: 'x@example.test', name: 'X', role: 'wizard', password: 'long-enough-pw' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('role');
  });

  it('forbids users management to every role but owner', async () => {
    for (const role of ['builder', 'keeper', 'sales'] as const) {
      const res = await request(ctx.app).get('/api/v1/users').set(asRole(role));
      expect(res.status, role).toBe(403);
    }
  });

  it('deactivates a user, after which the password check fails, and keeps the last owner', async () => {
    const owner = asRole('owner');
    const list = await request(ctx.app).get('/api/v1/users?q=sales').set(owner);
    const sales = list.body.items[0];
    const patched = await request(ctx.app).patch(`/api/v1/users/${sales.id}`).set(owner).send({ active: false });
    expect(patched.body.active).toBe(false);
    const check = await request(ctx.app).post('/internal/auth/check').set(asRole('system')).send({ email: 'sales@demo.tubwright.test', password: 'tubwright-demo' });
    expect(check.status).toBe(401);
    const owners = await request(ctx.app).get('/api/v1/users?q=owner@').set(owner);
    const lastOwner = await request(ctx.app).patch(`/api/v1/users/${owners.body.items[0].id}`).set(owner).send({ role: 'keeper' });
    expect(lastOwner.status).toBe(422);
    expect(lastOwner.body.error.field).toBe('role');
    const audit = await ctx.db('audit_log').where({ entity: 'user', action: 'update' });
    expect(audit.length).toBeGreaterThan(0);
  });
});
