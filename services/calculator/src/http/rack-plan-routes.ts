import { Router } from 'express';
import { RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { json } from '../../../common/src/async-handler.js';
import { UnprocessableError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { planRack, UnbuildableSpecError, type PlanRackOptions } from '../domain/rack-plan.js';

/** Roles that may size racks: the shop's planners and sellers, and integrators with a key. */
export const RACK_PLAN_ROLES = ['owner', 'builder', 'sales', 'integrator'] as const;

/** Runs planRack and turns a spec that cannot be built into a 422 naming the field at fault. */
export function planRackOrReject(body: unknown, options: PlanRackOptions = {}) {
  const request = parseOrThrow(RackPlanRequest, body);
  try {
    return planRack(request, options);
  } catch (err) {
    if (err instanceof UnbuildableSpecError) throw new UnprocessableError(`This rack cannot be built: ${err.reason}.`, err.field);
    throw err;
  }
}

export function rackPlanRoutes(options: () => PlanRackOptions = () => ({})): Router {
  const router = Router();
  router.post(
    '/api/v1/calc/rack-plan',
    allow(...RACK_PLAN_ROLES),
    json((req) => planRackOrReject(req.body, options())),
  );
  return router;
}
