import { describe, expect, it } from 'vitest';
import { SHEET_MATERIAL_IDS } from '../../../../shared/api/rack-plan.js';
import { LB_PER_IN3_PER_KG_M3, MATERIALS, PSI_PER_MPA, densityLbIn3, shelfModulus } from './materials.js';

describe('material list', () => {
  it('covers every sheet material of the API and the 2x4', () => {
    for (const id of SHEET_MATERIAL_IDS) expect(MATERIALS[id].id).toBe(id);
    expect(MATERIALS['lumber-2x4']).toBeDefined();
  });

  it('gives every value a source and marks values from memory', () => {
    for (const m of Object.values(MATERIALS)) {
      for (const v of [m.densityKgM3, m.modulusMPa, m.heatedModulusMPa].filter((x) => x !== undefined)) {
        expect(v.value).toBeGreaterThan(0);
        expect(v.source.length).toBeGreaterThan(5);
        expect(v.source.includes('from memory')).toBe(v.fromMemory);
      }
    }
  });

  it('only PVC softens in the heat here, and never stiffens', () => {
    for (const m of Object.values(MATERIALS)) {
      if (m.heatedModulusMPa) {
        expect(m.id.startsWith('pvc')).toBe(true);
        expect(m.heatedModulusMPa.value).toBeLessThan(m.modulusMPa.value);
      }
    }
    expect(shelfModulus(MATERIALS['pvc-rigid'], true).heated).toBe(true);
    expect(shelfModulus(MATERIALS.plywood, true).heated).toBe(false);
  });

  it('converts units from the exact inch, pound and pound-force', () => {
    // water, 1000 kg/m^3, is 0.0361273 lb/in^3 (from memory, a handbook value)
    expect(1000 * LB_PER_IN3_PER_KG_M3).toBeCloseTo(0.0361273, 6);
    // 1 MPa = 145.0377 psi (NIST SP 811 factor 6.894757 kPa per psi)
    expect(PSI_PER_MPA).toBeCloseTo(145.0377, 3);
    expect(densityLbIn3(MATERIALS['pvc-rigid'])).toBeCloseTo(1.41 * 0.0361273, 5);
  });
});
