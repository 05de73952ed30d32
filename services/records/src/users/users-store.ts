import type { Knex } from 'knex';
import type { RoleName } from '../../../../shared/api/common.js';
import { insertId, nowIso } from '../db/knex.js';
import { listPage, type ListParams } from '../lib/list.js';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  role: RoleName;
  password_hash: string;
  active: number | boolean;
  created_at: string;
  updated_at: string;
}

export interface UserView {
  id: number;
  email: string;
  name: string;
  role: RoleName;
  active: boolean;
  createdAt: string;
  updatedAt: string;
}

export function toUserView(row: UserRow): UserView {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    active: Boolean(row.active),
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

export function usersStore(db: Knex) {
  return {
    findByEmail: (email: string) => db<UserRow>('users').where({ email }).first(),
    findById: (id: number) => db<UserRow>('users').where({ id }).first(),
    list: (params: ListParams) =>
      listPage<UserRow, UserView>(db('users'), params, {
        columns: { email: 'email', name: 'name', role: 'role', createdAt: 'created_at' },
        searchColumns: ['email', 'name'],
        defaultSort: 'email',
        toItem: toUserView,
      }),
    async create(user: { email: string; name: string; role: RoleName; passwordHash: string }): Promise<UserRow> {
      const now = nowIso();
      const id = await insertId(db('users'), {
        email: user.email,
        name: user.name,
        role: user.role,
        password_hash: user.passwordHash,
        active: true,
        created_at: now,
        updated_at: now,
      });
      return (await db<UserRow>('users').where({ id }).first())!;
    },
    async update(id: number, patch: Partial<Pick<UserRow, 'name' | 'role' | 'active' | 'password_hash'>>): Promise<UserRow | undefined> {
      await db('users').where({ id }).update({ ...patch, updated_at: nowIso() });
      return db<UserRow>('users').where({ id }).first();
    },
    countActiveOwners: async () =>
      Number(((await db('users').where({ role: 'owner', active: true }).count({ n: '*' }).first()) as { n: number }).n),
  };
}
