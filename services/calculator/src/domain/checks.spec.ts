import { describe, expect, it } from 'vitest';
import { RackPlanRequest, type RackPlanRequestInput } from '../../../../shared/api/rack-plan.js';
import { planRack } from './rack-plan.js';

const codes = (input: RackPlanRequestInput) => planRack(RackPlanRequest.parse(input)).checks.map((c) => `${c.code}:${c.severity}`);
const small = { tub: { length: 16, width: 6, height: 4, loadedMass: 1 }, layout: { levels: 3, columns: 2 } } as const;

describe('rack checks', () => {
  it('a small stiff rack raises no warnings', () => {
    const c = codes(small);
    expect(c.filter((x) => !x.endsWith(':info'))).toEqual([]);
    expect(c).toContain('shelf_sag:info');
    expect(c).toContain('lid_gap:info');
  });

  it('warns to anchor a tall narrow rack', () => {
    expect(codes({ ...small, layout: { levels: 16, columns: 2 } })).toContain('tipping:warning');
  });

  it('flags casters over their rating', () => {
    expect(codes({ ...small, base: { casterRating: 5 } })).toContain('caster_load:danger');
  });

  it('flags a section taller than the doorway and a rack taller than the ceiling', () => {
    const c = codes({ ...small, layout: { levels: 14, columns: 2 }, limits: { doorwayHeight: 40, ceilingHeight: 50 } });
    expect(c).toContain('doorway_clearance:warning');
    expect(c).toContain('ceiling_clearance:warning');
  });

  it('warns when a tub would bind and when a gap lets an animal out', () => {
    // a long, heavy 1-column shelf with no room for blocks: the top floor sags open, the bottom tub is pinched
    const c = codes({ tub: { length: 20, width: 40, height: 6, loadedMass: 30 }, layout: { levels: 3, columns: 1 } });
    expect(c).toContain('shelf_sag:warning');
    expect(c).toContain('lid_gap_bind:warning');
    expect(c).toContain('lid_gap_escape:danger');
  });

  it('flags heat over a thermostat rating and over a circuit', () => {
    const c = codes({ tub: { length: 20, width: 15, height: 6 }, layout: { levels: 30, columns: 3 }, heat: { wattsPerFoot: 40, thermostatRatingW: 100 } });
    expect(c).toContain('thermostat_rating:danger');
    expect(c).toContain('circuit_load:danger');
    const mid = codes({ tub: { length: 20, width: 15, height: 6 }, layout: { levels: 10, columns: 3 }, heat: { wattsPerFoot: 40 } });
    expect(mid).toContain('circuit_load:warning'); // 10 x 44.5 in x 40 W/ft = 1483 W: over 1440, under 1920
  });
});
