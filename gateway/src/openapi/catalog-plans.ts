import { IdParams } from '../../../shared/api/common.js';
import {
  ComparePlansParams,
  CREATE_PLAN_EXAMPLE,
  CreatePlanRequest,
  DuplicatePlanRequest,
  MaterialKeyParams,
  MaterialList,
  Plan,
  PlanComparison,
  PlanListQuery,
  PlanPage,
  PlanVersion,
  PlanVersionListQuery,
  PlanVersionPage,
  PlanVersionParams,
  PRICE_LIST_EXAMPLE,
  PriceList,
  PUT_MATERIAL_EXAMPLE,
  PutMaterialRequest,
  ShopMaterial,
  UpdatePlanRequest,
  UpdatePriceListRequest,
} from '../../../shared/api/plans.js';
import { documentRoutes } from './route-catalog.js';

const READ = ['owner', 'builder', 'sales'];
const WRITE = ['owner', 'builder'];
const tag = 'plans';
const pricing = 'price list and materials';

// Routes of the plans area: saved plans with their history, exports, the shop price list and materials.
documentRoutes(
  { method: 'get', path: '/api/v1/plans', tag, summary: 'List saved plans', roles: READ, query: PlanListQuery, success: { status: 200, schema: PlanPage, description: 'One page, without specs and results' } },
  {
    method: 'post', path: '/api/v1/plans', tag, summary: 'Save a new plan, computed by the calculator', roles: WRITE, body: CreatePlanRequest, bodyExample: CREATE_PLAN_EXAMPLE,
    success: { status: 201, schema: Plan, description: 'The plan at version 1 with its result' }, errors: [422],
    description: 'The shop price list fills every price the spec leaves open. Errors in the spec name the field with a `spec.` prefix; a spec that cannot be built answers 422; an unknown tubModelId answers 422 naming `tubModelId`.',
  },
  { method: 'get', path: '/api/v1/plans/:id', tag, summary: 'Read one plan with its spec and last result', roles: READ, params: IdParams, success: { status: 200, schema: Plan, description: 'The plan' }, errors: [404] },
  {
    method: 'patch', path: '/api/v1/plans/:id', tag, summary: 'Rename, annotate, archive, or change the spec of a plan', roles: WRITE, params: IdParams, body: UpdatePlanRequest,
    success: { status: 200, schema: Plan, description: 'The plan as changed' }, errors: [404, 409, 422],
    description: 'A new `spec` or `recompute: true` is computed with the current price list and becomes version + 1; the previous versions stay readable. 409 when another save of the same plan won the race.',
  },
  { method: 'delete', path: '/api/v1/plans/:id', tag, summary: 'Remove a plan (kept in history)', roles: WRITE, params: IdParams, success: { status: 204, description: 'Removed' }, errors: [404] },
  { method: 'post', path: '/api/v1/plans/:id/duplicate', tag, summary: 'Copy a plan into a new one at version 1', roles: WRITE, params: IdParams, body: DuplicatePlanRequest, bodyExample: { name: 'Longhold 28, 10 high' }, success: { status: 201, schema: Plan, description: 'The copy' }, errors: [404] },
  { method: 'get', path: '/api/v1/plans/:id/versions', tag, summary: 'Version history of a plan', roles: READ, params: IdParams, query: PlanVersionListQuery, success: { status: 200, schema: PlanVersionPage, description: 'One page of versions, newest first by default' }, errors: [404] },
  { method: 'get', path: '/api/v1/plans/:id/versions/:version', tag, summary: 'One version of a plan in full', roles: READ, params: PlanVersionParams, success: { status: 200, schema: PlanVersion, description: 'The version with its spec and result' }, errors: [404] },
  {
    method: 'get', path: '/api/v1/plans/:id/compare/:otherId', tag, summary: 'Compare two plans side by side', roles: READ, params: ComparePlansParams,
    success: { status: 200, schema: PlanComparison, description: 'Dimensions, sheets and cost of both; differences are B - A' }, errors: [404],
    description: 'Lengths are given in plan A\'s unit (plan B is converted).',
  },
  {
    method: 'get', path: '/api/v1/plans/:id/cut-list.csv', tag, summary: 'Cut list as CSV', roles: READ, params: IdParams,
    success: { status: 200, description: 'text/csv (RFC 4180, CRLF): one row per part with part number, name, material, thickness, length, width (plan unit), quantity, section (a number, or base), the same lengths as fractional inches, and a note.' },
    errors: [404],
  },
  {
    method: 'get', path: '/api/v1/plans/:id/build-sheet.pdf', tag, summary: 'Printable build sheet (PDF)', roles: READ, params: IdParams,
    success: { status: 200, description: 'application/pdf: dimensions, sections, parts, hardware, heat and electrical summary, assembly order, checks and safety cautions.' },
    errors: [404],
  },
  { method: 'get', path: '/api/v1/price-list', tag: pricing, summary: 'The shop price list', roles: READ, success: { status: 200, schema: PriceList, description: 'Every entry' } },
  {
    method: 'put', path: '/api/v1/price-list', tag: pricing, summary: 'Set prices (upsert by key)', roles: ['owner'], body: UpdatePriceListRequest, bodyExample: PRICE_LIST_EXAMPLE,
    success: { status: 200, schema: PriceList, description: 'The whole list after the change' },
    description: 'Listed keys are created or changed, keys not listed stay, `price: null` removes a key. Plans of signed-in users are computed with these prices wherever the spec sets none.',
  },
  { method: 'get', path: '/api/v1/materials', tag: pricing, summary: 'The shop materials', roles: READ, success: { status: 200, schema: MaterialList, description: 'Every material' } },
  {
    method: 'put', path: '/api/v1/materials/:key', tag: pricing, summary: 'Create or replace a material', roles: ['owner'], params: MaterialKeyParams, body: PutMaterialRequest, bodyExample: PUT_MATERIAL_EXAMPLE,
    success: { status: 200, schema: ShopMaterial, description: 'The material (201 when it was created)' },
  },
);
