import { toCelsius } from './environment-range';

describe('toCelsius', () => {
  it('converts °F to °C (NIST SP 811: t/°C = (t/°F − 32) / 1.8)', () => {
    expect(toCelsius(32)).toBe(0);
    expect(toCelsius(212)).toBe(100);
    expect(toCelsius(90)).toBe(32.2);
    expect(toCelsius(-40)).toBe(-40);
  });
});
