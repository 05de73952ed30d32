import { describe, expect, it } from 'vitest';
import { expectedHatch, layingWindow } from './breeding-dates.js';

describe('expected hatch (common practice: 55 to 60 days at 88 to 90 °F)', () => {
  it('counts 55 and 60 days from the lay date, across a year end', () => {
    expect(expectedHatch('2026-11-20', 89)).toEqual({ from: '2027-01-14', to: '2027-01-19', warning: null }); // 10 days left in November + 31 in December + 14 = 55
  });

  it('warns when the incubator runs outside 88 to 90 °F', () => {
    expect(expectedHatch('2026-03-01', 86).warning).toMatch(/86 °F is outside 88 to 90 °F/);
    expect(expectedHatch('2026-03-01', 90).warning).toBeNull();
    expect(expectedHatch('2026-03-01', null).warning).toBeNull();
  });
});

describe('laying window (common practice, from memory)', () => {
  it('prefers the pre-lay shed (about 30 days) over ovulation (about 44 to 54 days)', () => {
    expect(layingWindow('2026-04-01', '2026-03-10')).toEqual({ from: '2026-04-28', to: '2026-05-04', basis: 'pre-lay-shed' });
    expect(layingWindow(null, '2026-03-10')).toEqual({ from: '2026-04-23', to: '2026-05-03', basis: 'ovulation' });
    expect(layingWindow(null, null)).toBeNull();
  });
});
