import { describe, expect, it } from 'vitest';
import { KG_PER_LB, MM_PER_IN, formatInches, inToMm, lbToKg } from '../../shared/units.js';

describe('units against NIST SP 811', () => {
  it('1 in = 25.4 mm exactly (NIST SP 811, appendix B.8)', () => {
    expect(MM_PER_IN).toBe(25.4);
    expect(inToMm(1)).toBe(25.4);
    expect(inToMm(12)).toBeCloseTo(304.8, 10); // 1 ft = 0.3048 m exactly (NIST SP 811)
  });

  it('1 lb = 0.45359237 kg exactly (NIST SP 811, appendix B.8)', () => {
    expect(KG_PER_LB).toBe(0.45359237);
    expect(lbToKg(1)).toBe(0.45359237);
  });

  it('tape-measure fractions to 1/16 in (common practice)', () => {
    expect(formatInches(34.125)).toBe('34 1/8');
    expect(formatInches(6.625)).toBe('6 5/8');
  });
});
