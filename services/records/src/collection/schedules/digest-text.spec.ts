import { describe, expect, it } from 'vitest';
import type { DueAnimal } from '../../../../../shared/api/collection-schedules.js';
import { digestText } from './digest-text.js';

const animal = (over: Partial<DueAnimal>): DueAnimal => ({
  animalId: 1, code: 'PR-001', name: '', species: 'Python regius', tubId: 1, tubLabel: 'R1-1A', stage: 'adult', intervalDays: 14,
  lastFedAt: null, lastResult: null, dueOn: '2026-12-01', daysOverdue: 0, refusalStreak: 0, refusalFlag: false,
  weightLossPct: null, weightLossFlag: false, latestWeightG: 1500, suggestedPreyMassG: 150, ...over,
});

describe('daily digest text', () => {
  it('lists animals by rack and puts flagged ones first', () => {
    const d = digestText({ date: '2026-12-01', total: 2, racks: [{ rackName: 'R1', animals: [animal({}), animal({ code: 'PR-002', tubLabel: 'R1-1B', refusalStreak: 4, refusalFlag: true })] }], unplaced: [] });
    expect(d.subject).toBe('Feeding due 2026-12-01: 2 animal(s), 1 to watch');
    expect(d.flagged).toBe(1);
    expect(d.text.indexOf('Watch these')).toBeLessThan(d.text.indexOf('Rack R1'));
    expect(d.text).toContain('R1-1B  PR-002, prey about 150 g  ⚑ refused 4 in a row');
  });

  it('says so when nobody is due', () => {
    expect(digestText({ date: '2026-12-01', total: 0, racks: [], unplaced: [] }).text).toContain('Nobody is due today.');
  });
});
