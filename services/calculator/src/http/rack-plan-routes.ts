import { Router } from 'express';
import { RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { json } from '../../../common/src/async-handler.js';
import { UnprocessableError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { rackCuttingRequest, sheetCounterFrom } from '../domain/rack-cutting.js';
import { planRack, UnbuildableSpecError, type PlanRackOptions, type RackPlan } from '../domain/rack-plan.js';
import { runCuttingOrReject, type CuttingRunner } from './cutting-runner.js';

/** Roles that may size racks: the shop's planners and sellers, and integrators with a key. */
export const RACK_PLAN_ROLES = ['owner', 'builder', 'sales', 'integrator'] as const;

function planOrReject(request: RackPlanRequest, options: PlanRackOptions = {}): RackPlan {
  try {
    return planRack(request, options);
  } catch (err) {
    if (err instanceof UnbuildableSpecError) throw new UnprocessableError(`This rack cannot be built: ${err.reason}.`, err.field);
    throw err;
  }
}

/**
 * A rack plan with its cutting plan: the parts are planned first, nested onto stock (off the
 * event loop), then costed with the nested sheet counts instead of the area estimate.
 */
export async function rackPlanWithCutting(body: unknown, run: CuttingRunner): Promise<RackPlan> {
  const request = parseOrThrow(RackPlanRequest, body);
  const estimate = planOrReject(request);
  if (!request.cutting.include) return estimate;
  const cutting = await runCuttingOrReject(run, rackCuttingRequest(request, estimate, request.cutting.timeLimitMs), 'cutting.');
  return { ...planOrReject(request, { countSheets: sheetCounterFrom(cutting) }), cutting };
}

export function rackPlanRoutes(run: CuttingRunner): Router {
  const router = Router();
  router.post(
    '/api/v1/calc/rack-plan',
    allow(...RACK_PLAN_ROLES),
    json((req) => rackPlanWithCutting(req.body, run)),
  );
  return router;
}
