import { describe, expect, it } from 'vitest';
import { RackPlanRequest, type RackPlanRequestInput } from '../../../../shared/api/rack-plan.js';
import { rackGeometry } from './geometry.js';
import { analyseShelves, centerPointLoadDeflection, levelGaps, loadPerCasterLb, rackMasses, rectangleInertia, uniformLoadDeflection } from './loads.js';
import { LB_PER_IN3_PER_KG_M3 } from './materials.js';
import { normaliseRequest } from './rack-spec.js';

const spec = (input: RackPlanRequestInput) => normaliseRequest(RackPlanRequest.parse(input));

describe('beam formulas', () => {
  it('uniform load: hand calculation 5 x 1 x 10^4 / (384 x 1000 x 1)', () => {
    expect(uniformLoadDeflection(1, 10, 1000, 1)).toBeCloseTo(50000 / 384000, 12);
  });
  it('point load: hand calculation 48 x 8 / (48 x 2 x 4) = 1', () => {
    expect(centerPointLoadDeflection(48, 2, 2, 4)).toBe(1);
  });
  it('a centre point load deflects 8/5 as much as the same total load spread evenly', () => {
    const P = 100;
    const L = 40;
    expect(centerPointLoadDeflection(P, L, 3e5, 0.25) / uniformLoadDeflection(P / L, L, 3e5, 0.25)).toBeCloseTo(1.6, 12);
  });
  it('rectangle inertia b h^3 / 12', () => {
    expect(rectangleInertia(12, 0.5)).toBeCloseTo(0.125, 12);
  });
});

describe('shelves', () => {
  const base = { tub: { length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 }, layout: { levels: 5, columns: 3 } } as const;

  it('needs no support for a short, stiff span', () => {
    const s = spec({ ...base, tub: { ...base.tub, width: 6 }, layout: { levels: 5, columns: 1 } });
    const a = analyseShelves(s, rackGeometry(s));
    expect(a.sagUnsupportedIn).toBeLessThan(s.limits.maxShelfSagIn);
    expect(a.supportBlocksUsed).toBe(false);
    expect(a.supportColumns).toBe(0);
  });

  it('puts support blocks at every column boundary by default, so each tub spans one column', () => {
    const s = spec(base);
    const a = analyseShelves(s, rackGeometry(s));
    expect(a.supportBlocksUsed).toBe(true);
    // 3 columns, no dividers: 2 boundaries (common practice: a vertical support between columns)
    expect(a.supportColumns).toBe(2);
    expect(a.shelfSagIn).toBeLessThan(a.sagUnsupportedIn);
    // one column: 16.25 + 1/3 of the 1/2 in play
    expect(a.longestSpanSupportedIn).toBeCloseTo(16.25 + 0.5 / 3, 9);
    const divided = spec({ ...base, layout: { levels: 5, columns: 3, dividers: 1 } });
    expect(analyseShelves(divided, rackGeometry(divided)).supportColumns).toBe(1);
  });

  it('adds support only where the sag exceeds the limit and the bay can take it, when asked to', () => {
    const s = spec({ ...base, construction: { supportBlock: { placement: 'when-needed' } } });
    const a = analyseShelves(s, rackGeometry(s));
    expect(a.sagUnsupportedIn).toBeGreaterThan(s.limits.maxShelfSagIn);
    expect(a.supportBlocksUsed).toBe(true);
    expect(a.supportColumns).toBe(1);
    // 2 of 3 columns: (2 x 16.25 + 1/3 of the 1/2 in play)
    expect(a.longestSpanSupportedIn).toBeCloseTo(2 * (16.25 + 0.5 / 3), 9);
    // sag scales at least with L^4 for the same w
    expect(a.sagSupportedIn! / a.sagUnsupportedIn).toBeLessThan((2 / 3) ** 3);
  });

  it('cannot support a one-column bay', () => {
    const s = spec({ ...base, tub: { ...base.tub, width: 40 }, layout: { levels: 5, columns: 1 } });
    const a = analyseShelves(s, rackGeometry(s));
    expect(a.supportBlocksUsed).toBe(false);
    expect(a.sagSupportedIn).toBeNull();
  });

  it('uses the heated modulus for PVC only when the rack is heated', () => {
    const heated = spec(base);
    const cold = spec({ ...base, heat: { enabled: false } });
    const h = analyseShelves(heated, rackGeometry(heated));
    const c = analyseShelves(cold, rackGeometry(cold));
    expect(h.modulusHeated).toBe(true);
    expect(c.modulusHeated).toBe(false);
    expect(h.sagUnsupportedIn).toBeGreaterThan(c.sagUnsupportedIn);
    const ply = spec({ ...base, construction: { carcassMaterial: 'plywood' } });
    expect(analyseShelves(ply, rackGeometry(ply)).modulusHeated).toBe(false);
  });

  it('lid gaps: interior levels cancel, the bottom level is pinched, the top level opens', () => {
    const s = spec({ ...base, limits: { maxShelfSag: 100 } }); // no blocks: sag as is
    const a = analyseShelves(s, rackGeometry(s));
    const gaps = levelGaps(s, a);
    expect(gaps).toHaveLength(5);
    expect(gaps[2].lidGapIn).toBeCloseTo(0.125, 12);
    expect(gaps[0].lidGapIn).toBeCloseTo(0.125 + a.bottomSagIn - a.shelfSagIn, 12);
    expect(gaps[4].lidGapIn).toBeCloseTo(0.125 + a.shelfSagIn - a.topSagIn, 12);
    expect(gaps[4].lidGapIn).toBeGreaterThan(0.125); // the loaded floor sags more than the unloaded top
  });
});

describe('masses and casters', () => {
  it('weighs parts by volume and density', () => {
    const s = spec({ tub: { length: 10, width: 10, height: 5, loadedMass: 2 }, layout: { levels: 1, columns: 1 } });
    const part = { key: 'x', name: 'x', material: 'pvc-rigid' as const, lengthIn: 10, widthIn: 10, thicknessIn: 1, quantity: 2, section: 1 };
    const m = rackMasses(s, [part]);
    // 200 in^3 at 1410 kg/m^3
    expect(m.emptyMassLb).toBeCloseTo(200 * 1410 * LB_PER_IN3_PER_KG_M3, 9);
    expect(m.tubsMassLb).toBe(2);
    expect(m.loadedMassLb).toBeCloseTo(m.emptyMassLb + 2, 12);
  });

  it('assumes one caster carries nothing (common practice)', () => {
    expect(loadPerCasterLb(300, 4)).toBe(100);
    expect(loadPerCasterLb(500, 6)).toBe(100);
  });
});
