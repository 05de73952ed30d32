import { RACK_PLAN_EXAMPLE, RACK_PLAN_RULES, RackPlanRequest, RackPlanResponse } from '../../../shared/api/rack-plan.js';
import { documentRoutes } from './route-catalog.js';

documentRoutes({
  method: 'post',
  path: '/api/v1/calc/rack-plan',
  tag: 'calculator',
  summary: 'Size a complete rack around a measured tub',
  description: `Every dimension, part, screw, heat strip, load check and price for a rack that fits the tub.\n\n${RACK_PLAN_RULES}`,
  roles: ['owner', 'builder', 'sales', 'integrator'],
  body: RackPlanRequest,
  bodyExample: RACK_PLAN_EXAMPLE,
  success: { status: 200, schema: RackPlanResponse, description: 'The plan, in the request unit' },
  errors: [413, 422],
});
