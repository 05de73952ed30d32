import { z } from 'zod';
import { AuditPage, AuditQuery } from '../../../shared/api/audit.js';
import { AcceptedResponse, LoginRequest, LogoutRequest, MeResponse, PasswordResetConfirm, PasswordResetRequest, RefreshRequest, SessionResponse } from '../../../shared/api/auth.js';
import { Animal, AnimalListQuery, AnimalPage, CreateAnimalRequest, UpdateAnimalRequest } from '../../../shared/api/animals.js';
import { IdParams } from '../../../shared/api/common.js';
import { CreateCustomerRequest, Customer, CustomerListQuery, CustomerPage, UpdateCustomerRequest } from '../../../shared/api/customers.js';
import { HealthResponse } from '../../../shared/api/health.js';
import { MailListQuery, MailMessage, MailPage } from '../../../shared/api/mail.js';
import { CreateTubModelRequest, TubModel, TubModelListQuery, TubModelPage, TubModelPhoto, UpdateTubModelRequest } from '../../../shared/api/tub-models.js';
import { CreateUserRequest, UpdateUserRequest, User, UserListQuery, UserPage } from '../../../shared/api/users.js';
import { documentRoutes, type RouteDoc } from './route-catalog.js';

type Resource = {
  path: string;
  tag: string;
  noun: string;
  item: z.ZodType;
  page: z.ZodType;
  listQuery: z.ZodObject;
  create: z.ZodType;
  update: z.ZodType;
  read: string[];
  write: string[];
  deletable?: boolean;
};

/** The five routes of a plain business table (list, read, create, update, soft delete). */
export function resourceDocs(r: Resource): RouteDoc[] {
  const docs: RouteDoc[] = [
    { method: 'get', path: `/api/v1/${r.path}`, tag: r.tag, summary: `List ${r.noun}s`, roles: r.read, query: r.listQuery, success: { status: 200, schema: r.page, description: 'One page' } },
    { method: 'get', path: `/api/v1/${r.path}/:id`, tag: r.tag, summary: `Read one ${r.noun}`, roles: r.read, params: IdParams, success: { status: 200, schema: r.item, description: r.noun }, errors: [404] },
    { method: 'post', path: `/api/v1/${r.path}`, tag: r.tag, summary: `Create a ${r.noun}`, roles: r.write, body: r.create, success: { status: 201, schema: r.item, description: 'Created' }, errors: [409] },
    { method: 'patch', path: `/api/v1/${r.path}/:id`, tag: r.tag, summary: `Change a ${r.noun}`, roles: r.write, params: IdParams, body: r.update, success: { status: 200, schema: r.item, description: 'Changed' }, errors: [404] },
  ];
  if (r.deletable !== false) {
    docs.push({ method: 'delete', path: `/api/v1/${r.path}/:id`, tag: r.tag, summary: `Remove a ${r.noun} (kept in history)`, roles: r.write, params: IdParams, success: { status: 204, description: 'Removed' }, errors: [404] });
  }
  return docs;
}

documentRoutes(
  { method: 'get', path: '/api/v1/health', tag: 'system', summary: 'Health of the gateway and every service', roles: [], success: { status: 200, schema: HealthResponse, description: 'Health report' } },
  {
    method: 'post', path: '/api/v1/auth/login', tag: 'auth', summary: 'Sign in with e-mail and password', roles: [], body: LoginRequest,
    bodyExample: { email: 'owner@demo.tubwright.test', password: 'tubwright-demo' },
    success: { status: 200, schema: SessionResponse, description: 'A new session' }, errors: [429],
    description: 'Attempts are rate-limited per address and account; after ten wrong passwords in a row the account is locked for 15 minutes (429 `account_locked`) or until a password reset.',
  },
  {
    method: 'post', path: '/api/v1/auth/refresh', tag: 'auth', summary: 'Exchange a refresh token for a new session', roles: [], body: RefreshRequest, success: { status: 200, schema: SessionResponse, description: 'A new session' }, errors: [429],
    description: 'A refresh token works once: the answer carries its successor. Presenting a spent one again ends the whole sign-in, since it means the token was copied.',
  },
  {
    method: 'post', path: '/api/v1/auth/logout', tag: 'auth', summary: 'Sign out: end this session', roles: ['owner', 'builder', 'keeper', 'sales'], body: LogoutRequest,
    success: { status: 204, description: 'Signed out; the access and refresh tokens of this session no longer work' },
  },
  {
    method: 'post', path: '/api/v1/auth/password-reset', tag: 'auth', summary: 'E-mail a single-use password reset link', roles: [], body: PasswordResetRequest,
    success: { status: 202, schema: AcceptedResponse, description: 'Accepted; the same answer whether or not the address has an account' }, errors: [429],
    description: 'The link is good for 30 minutes and one use.',
  },
  {
    method: 'post', path: '/api/v1/auth/password-reset/confirm', tag: 'auth', summary: 'Choose a new password with a reset token', roles: [], body: PasswordResetConfirm,
    success: { status: 200, schema: AcceptedResponse, description: 'Password changed; every earlier sign-in of the account is ended' }, errors: [429],
  },
  { method: 'get', path: '/api/v1/auth/me', tag: 'auth', summary: 'The signed-in user', roles: ['owner', 'builder', 'keeper', 'sales'], success: { status: 200, schema: MeResponse, description: 'The user' } },
  {
    method: 'get', path: '/api/v1/audit-log', tag: 'users', summary: 'Who changed what and when', roles: ['owner'], query: AuditQuery,
    success: { status: 200, schema: AuditPage, description: 'One page, newest first unless sorted otherwise' },
    description: 'Every business write is logged: users, keys, prices, plans, animals, husbandry, quotes, orders, payments.',
  },
  { method: 'get', path: '/api/v1/users', tag: 'users', summary: 'List users', roles: ['owner'], query: UserListQuery, success: { status: 200, schema: UserPage, description: 'One page' } },
  { method: 'get', path: '/api/v1/users/:id', tag: 'users', summary: 'Read one user', roles: ['owner'], params: IdParams, success: { status: 200, schema: User, description: 'The user' }, errors: [404] },
  { method: 'post', path: '/api/v1/users', tag: 'users', summary: 'Create a user with a role', roles: ['owner'], body: CreateUserRequest, success: { status: 201, schema: User, description: 'Created' }, errors: [409] },
  { method: 'patch', path: '/api/v1/users/:id', tag: 'users', summary: 'Change role, name, password or deactivate', roles: ['owner'], params: IdParams, body: UpdateUserRequest, success: { status: 200, schema: User, description: 'Changed' }, errors: [404, 422] },
  ...resourceDocs({ path: 'tub-models', tag: 'tub models', noun: 'tub model', item: TubModel, page: TubModelPage, listQuery: TubModelListQuery, create: CreateTubModelRequest, update: UpdateTubModelRequest, read: ['owner', 'builder', 'sales'], write: ['owner', 'builder'] }),
  {
    method: 'post', path: '/api/v1/tub-models/:id/photo', tag: 'tub models', summary: 'Upload or replace the photo of a tub model', roles: ['owner', 'builder'], params: IdParams,
    success: { status: 201, schema: TubModelPhoto, description: 'Stored; it is now the tub model\'s photo' }, errors: [404, 413, 415],
    description:
      'Body: `multipart/form-data` with one file in the field `photo`: JPEG, PNG, GIF or WebP (checked by its bytes), at most 5 MB; optionally a small copy in the field `thumbnail` (same types, at most 256 KB), which lists show. The server makes no thumbnail itself (no image library is installed); without one the thumbnail route serves the original. 415 for anything but those images, 413 when larger; nothing is stored when the upload is refused. A new upload replaces the current photo, which is kept in history. 503 when the server has no uploads folder configured.',
  },
  { method: 'get', path: '/api/v1/tub-models/:id/photo', tag: 'tub models', summary: 'The current photo of a tub model', roles: ['owner', 'builder', 'sales'], params: IdParams, success: { status: 200, schema: TubModelPhoto, description: 'The photo' }, errors: [404], description: '404 when the tub model has no photo.' },
  { method: 'delete', path: '/api/v1/tub-models/:id/photo', tag: 'tub models', summary: 'Remove the photo of a tub model (kept in history)', roles: ['owner', 'builder'], params: IdParams, success: { status: 204, description: 'Removed' }, errors: [404] },
  { method: 'get', path: '/api/v1/tub-model-photos/:id/file', tag: 'tub models', summary: 'The image of a tub model photo', roles: ['owner', 'builder', 'sales'], params: IdParams, success: { status: 200, description: 'The image bytes with their content type.' }, errors: [404] },
  { method: 'get', path: '/api/v1/tub-model-photos/:id/thumbnail', tag: 'tub models', summary: 'The thumbnail of a tub model photo', roles: ['owner', 'builder', 'sales'], params: IdParams, success: { status: 200, description: 'The thumbnail bytes with their content type; the original when the upload sent no thumbnail.' }, errors: [404] },
  ...resourceDocs({ path: 'animals', tag: 'animals', noun: 'animal', item: Animal, page: AnimalPage, listQuery: AnimalListQuery, create: CreateAnimalRequest, update: UpdateAnimalRequest, read: ['owner', 'keeper', 'sales'], write: ['owner', 'keeper'] }),
  ...resourceDocs({ path: 'customers', tag: 'customers', noun: 'customer', item: Customer, page: CustomerPage, listQuery: CustomerListQuery, create: CreateCustomerRequest, update: UpdateCustomerRequest, read: ['owner', 'sales'], write: ['owner', 'sales'] }),
  { method: 'get', path: '/api/v1/mail/messages', tag: 'mail', summary: 'Messages caught by the local mail catcher', roles: ['owner'], query: MailListQuery, success: { status: 200, schema: MailPage, description: 'One page' } },
  { method: 'get', path: '/api/v1/mail/messages/:id', tag: 'mail', summary: 'Read one caught message', roles: ['owner'], params: IdParams, success: { status: 200, schema: MailMessage, description: 'The message' }, errors: [404] },
);
