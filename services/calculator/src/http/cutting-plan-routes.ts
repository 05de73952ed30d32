import { Router } from 'express';
import { CuttingPlanRequest, TOO_MANY_PARTS } from '../../../../shared/api/cutting-plan.js';
import { json } from '../../../common/src/async-handler.js';
import { PayloadTooLargeError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { runCuttingOrReject, type CuttingRunner } from './cutting-runner.js';

export const CUTTING_PLAN_ROLES = ['owner', 'builder', 'sales', 'integrator'] as const;

export function cuttingPlanRoutes(run: CuttingRunner): Router {
  const router = Router();
  router.post(
    '/api/v1/calc/cutting-plan',
    allow(...CUTTING_PLAN_ROLES),
    json(async (req) => {
      const parsed = CuttingPlanRequest.safeParse(req.body);
      const tooMany = parsed.error?.issues.find((i) => (i as { params?: { reason?: string } }).params?.reason === TOO_MANY_PARTS);
      if (tooMany) throw new PayloadTooLargeError(`Too many parts: ${tooMany.message}.`);
      const request = parseOrThrow(CuttingPlanRequest, req.body);
      return runCuttingOrReject(run, request);
    }),
  );
  return router;
}
