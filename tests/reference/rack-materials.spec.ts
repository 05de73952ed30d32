import { describe, expect, it } from 'vitest';
import { MATERIALS } from '../../services/calculator/src/domain/materials.js';

describe('material list against outside sources', () => {
  it('rigid PVC has a specific gravity of about 1.41 (ASTM D792 values in plastics makers’ data sheets)', () => {
    const sg = MATERIALS['pvc-rigid'].densityKgM3.value / 1000; // water = 1000 kg/m^3
    expect(sg).toBeGreaterThanOrEqual(1.38);
    expect(sg).toBeLessThanOrEqual(1.45);
    expect(MATERIALS['pvc-rigid'].densityKgM3.fromMemory).toBe(false);
  });

  it('rigid PVC modulus sits in the 2.4 to 3.4 GPa range of makers’ data sheets (from memory)', () => {
    const e = MATERIALS['pvc-rigid'].modulusMPa.value;
    expect(e).toBeGreaterThanOrEqual(2400);
    expect(e).toBeLessThanOrEqual(3400);
  });

  it('No. 2 spruce-pine-fir E = 1,400,000 psi (NDS Supplement Table 4A, from memory)', () => {
    expect(MATERIALS['lumber-2x4'].modulusMPa.value * 145.0377).toBeCloseTo(1.4e6, -4);
  });
});
