import type { Knex } from 'knex';
import type { PlanSummary } from '../../../../shared/api/plans.js';
import type { RackPlanRequest, RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { ConflictError } from '../../../common/src/errors.js';
import { insertId, nowIso } from '../db/knex.js';
import { listPage, type ListParams } from '../lib/list.js';
import { planSummary } from './plan-summary.js';

interface PlanRow {
  id: number;
  name: string;
  notes: string;
  tub_model_id: number | null;
  tub_model_name: string | null;
  unit: 'in' | 'mm';
  status: 'active' | 'archived';
  version: number;
  summary_json: string;
  spec_json?: string;
  result_json?: string;
  created_by: number | null;
  created_by_name: string | null;
  created_at: string;
  updated_at: string;
}

interface VersionRow {
  version: number;
  name: string;
  unit: 'in' | 'mm';
  summary_json: string;
  spec_json?: string;
  result_json?: string;
  created_by: number | null;
  created_by_name: string | null;
  created_at: string;
}

const LIST_COLUMNS = ['id', 'name', 'notes', 'tub_model_id', 'unit', 'status', 'version', 'summary_json', 'created_by', 'created_at', 'updated_at'];
const SORT_COLUMNS = { name: 'name', status: 'status', version: 'version', createdAt: 'created_at', updatedAt: 'updated_at' };

function toListItem(row: PlanRow) {
  return {
    id: row.id,
    name: row.name,
    notes: row.notes,
    tubModelId: row.tub_model_id,
    tubModelName: row.tub_model_name ?? null,
    unit: row.unit,
    status: row.status,
    version: row.version,
    summary: JSON.parse(row.summary_json) as PlanSummary,
    createdBy: row.created_by,
    createdByName: row.created_by_name ?? null,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

function toPlan(row: PlanRow) {
  return { ...toListItem(row), spec: JSON.parse(row.spec_json!) as RackPlanRequest, result: JSON.parse(row.result_json!) as RackPlanResponse };
}
export type StoredPlan = ReturnType<typeof toPlan>;

function toVersionItem(row: VersionRow) {
  return {
    version: row.version,
    name: row.name,
    unit: row.unit,
    summary: JSON.parse(row.summary_json) as PlanSummary,
    createdBy: row.created_by,
    createdByName: row.created_by_name ?? null,
    createdAt: row.created_at,
  };
}

export interface NewPlan {
  name: string;
  notes: string;
  tubModelId: number | null;
  spec: RackPlanRequest;
  result: RackPlanResponse;
  createdBy: number | null;
  status?: 'active' | 'archived';
}

export interface PlanChanges {
  name?: string;
  notes?: string;
  tubModelId?: number | null;
  status?: 'active' | 'archived';
  /** A new computed version. */
  computed?: { spec: RackPlanRequest; result: RackPlanResponse };
}

/** Data access for saved plans and their version history. */
export function plansStore(db: Knex) {
  // A subquery, so the joined names filter and sort like plain columns (and `id` is not ambiguous).
  const plans = (full: boolean) =>
    db
      .from(
        db('plans')
          .leftJoin('tub_models as tm', (j) => j.on('tm.id', '=', 'plans.tub_model_id').andOnNull('tm.deleted_at'))
          .leftJoin('users as u', 'u.id', 'plans.created_by')
          .whereNull('plans.deleted_at')
          .select([...(full ? ['plans.*'] : LIST_COLUMNS.map((c) => `plans.${c}`)), 'tm.name as tub_model_name', 'u.name as created_by_name'])
          .as('p'),
      )
      .select('*');

  const versionRow = (planId: number, version: number, p: { name: string; spec: RackPlanRequest; result: RackPlanResponse }, createdBy: number | null, now: string) => ({
    plan_id: planId,
    version,
    name: p.name,
    unit: p.result.unit,
    spec_json: JSON.stringify(p.spec),
    result_json: JSON.stringify(p.result),
    summary_json: JSON.stringify(planSummary(p.spec, p.result)),
    created_by: createdBy,
    created_at: now,
  });

  const store = {
    list(params: ListParams & { status?: string; tubModelId?: number }) {
      let rows = plans(false);
      if (params.status) rows = rows.where('status', params.status);
      if (params.tubModelId) rows = rows.where('tub_model_id', params.tubModelId);
      return listPage<PlanRow, ReturnType<typeof toListItem>>(rows, params, {
        columns: SORT_COLUMNS,
        searchColumns: ['name', 'notes', 'tub_model_name'],
        defaultSort: '-updatedAt',
        toItem: toListItem,
      });
    },

    async find(id: number): Promise<StoredPlan | undefined> {
      const row = (await plans(true).where('id', id).first()) as PlanRow | undefined;
      return row && toPlan(row);
    },

    async tubModelExists(id: number): Promise<boolean> {
      return Boolean(await db('tub_models').where({ id }).whereNull('deleted_at').first());
    },

    /** A plan at version 1, with its first history entry. */
    async create(p: NewPlan): Promise<number> {
      const now = nowIso();
      return db.transaction(async (trx) => {
        const id = await insertId(trx('plans'), {
          name: p.name,
          notes: p.notes,
          tub_model_id: p.tubModelId,
          spec_json: JSON.stringify(p.spec),
          result_json: JSON.stringify(p.result),
          summary_json: JSON.stringify(planSummary(p.spec, p.result)),
          unit: p.result.unit,
          status: p.status ?? 'active',
          version: 1,
          created_by: p.createdBy,
          created_at: now,
          updated_at: now,
        });
        await trx('plan_versions').insert(versionRow(id!, 1, p, p.createdBy, now));
        return id!;
      });
    },

    /**
     * Applies changes; a computed spec becomes version + 1. The update is conditional on the
     * version read, so two saves racing on one plan give a 409 instead of a lost version.
     */
    async update(current: StoredPlan, changes: PlanChanges, changedBy: number | null): Promise<void> {
      const now = nowIso();
      await db.transaction(async (trx) => {
        const version = changes.computed ? current.version + 1 : current.version;
        const updated = await trx('plans')
          .where({ id: current.id, version: current.version })
          .whereNull('deleted_at')
          .update({
            ...(changes.name !== undefined && { name: changes.name }),
            ...(changes.notes !== undefined && { notes: changes.notes }),
            ...(changes.tubModelId !== undefined && { tub_model_id: changes.tubModelId }),
            ...(changes.status !== undefined && { status: changes.status }),
            ...(changes.computed && {
              spec_json: JSON.stringify(changes.computed.spec),
              result_json: JSON.stringify(changes.computed.result),
              summary_json: JSON.stringify(planSummary(changes.computed.spec, changes.computed.result)),
              unit: changes.computed.result.unit,
            }),
            version,
            updated_at: now,
          });
        if (updated === 0) throw new ConflictError('The plan was changed by someone else meanwhile; reload it and try again.');
        if (changes.computed) {
          await trx('plan_versions').insert(versionRow(current.id, version, { name: changes.name ?? current.name, ...changes.computed }, changedBy, now));
        }
      });
    },

    async softDelete(id: number): Promise<void> {
      const now = nowIso();
      await db('plans').where({ id }).update({ deleted_at: now, updated_at: now });
    },

    versions(planId: number, params: ListParams) {
      const rows = db
        .from(
          db('plan_versions')
            .leftJoin('users as u', 'u.id', 'plan_versions.created_by')
            .where('plan_versions.plan_id', planId)
            .select('plan_versions.id', 'plan_versions.version', 'plan_versions.name', 'plan_versions.unit', 'plan_versions.summary_json', 'plan_versions.created_by', 'plan_versions.created_at', 'u.name as created_by_name')
            .as('v'),
        )
        .select('*');
      return listPage<VersionRow, ReturnType<typeof toVersionItem>>(rows, params, {
        columns: { version: 'version', createdAt: 'created_at' },
        searchColumns: ['name'],
        defaultSort: '-version',
        toItem: toVersionItem,
      });
    },

    async version(planId: number, version: number) {
      const row = (await db('plan_versions')
        .leftJoin('users as u', 'u.id', 'plan_versions.created_by')
        .where({ 'plan_versions.plan_id': planId, 'plan_versions.version': version })
        .select('plan_versions.*', 'u.name as created_by_name')
        .first()) as VersionRow | undefined;
      if (!row) return undefined;
      return { ...toVersionItem(row), spec: JSON.parse(row.spec_json!) as RackPlanRequest, result: JSON.parse(row.result_json!) as RackPlanResponse };
    },
  };
  return store;
}
