import { describe, expect, it } from 'vitest';
import { RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { ApiError } from '../../../common/src/errors.js';
import type { CalculatorClient } from '../lib/calculator-client.js';
import { computeRackPlan, mergePrices } from './plan-calculation.js';

const spec = RackPlanRequest.parse({ tub: { length: 20, width: 13, height: 5 }, layout: { levels: 2, columns: 2 }, prices: { thermostat: 50 } });
const failing = (err: unknown) => ({ post: async () => Promise.reject(err) }) as unknown as CalculatorClient;

describe('plan calculation through the calculator', () => {
  it('lets a price the spec sets win over the shop price', () => {
    expect(mergePrices({ thermostat: 80, caster: 9 }, spec.prices)).toEqual({ thermostat: 50, caster: 9 });
  });

  it('prefixes the field of a calculator 400 or 422 with spec.', async () => {
    const bad = computeRackPlan(failing(new ApiError(400, 'invalid_input', 'layout.levels: too many', 'layout.levels')), spec, {}, undefined);
    await expect(bad).rejects.toMatchObject({ status: 400, field: 'spec.layout.levels', message: 'spec.layout.levels: too many' });
    const unbuildable = computeRackPlan(failing(new ApiError(422, 'unprocessable', 'This rack cannot be built.', 'tub.height')), spec, {}, undefined);
    await expect(unbuildable).rejects.toMatchObject({ status: 422, field: 'spec.tub.height' });
  });

  it('passes other failures on unchanged and refuses a result it cannot read', async () => {
    await expect(computeRackPlan(failing(new ApiError(502, 'calculator_unavailable', 'down')), spec, {}, undefined)).rejects.toMatchObject({ status: 502, field: undefined });
    const odd = { post: async () => ({ unit: 'in' }) } as unknown as CalculatorClient;
    await expect(computeRackPlan(odd, spec, {}, undefined)).rejects.toMatchObject({ status: 502 });
  });
});
