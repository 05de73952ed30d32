import type { Knex } from 'knex';
import type { RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { ApiError, UnprocessableError } from '../../../common/src/errors.js';
import type { Identity } from '../../../common/src/internal-identity.js';
import type { CalculatorClient } from '../lib/calculator-client.js';

export interface PricedRack {
  spec: Record<string, unknown>;
  unitPriceCents: number;
  description: string;
}

/** The calculator's cost total is in currency units with decimals; quotes keep whole cents. */
export function costToCents(total: number): number {
  return Math.round(total * 100);
}

export function describeRack(spec: Record<string, unknown>, result: Pick<RackPlanResponse, 'unit' | 'dimensions'> | null): string {
  const layout = spec.layout as { levels?: number; columns?: number } | undefined;
  const tubs = layout?.levels && layout.columns ? `${layout.levels} x ${layout.columns} tubs` : 'custom layout';
  if (!result) return `Rack, ${tubs}`;
  const d = result.dimensions;
  const r = (n: number) => Math.round(n * 10) / 10;
  return `Rack, ${tubs}, ${r(d.overallWidth)} W x ${r(d.overallDepth)} D x ${r(d.overallHeight)} H ${result.unit}`;
}

interface SavedPlan {
  spec: Record<string, unknown>;
  result: RackPlanResponse | null;
  name: string | null;
}

/**
 * Reads a saved plan straight from its table (the plans area is built in parallel; its table may
 * not exist yet in older databases). Column names follow the plans migration: spec_json, result_json.
 */
export async function readSavedPlan(db: Knex, planId: number): Promise<SavedPlan | null> {
  if (!(await db.schema.hasTable('plans'))) return null;
  const row = (await db('plans').where({ id: planId }).first()) as Record<string, unknown> | undefined;
  if (!row || row.deleted_at) return null;
  const parse = (v: unknown) => (typeof v === 'string' && v ? (JSON.parse(v) as unknown) : null);
  const spec = parse(row.spec_json) as Record<string, unknown> | null;
  if (!spec) return null;
  return { spec, result: parse(row.result_json) as RackPlanResponse | null, name: typeof row.name === 'string' ? row.name : null };
}

/** Prices a rack line from a saved plan (its last result, or computed again) or from a spec. */
export async function priceRack(
  db: Knex,
  calculator: CalculatorClient,
  identity: Identity | undefined,
  line: { planId?: number; spec?: Record<string, unknown> },
  field: string,
): Promise<PricedRack> {
  let spec: Record<string, unknown>;
  let result: RackPlanResponse | null = null;
  let name: string | null = null;
  if (line.planId !== undefined) {
    const plan = await readSavedPlan(db, line.planId);
    if (!plan) throw new UnprocessableError(`No saved plan with id ${line.planId}.`, `${field}.planId`);
    ({ spec, name } = plan);
    result = plan.result?.cost ? plan.result : null;
  } else {
    spec = line.spec!;
  }
  if (!result) {
    try {
      result = await calculator.post<RackPlanResponse>('/api/v1/calc/rack-plan', spec, identity);
    } catch (err) {
      // The calculator names a field of the spec: point at it inside this line.
      if (err instanceof ApiError && err.field && err.status < 500) throw new ApiError(err.status, err.code, err.message, `${field}.spec.${err.field}`, err.details);
      throw err;
    }
  }
  const description = name ? `${name} (${describeRack(spec, result)})` : describeRack(spec, result);
  return { spec, unitPriceCents: costToCents(result.cost.total), description: description.slice(0, 300) };
}
