import { RackPlanResponse, type PriceKey, type RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { ApiError } from '../../../common/src/errors.js';
import type { Identity } from '../../../common/src/internal-identity.js';
import type { CalculatorClient } from '../lib/calculator-client.js';

/** Shop prices fill the keys the spec leaves open; a price the spec sets wins. */
export function mergePrices(shop: Partial<Record<PriceKey, number>>, spec: RackPlanRequest['prices']): RackPlanRequest['prices'] {
  const merged: Record<string, number> = { ...shop };
  for (const [key, value] of Object.entries(spec)) if (value !== undefined) merged[key] = value;
  return merged as RackPlanRequest['prices'];
}

/**
 * Asks the calculator over HTTP (the records service keeps no copy of the calculations). Its
 * 400/422 name a field of the spec; the field gets a `spec.` prefix so the client can place it.
 */
export async function computeRackPlan(
  calculator: CalculatorClient,
  spec: RackPlanRequest,
  shopPrices: Partial<Record<PriceKey, number>>,
  identity: Identity | undefined,
): Promise<RackPlanResponse> {
  let body: unknown;
  try {
    body = await calculator.post<unknown>('/api/v1/calc/rack-plan', { ...spec, prices: mergePrices(shopPrices, spec.prices) }, identity);
  } catch (err) {
    if (err instanceof ApiError && (err.status === 400 || err.status === 422)) {
      const field = err.field ? `spec.${err.field}` : 'spec';
      const message = err.field && err.message.startsWith(`${err.field}:`) ? `spec.${err.message}` : err.message;
      throw new ApiError(err.status, err.code, message, field);
    }
    throw err;
  }
  const parsed = RackPlanResponse.safeParse(body);
  if (!parsed.success) throw new ApiError(502, 'calculator_error', 'The calculator answered with a result this service does not understand.');
  return parsed.data;
}
