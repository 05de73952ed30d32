import { describe, expect, it } from 'vitest';
import { centerPointLoadDeflection, uniformLoadDeflection } from '../../services/calculator/src/domain/loads.js';

// Worked example for the beam formulas of AISC Steel Construction Manual, Table 3-23
// (case 1, simple beam with uniform load; case 7, simple beam with a concentrated load at the centre):
// L = 6 m, E = 200 GPa, I = 8 x 10^-6 m^4.
const L_M = 6;
const E_PA = 200e9;
const I_M4 = 8e-6;

describe('beam deflection against AISC Table 3-23', () => {
  it('uniform load w = 10 kN/m gives 105.47 mm at mid-span (5wL^4/384EI)', () => {
    const deflectionM = uniformLoadDeflection(10e3, L_M, E_PA, I_M4);
    expect(deflectionM * 1000).toBeCloseTo(105.47, 2);
  });

  it('P = 50 kN at mid-span gives 140.63 mm (PL^3/48EI)', () => {
    const deflectionM = centerPointLoadDeflection(50e3, L_M, E_PA, I_M4);
    expect(deflectionM * 1000).toBeCloseTo(140.63, 1);
    expect(Math.abs(deflectionM * 1000 - 140.63)).toBeLessThan(0.005);
  });
});
