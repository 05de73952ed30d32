import { Router } from 'express';
import type { Knex } from 'knex';
import { IdParams } from '../../../../shared/api/common.js';
import { CreateUserRequest, UpdateUserRequest, UserListQuery } from '../../../../shared/api/users.js';
import { json } from '../../../common/src/async-handler.js';
import { ConflictError, NotFoundError, UnauthorizedError, UnprocessableError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { audit } from '../audit/audit-log.js';
import { sessionStore } from '../auth/session-store.js';
import { hashPassword } from './passwords.js';
import { toUserView, usersStore } from './users-store.js';

function sessionUser(row: { id: number; email: string; name: string; role: 'owner' | 'builder' | 'keeper' | 'sales' }) {
  return { id: row.id, email: row.email, name: row.name, role: row.role };
}

export function usersRoutes(db: Knex): Router {
  const users = usersStore(db);
  const router = Router();

  router.get(
    '/api/v1/auth/me',
    allow('owner', 'builder', 'keeper', 'sales'),
    json(async (req) => {
      const row = await users.findById(Number(req.identity!.sub));
      if (!row || !row.active) throw new UnauthorizedError('This account no longer exists or is deactivated.');
      return { user: sessionUser(row) };
    }),
  );

  router.get(
    '/api/v1/users',
    allow('owner'),
    json(async (req) => users.list(parseOrThrow(UserListQuery, req.query, 'query'))),
  );

  router.get(
    '/api/v1/users/:id',
    allow('owner'),
    json(async (req) => {
      const row = await users.findById(parseOrThrow(IdParams, req.params).id);
      if (!row) throw new NotFoundError('No such user.');
      return toUserView(row);
    }),
  );

  router.post(
    '/api/v1/users',
    allow('owner'),
    json(async (req, res) => {
      const body = parseOrThrow(CreateUserRequest, req.body);
      if (await users.findByEmail(body.email)) throw new ConflictError('A user with this e-mail exists.', 'email');
      const row = await users.create({ ...body, passwordHash: await hashPassword(body.password) });
      await audit(db, req.identity, 'create', 'user', row.id, { email: row.email, role: row.role });
      res.status(201);
      return toUserView(row);
    }),
  );

  router.patch(
    '/api/v1/users/:id',
    allow('owner'),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdateUserRequest, req.body);
      const row = await users.findById(id);
      if (!row) throw new NotFoundError('No such user.');
      const losesOwner = row.role === 'owner' && Boolean(row.active) && (body.active === false || (body.role && body.role !== 'owner'));
      if (losesOwner && (await users.countActiveOwners()) <= 1) {
        throw new UnprocessableError('The shop must keep at least one active owner.', body.active === false ? 'active' : 'role');
      }
      const updated = await users.update(id, {
        ...(body.name !== undefined && { name: body.name }),
        ...(body.role !== undefined && { role: body.role }),
        ...(body.active !== undefined && { active: body.active }),
        ...(body.password !== undefined && { password_hash: await hashPassword(body.password) }),
      });
      // A new password, a new role or a deactivation ends the user's sign-ins (the access token lapses within minutes).
      if (body.password !== undefined || body.active === false || (body.role !== undefined && body.role !== row.role)) {
        await sessionStore(db, 0).revokeAllOf(id);
      }
      await audit(db, req.identity, 'update', 'user', id, { ...body, password: body.password ? '(changed)' : undefined });
      return toUserView(updated!);
    }),
  );

  return router;
}
