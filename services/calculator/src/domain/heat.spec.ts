import { describe, expect, it } from 'vitest';
import { RackPlanRequest, type RackPlanRequestInput } from '../../../../shared/api/rack-plan.js';
import { UnbuildableSpecError } from './errors.js';
import { rackGeometry } from './geometry.js';
import { circuitShare, heatPlan } from './heat.js';
import { normaliseRequest } from './rack-spec.js';

const plan = (input: RackPlanRequestInput) => {
  const s = normaliseRequest(RackPlanRequest.parse(input));
  return heatPlan(s, rackGeometry(s));
};
const tub = { length: 23, width: 11.5, height: 6.5 };

describe('heatPlan', () => {
  it('lays one strip per level, the shelf span less a margin at each end', () => {
    // interior shelf 2 x 11.5 + 0.5 = 23.5; strip 23.5 - 2 x 1 = 21.5 in
    const h = plan({ tub, layout: { levels: 6, columns: 2 }, heat: { wattsPerFoot: 12 } });
    expect(h.strips).toBe(6);
    expect(h.stripLengthIn).toBeCloseTo(21.5, 12);
    expect(h.stripPowerW).toBeCloseTo((21.5 / 12) * 12, 12);
    expect(h.totalPowerW).toBeCloseTo(6 * 21.5, 12);
    expect(h.currentA).toBeCloseTo((6 * 21.5) / 120, 12);
  });

  it('uses as many thermostats as the rating needs, never splitting a strip', () => {
    // strips of 21.5 W: a 50 W thermostat takes 2, so 6 strips need 3
    const h = plan({ tub, layout: { levels: 6, columns: 2 }, heat: { wattsPerFoot: 12, thermostatRatingW: 50 } });
    expect(h.stripsPerThermostat).toBe(2);
    expect(h.thermostats).toBe(3);
  });

  it('still gives each strip a thermostat when one strip exceeds the rating', () => {
    const h = plan({ tub, layout: { levels: 4, columns: 2 }, heat: { wattsPerFoot: 12, thermostatRatingW: 10 } });
    expect(h.thermostats).toBe(4);
  });

  it('reports the share of 15 A and 20 A circuits at 80 %', () => {
    const c = circuitShare(15, 720);
    expect(c.capacityW).toBe(1800);
    expect(c.continuousLimitW).toBe(1440);
    expect(c.share).toBe(0.5);
  });

  it('rejects margins that leave no tape', () => {
    expect(() => plan({ tub, layout: { levels: 2, columns: 1 }, heat: { endMargin: 6 } })).toThrow(UnbuildableSpecError);
  });

  it('has nothing to heat but keeps the cautions when heat is off', () => {
    const h = plan({ tub, layout: { levels: 3, columns: 1 }, heat: { enabled: false } });
    expect(h.strips).toBe(0);
    expect(h.thermostats).toBe(0);
    expect(h.cautions.length).toBeGreaterThan(0);
  });
});
