import { Router } from 'express';
import type { Knex } from 'knex';
import type { z } from 'zod';
import { IdParams } from '../../../../shared/api/common.js';
import { json } from '../../../common/src/async-handler.js';
import { NotFoundError } from '../../../common/src/errors.js';
import type { Identity } from '../../../common/src/internal-identity.js';
import { allow, type Access } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { audit } from '../audit/audit-log.js';
import { insertId, nowIso } from '../db/knex.js';
import { listPage } from './list.js';

const toSnake = (key: string) => key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

export function rowToItem<T>(row: Record<string, unknown>, fields: readonly string[]): T {
  const item: Record<string, unknown> = {};
  for (const field of fields) item[field] = row[toSnake(field)];
  return item as T;
}

export function itemToRow(item: Record<string, unknown>): Record<string, unknown> {
  const row: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(item)) if (value !== undefined) row[toSnake(key)] = value;
  return row;
}

export interface ResourceSpec {
  /** Path under /api/v1, e.g. `tub-models`. */
  path: string;
  table: string;
  entity: string;
  /** API fields in response order; columns are their snake_case names. */
  fields: readonly string[];
  searchFields: readonly string[];
  defaultSort: string;
  read: Access[];
  write: Access[];
  listQuery: z.ZodType<{ limit: number; offset: number; sort?: string; q?: string } & Record<string, unknown>>;
  /** Extra equality filters taken from the list query, e.g. status. */
  filterFields?: readonly string[];
  create: z.ZodType<Record<string, unknown>>;
  update: z.ZodType<Record<string, unknown>>;
  /** Narrows what a caller may see, e.g. sales see only animals offered for sale. */
  visibleTo?: (rows: Knex.QueryBuilder, identity: Identity) => Knex.QueryBuilder;
  /** Rules beyond the schema, run on a parsed create (id null) or update body before it is written. */
  check?: (body: Record<string, unknown>, id: number | null) => Promise<void>;
  /** Values to coerce when reading a row (SQLite has no boolean). */
  fromRow?: (item: Record<string, unknown>) => Record<string, unknown>;
}

/**
 * List, read, create, update and soft-delete for a plain business table. Areas with rules of
 * their own (users, orders) write their routes by hand.
 */
export function resourceRoutes(db: Knex, spec: ResourceSpec): Router {
  const router = Router();
  const base = `/api/v1/${spec.path}`;
  const columns = Object.fromEntries(spec.fields.map((f) => [f, toSnake(f)]));
  const toItem = (row: Record<string, unknown>) => {
    const item = rowToItem<Record<string, unknown>>(row, spec.fields);
    return spec.fromRow ? spec.fromRow(item) : item;
  };
  const live = (identity?: Identity) => {
    const rows = db(spec.table).whereNull('deleted_at');
    return identity && spec.visibleTo ? spec.visibleTo(rows, identity) : rows;
  };
  const findLive = async (id: number, identity?: Identity) => {
    const row = await live(identity).where({ id }).first();
    if (!row) throw new NotFoundError(`No ${spec.entity} with id ${id}.`);
    return row as Record<string, unknown>;
  };

  router.get(
    base,
    allow(...spec.read),
    json(async (req) => {
      const query = parseOrThrow(spec.listQuery, req.query, 'query');
      let rows = live(req.identity);
      for (const field of spec.filterFields ?? []) if (query[field] !== undefined) rows = rows.where(toSnake(field), query[field]);
      return listPage(rows, query, {
        columns,
        searchColumns: spec.searchFields.map(toSnake),
        defaultSort: spec.defaultSort,
        toItem,
      });
    }),
  );

  router.get(
    `${base}/:id`,
    allow(...spec.read),
    json(async (req) => toItem(await findLive(parseOrThrow(IdParams, req.params).id, req.identity))),
  );

  router.post(
    base,
    allow(...spec.write),
    json(async (req, res) => {
      const body = parseOrThrow(spec.create, req.body);
      await spec.check?.(body, null);
      const now = nowIso();
      const id = await insertId(db(spec.table), { ...itemToRow(body), created_at: now, updated_at: now });
      await audit(db, req.identity, 'create', spec.entity, id!, body);
      res.status(201);
      return toItem(await findLive(id!));
    }),
  );

  router.patch(
    `${base}/:id`,
    allow(...spec.write),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(spec.update, req.body);
      await findLive(id);
      await spec.check?.(body, id);
      await db(spec.table).where({ id }).update({ ...itemToRow(body), updated_at: nowIso() });
      await audit(db, req.identity, 'update', spec.entity, id, body);
      return toItem(await findLive(id));
    }),
  );

  router.delete(
    `${base}/:id`,
    allow(...spec.write),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await findLive(id);
      // Soft delete: history (plans, events, orders) may still point at the row.
      await db(spec.table).where({ id }).update({ deleted_at: nowIso(), updated_at: nowIso() });
      await audit(db, req.identity, 'delete', spec.entity, id);
      res.status(204).end();
    }),
  );

  return router;
}
