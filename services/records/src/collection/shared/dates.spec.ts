import { describe, expect, it } from 'vitest';
import { addDays, assertNotFuture, daysBetween, toUtcIso } from './dates.js';

describe('collection dates', () => {
  it('adds days across month and year ends and leap days', () => {
    expect(addDays('2026-12-25', 10)).toBe('2027-01-04');
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29'); // 2028 is a leap year (divisible by 4, not by 100)
    expect(daysBetween('2027-01-04', '2026-12-25')).toBe(-10);
  });

  it('stores offsets as UTC', () => {
    expect(toUtcIso('2026-12-01T20:00:00-05:00')).toBe('2026-12-02T01:00:00.000Z');
  });

  it('refuses future times and days, naming the field', () => {
    const now = new Date('2026-12-02T12:00:00Z');
    expect(() => assertNotFuture('2026-12-02T11:00:00Z', 'occurredAt', now)).not.toThrow();
    expect(() => assertNotFuture('2026-12-02', 'laidOn', now)).not.toThrow();
    expect(() => assertNotFuture('2026-12-03', 'laidOn', now)).toThrow(/laidOn/);
    expect(() => assertNotFuture('2026-12-02T13:00:00Z', 'occurredAt', now)).toThrow(expect.objectContaining({ field: 'occurredAt', status: 400 }));
    expect(() => assertNotFuture('2026-02-30', 'laidOn', now)).toThrow(/calendar/);
  });
});
