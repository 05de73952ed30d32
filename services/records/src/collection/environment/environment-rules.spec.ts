import { describe, expect, it } from 'vitest';
import { RANGES, readingAlerts } from './environment-rules.js';

describe('environment alerts (common practice ranges)', () => {
  it('uses warm 88 to 92 °F, cool 76 to 80 °F, humidity 50 to 60 %', () => {
    expect(RANGES).toMatchObject({ warmF: [88, 92], coolF: [76, 80], humidityPct: [50, 60] }); // common practice
    expect(RANGES.caution).toMatch(/calibrated thermometer at tub level/);
  });

  it('flags readings outside the range of their probe, edges included as fine', () => {
    expect(readingAlerts({ probe: 'warm', tempF: 88, humidityPct: 60 })).toEqual([]);
    expect(readingAlerts({ probe: 'warm', tempF: 94.5, humidityPct: null })).toEqual(['warm side 94.5 °F is above 92 °F']);
    expect(readingAlerts({ probe: 'cool', tempF: 74, humidityPct: 45 })).toEqual(['cool side 74 °F is below 76 °F', 'humidity 45 % is below 50 %']);
    expect(readingAlerts({ probe: 'ambient', tempF: 70, humidityPct: 55 })).toEqual([]);
  });
});
