import { CUTTING_PLAN_EXAMPLE, CuttingPlanRequest, CuttingPlanResponse, MAX_PARTS } from '../../../shared/api/cutting-plan.js';
import { RACK_PLAN_EXAMPLE, RACK_PLAN_RULES, RackPlanRequest, RackPlanResponse } from '../../../shared/api/rack-plan.js';
import { documentRoutes } from './route-catalog.js';

const REUSE_NOTE =
  'An identical request (same body, same caller role and scopes) may be answered from the gateway\'s memory of recent answers (15 minutes, set by `CALCULATION_MEMO_ENTRIES`): the `x-tw-calculation` header says `computed` or `reused`. Refusals are never reused.';

documentRoutes({
  method: 'post',
  path: '/api/v1/calc/rack-plan',
  tag: 'calculator',
  summary: 'Size a complete rack around a measured tub',
  description: `Every dimension, part, screw, heat strip, load check and price for a rack that fits the tub.\n\n${RACK_PLAN_RULES}\n\n${REUSE_NOTE}`,
  roles: ['owner', 'builder', 'sales', 'integrator'],
  body: RackPlanRequest,
  bodyExample: RACK_PLAN_EXAMPLE,
  success: { status: 200, schema: RackPlanResponse, description: 'The plan, in the request unit' },
  errors: [413, 422],
}, {
  method: 'post',
  path: '/api/v1/calc/cutting-plan',
  tag: 'calculator',
  summary: 'Nest parts onto sheets and boards with saw-ready cut sequences',
  description: [
    'Guillotine layouts (every cut runs edge to edge of the piece, in the order listed), kerf between neighbours, trim at the edges, rotation only where `canRotate`; boards are cut in one dimension.',
    'Each material reports `stockUsed` and a `lowerBound` (area, Martello and Toth L2, and a centre-line bound for parts longer than half the stock); `optimal` is true only when they are equal.',
    'Stock with a `quantity` (recorded offcuts) is used first. Parts from many racks or orders may be sent at once (`source` labels them).',
    `At most ${MAX_PARTS} pieces per request (413 beyond). A part larger than every stock of its material in every allowed orientation: 422 naming the part.`,
    '`x` runs along the stock length, `y` along its width; a rotated part has its length along `y`. `svg` holds one drawing per layout, parts numbered as in the request (index + 1).',
    `${REUSE_NOTE} A reused cutting plan is the one found first; the search is bounded in time, so a new search could find another of the same or a better sheet count.`,
  ].join('\n\n'),
  roles: ['owner', 'builder', 'sales', 'integrator'],
  body: CuttingPlanRequest,
  bodyExample: CUTTING_PLAN_EXAMPLE,
  success: { status: 200, schema: CuttingPlanResponse, description: 'Layouts per material with bounds' },
  errors: [413, 422],
});
