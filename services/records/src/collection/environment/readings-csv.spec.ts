import { describe, expect, it } from 'vitest';
import { parseCsv } from '../shared/csv.js';
import { READING_COLUMNS, readLoggerRows } from './readings-csv.js';

const now = new Date('2026-12-02T12:00:00Z');
const read = (text: string) => readLoggerRows(parseCsv(text, READING_COLUMNS, ['takenAt']), now);

describe('data-logger rows', () => {
  it('reads °F, converts °C exactly (NIST SP 811) and defaults the probe to warm', () => {
    const r = read('takenAt,tempF,tempC,humidityPct,probe\n2026-12-01 08:00,89.5,,55,warm\n2026-12-01T09:00:00+01:00,,25,,cool\n2026-12-01T10:00:00Z,,,58,\n');
    expect(r.errors).toEqual([]);
    expect(r.readings).toEqual([
      { takenAt: '2026-12-01T08:00:00.000Z', tempF: 89.5, humidityPct: 55, probe: 'warm' },
      { takenAt: '2026-12-01T08:00:00.000Z', tempF: 77, humidityPct: null, probe: 'cool' }, // 25 °C × 1.8 + 32 = 77 °F
      { takenAt: '2026-12-01T10:00:00.000Z', tempF: null, humidityPct: 58, probe: 'warm' },
    ]);
  });

  it('lists every bad cell with its line and column', () => {
    const r = read('takenAt,tempF,humidityPct,probe\nyesterday,90,50,warm\n2026-12-01T08:00:00Z,hot,120,side\n2099-01-01T00:00:00Z,,,warm\n');
    expect(r.errors).toEqual([
      { row: 2, field: 'takenAt', message: expect.any(String) },
      { row: 3, field: 'tempF', message: '"hot" is not a number' },
      { row: 3, field: 'humidityPct', message: '120 is outside 0 to 100' },
      { row: 3, field: 'probe', message: 'is one of warm, cool, ambient' },
      { row: 4, field: 'takenAt', message: 'is in the future' },
    ]);
  });
});
