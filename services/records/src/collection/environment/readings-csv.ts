import type { CsvRow } from '../shared/csv.js';
import type { Probe } from './environment-rules.js';
import { fahrenheitToCelsius, celsiusToFahrenheit, roundTo } from './temperature.js';

export const READING_COLUMNS = ['takenAt', 'tempF', 'tempC', 'humidityPct', 'probe'] as const;
const PROBES: readonly string[] = ['warm', 'cool', 'ambient'];
const DATE_TIME = /^\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?$/;

export interface ParsedReading {
  takenAt: string;
  tempF: number | null;
  humidityPct: number | null;
  probe: Probe;
}

export type RowError = { row: number; field: string; message: string };

/**
 * Logger rows: a time (UTC unless it says otherwise), °F or °C (converted exactly, NIST SP 811),
 * humidity and the probe (warm when left empty). Every bad cell is reported, not just the first.
 */
export function readLoggerRows(rows: readonly CsvRow[], now = new Date()): { readings: ParsedReading[]; errors: RowError[] } {
  const readings: ParsedReading[] = [];
  const errors: RowError[] = [];
  for (const { line, values } of rows) {
    const fail = (field: string, message: string) => errors.push({ row: line, field, message });
    const at = values.takenAt ?? '';
    let takenAt = '';
    if (!DATE_TIME.test(at) || Number.isNaN(Date.parse(at.replace(' ', 'T') + (/(Z|[+-]\d{2}:?\d{2})$/.test(at) ? '' : 'Z')))) fail('takenAt', 'is not a date and time like 2026-12-01T08:00:00Z');
    else {
      takenAt = new Date(at.replace(' ', 'T') + (/(Z|[+-]\d{2}:?\d{2})$/.test(at) ? '' : 'Z')).toISOString();
      if (Date.parse(takenAt) > now.getTime() + 5 * 60_000) fail('takenAt', 'is in the future');
    }
    const number = (field: string, min: number, max: number): number | null => {
      const raw = values[field] ?? '';
      if (raw === '') return null;
      const n = Number(raw);
      if (!Number.isFinite(n)) fail(field, `"${raw}" is not a number`);
      else if (n < min || n > max) fail(field, `${n} is outside ${min} to ${max}`);
      else return n;
      return null;
    };
    const tempF = number('tempF', -40, 160);
    const tempC = number('tempC', -40, 71);
    const humidityPct = number('humidityPct', 0, 100);
    if (tempF !== null && tempC !== null && Math.abs(roundTo(fahrenheitToCelsius(tempF), 1) - tempC) > 0.1) fail('tempC', 'does not match tempF; give one of them');
    const probe = values.probe || 'warm';
    if (!PROBES.includes(probe)) fail('probe', `is one of ${PROBES.join(', ')}`);
    const f = tempF ?? (tempC !== null ? roundTo(celsiusToFahrenheit(tempC), 2) : null);
    if (f === null && humidityPct === null && !errors.some((e) => e.row === line)) fail('tempF', 'give a temperature, a humidity or both');
    readings.push({ takenAt, tempF: f, humidityPct, probe: probe as Probe });
  }
  return { readings, errors };
}
