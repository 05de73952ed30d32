import { planFixture } from '../../testing/plan-fixture';
import { formatMoney, notableChecks, sheetLines, showLength } from './plan-summary';

describe('plan summary', () => {
  it('shows lengths in the plan unit: fractions of an inch to 1/16, or mm', () => {
    expect(showLength(51.25, 'in')).toBe('51 1/4 in');
    expect(showLength(1301.75, 'mm')).toBe('1301.8 mm');
  });

  it('lists the sheets per material and thickness', () => {
    expect(sheetLines(planFixture())).toEqual([
      { count: 4, text: '4 sheets of rigid PVC, 1/2 in' },
      { count: 1, text: '1 sheet of plywood, 1/2 in' },
    ]);
  });

  it('keeps only the checks a visitor should act on', () => {
    expect(notableChecks(planFixture())).toEqual([
      { severity: 'warning', message: 'The rack is 3.0 times as tall as it is deep: anchor it to the wall and lock the casters.' },
    ]);
  });

  it('formats money in whole units of the shop currency', () => {
    expect(formatMoney(2026.64, 'usd')).toBe('$2,027');
    expect(formatMoney(2026.64, 'eur')).toBe('€2,027');
    expect(formatMoney(2026.64, 'not a currency')).toBe('2,027');
  });
});
