import { describe, expect, it } from 'vitest';
import { celsiusToFahrenheit, fahrenheitToCelsius, roundTo } from '../../services/records/src/collection/environment/temperature.js';

/*
 * NIST Special Publication 811 (2008 edition), "Guide for the Use of the International System of
 * Units", Appendix B.8/B.9: t/°C = (t/°F − 32)/1.8, so t/°F = 1.8 t/°C + 32 (an exact relation).
 * Check values are worked from that equation; the fixed points 32 °F = 0 °C and −40 °F = −40 °C
 * follow from it directly.
 */
describe('temperature conversion, NIST SP 811', () => {
  it('maps the fixed points exactly', () => {
    expect(fahrenheitToCelsius(32)).toBe(0); // NIST SP 811 B.8 equation
    expect(fahrenheitToCelsius(212)).toBe(100); // same equation: (212 − 32)/1.8
    expect(fahrenheitToCelsius(-40)).toBe(-40); // the scales cross at −40
    expect(celsiusToFahrenheit(100)).toBe(212);
  });

  it('converts the husbandry range edges (common practice 76, 80, 88, 92 °F)', () => {
    expect(roundTo(fahrenheitToCelsius(88), 4)).toBe(31.1111); // (88 − 32)/1.8 = 56/1.8 = 31.111…
    expect(roundTo(fahrenheitToCelsius(92), 4)).toBe(33.3333); // 60/1.8
    expect(roundTo(fahrenheitToCelsius(76), 4)).toBe(24.4444); // 44/1.8
    expect(roundTo(fahrenheitToCelsius(80), 4)).toBe(26.6667); // 48/1.8
  });

  it('round-trips without drift', () => {
    for (const f of [-10, 0, 55.5, 89.6, 104]) expect(celsiusToFahrenheit(fahrenheitToCelsius(f))).toBeCloseTo(f, 10);
  });
});
