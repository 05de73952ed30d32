import { describe, expect, it } from 'vitest';
import { defaultIntervalDays, FEEDING_INTERVAL_DAYS, feedingDue, feedingStage, refusalStreak, suggestedPreyMassG, weightLossPct } from './feeding-schedule.js';

describe('feeding defaults (common practice, from memory)', () => {
  it('feeds hatchlings every 5 to 7 days and adults every 10 to 14 days', () => {
    expect(FEEDING_INTERVAL_DAYS.hatchling).toEqual({ min: 5, max: 7 }); // common practice, from memory
    expect(FEEDING_INTERVAL_DAYS.adult).toEqual({ min: 10, max: 14 }); // common practice, from memory
    expect(defaultIntervalDays('hatchling')).toBe(7);
    expect(defaultIntervalDays('adult')).toBe(14);
  });

  it('stages by age, else by mass, else adult', () => {
    expect(feedingStage('2026-10-01', 3000, '2026-12-01')).toBe('hatchling'); // age wins over mass
    expect(feedingStage('2025-06-01', null, '2026-12-01')).toBe('juvenile');
    expect(feedingStage('2022-06-01', 90, '2026-12-01')).toBe('adult');
    expect(feedingStage(null, 80, '2026-12-01')).toBe('hatchling');
    expect(feedingStage(null, 1500, '2026-12-01')).toBe('adult');
    expect(feedingStage(null, null, '2026-12-01')).toBe('adult');
  });

  it('suggests prey of about 10 % of body mass (common practice)', () => {
    expect(suggestedPreyMassG(1500)).toBe(150);
    expect(suggestedPreyMassG(84)).toBe(8);
    expect(suggestedPreyMassG(4)).toBe(1);
    expect(suggestedPreyMassG(null)).toBeNull();
  });
});

describe('due dates', () => {
  it('is due the interval after the last feeding, overdue after that', () => {
    const hatchling = { hatchDate: '2026-11-01', weightG: 70, ownIntervalDays: null, lastFedAt: '2026-11-25T18:00:00.000Z' };
    expect(feedingDue(hatchling, '2026-12-01')).toMatchObject({ stage: 'hatchling', intervalDays: 7, dueOn: '2026-12-02', isDue: false, daysOverdue: -1 });
    expect(feedingDue(hatchling, '2026-12-04')).toMatchObject({ dueOn: '2026-12-02', isDue: true, daysOverdue: 2 });
  });

  it('uses the animal\'s own interval, and a never-fed animal is due today', () => {
    expect(feedingDue({ hatchDate: null, weightG: 1800, ownIntervalDays: 21, lastFedAt: '2026-11-20T10:00:00Z' }, '2026-12-01')).toMatchObject({ dueOn: '2026-12-11', isDue: false });
    expect(feedingDue({ hatchDate: null, weightG: null, ownIntervalDays: null, lastFedAt: null }, '2026-12-01')).toMatchObject({ dueOn: '2026-12-01', isDue: true, daysOverdue: 0 });
  });
});

describe('flags', () => {
  it('counts refusals and regurgitations in a row from the latest', () => {
    expect(refusalStreak(['refused', 'regurgitated', 'refused', 'accepted', 'refused'])).toBe(3);
    expect(refusalStreak(['accepted', 'refused'])).toBe(0);
    expect(refusalStreak([])).toBe(0);
  });

  it('measures weight loss against the peak of the previous 60 days', () => {
    const w = (day: string, weightG: number) => ({ occurredAt: `${day}T12:00:00Z`, weightG });
    expect(weightLossPct([w('2026-10-01', 1000), w('2026-11-01', 1200), w('2026-12-01', 1080)])).toBe(10); // (1200-1080)/1200
    expect(weightLossPct([w('2026-08-01', 2000), w('2026-12-01', 1080)])).toBeNull(); // peak too old
    expect(weightLossPct([w('2026-11-01', 900), w('2026-12-01', 950)])).toBeNull();
    expect(weightLossPct([w('2026-12-01', 950)])).toBeNull();
  });
});
