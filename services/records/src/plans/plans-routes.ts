import { Router, type Request } from 'express';
import { IdParams } from '../../../../shared/api/common.js';
import {
  ComparePlansParams,
  CreatePlanRequest,
  DuplicatePlanRequest,
  PlanListQuery,
  PlanVersionListQuery,
  PlanVersionParams,
  UpdatePlanRequest,
} from '../../../../shared/api/plans.js';
import type { RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { json } from '../../../common/src/async-handler.js';
import { NotFoundError, UnprocessableError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { buildSheetPdf } from './build-sheet.js';
import { cutListCsv } from './cut-list-csv.js';
import { computeRackPlan } from './plan-calculation.js';
import { comparePlans } from './plan-summary.js';
import { plansStore, type StoredPlan } from './plans-store.js';
import { priceListRoutes } from './price-list-routes.js';
import { priceListStore } from './price-list-store.js';

/** Owner and builder plan racks; sales read plans to quote from them; keepers have no access. */
const READ = ['owner', 'builder', 'sales'] as const;
const WRITE = ['owner', 'builder'] as const;

/** The author of a write: a signed-in user's id, or null for API keys and the gateway itself. */
const userId = (req: Request): number | null => {
  const id = req.identity?.kind === 'user' ? Number(req.identity.sub) : NaN;
  return Number.isInteger(id) && id > 0 ? id : null;
};

/** ASCII file name for Content-Disposition, from the plan name. */
const fileName = (plan: StoredPlan, suffix: string) => {
  const slug = plan.name.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-+|-+$/g, '').toLowerCase().slice(0, 60);
  return `${slug || `plan-${plan.id}`}-${suffix}`;
};

/** Saved plans, the shop's price list and materials (issue: planning module). */
export function plansRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const plans = plansStore(db);
  const prices = priceListStore(db);
  const router = Router();

  const findPlan = async (id: number) => {
    const plan = await plans.find(id);
    if (!plan) throw new NotFoundError(`No plan with id ${id}.`);
    return plan;
  };
  const checkTubModel = async (id: number | null | undefined) => {
    if (id != null && !(await plans.tubModelExists(id))) throw new UnprocessableError(`No tub model with id ${id}.`, 'tubModelId');
  };
  const compute = async (spec: RackPlanRequest, req: Request) => computeRackPlan(deps.calculator, spec, await prices.shopPrices(), req.identity);

  router.get(
    '/api/v1/plans',
    allow(...READ),
    json(async (req) => plans.list(parseOrThrow(PlanListQuery, req.query, 'query'))),
  );

  router.post(
    '/api/v1/plans',
    allow(...WRITE),
    json(async (req, res) => {
      const body = parseOrThrow(CreatePlanRequest, req.body);
      await checkTubModel(body.tubModelId);
      const result = await compute(body.spec, req);
      const id = await plans.create({ name: body.name, notes: body.notes, tubModelId: body.tubModelId, spec: body.spec, result, createdBy: userId(req) });
      await audit(db, req.identity, 'create', 'plan', id, { name: body.name, version: 1 });
      res.status(201);
      return findPlan(id);
    }),
  );

  router.get(
    '/api/v1/plans/:id',
    allow(...READ),
    json(async (req) => findPlan(parseOrThrow(IdParams, req.params).id)),
  );

  router.patch(
    '/api/v1/plans/:id',
    allow(...WRITE),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdatePlanRequest, req.body);
      const current = await findPlan(id);
      await checkTubModel(body.tubModelId);
      const spec = body.spec ?? (body.recompute ? current.spec : undefined);
      const computed = spec ? { spec, result: await compute(spec, req) } : undefined;
      await plans.update(current, { name: body.name, notes: body.notes, tubModelId: body.tubModelId, status: body.status, computed }, userId(req));
      const { spec: _spec, ...changes } = body;
      await audit(db, req.identity, 'update', 'plan', id, { ...changes, ...(computed && { version: current.version + 1 }) });
      return findPlan(id);
    }),
  );

  router.delete(
    '/api/v1/plans/:id',
    allow(...WRITE),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await findPlan(id);
      // Soft: quotes and orders may point at the plan; its versions stay.
      await plans.softDelete(id);
      await audit(db, req.identity, 'delete', 'plan', id);
      res.status(204).end();
    }),
  );

  router.post(
    '/api/v1/plans/:id/duplicate',
    allow(...WRITE),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(DuplicatePlanRequest, req.body ?? {});
      const source = await findPlan(id);
      const name = body.name ?? `${source.name} (copy)`.slice(0, 120);
      const copy = await plans.create({ name, notes: source.notes, tubModelId: source.tubModelId, spec: source.spec, result: source.result, createdBy: userId(req) });
      await audit(db, req.identity, 'create', 'plan', copy, { name, duplicateOf: id, version: source.version });
      res.status(201);
      return findPlan(copy);
    }),
  );

  router.get(
    '/api/v1/plans/:id/versions',
    allow(...READ),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const query = parseOrThrow(PlanVersionListQuery, req.query, 'query');
      await findPlan(id);
      return plans.versions(id, query);
    }),
  );

  router.get(
    '/api/v1/plans/:id/versions/:version',
    allow(...READ),
    json(async (req) => {
      const { id, version } = parseOrThrow(PlanVersionParams, req.params);
      await findPlan(id);
      const found = await plans.version(id, version);
      if (!found) throw new NotFoundError(`Plan ${id} has no version ${version}.`);
      return found;
    }),
  );

  router.get(
    '/api/v1/plans/:id/compare/:otherId',
    allow(...READ),
    json(async (req) => {
      const { id, otherId } = parseOrThrow(ComparePlansParams, req.params);
      return comparePlans(await findPlan(id), await findPlan(otherId));
    }),
  );

  router.get(
    '/api/v1/plans/:id/cut-list.csv',
    allow(...READ),
    json(async (req, res) => {
      const plan = await findPlan(parseOrThrow(IdParams, req.params).id);
      res
        .type('text/csv; charset=utf-8')
        .attachment(fileName(plan, 'cut-list.csv'))
        .send(cutListCsv(plan.result));
    }),
  );

  router.get(
    '/api/v1/plans/:id/build-sheet.pdf',
    allow(...READ),
    json(async (req, res) => {
      const plan = await findPlan(parseOrThrow(IdParams, req.params).id);
      const pdf = await buildSheetPdf(plan);
      res.type('application/pdf').attachment(fileName(plan, 'build-sheet.pdf')).send(pdf);
    }),
  );

  router.use(priceListRoutes(db));
  return router;
}
