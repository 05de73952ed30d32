import { COMPARISON } from './compare-fixture';
import { compareGroups, lengthDifference, moneyDifference } from './compare-rows';

const row = (group: string, key: string) => compareGroups(COMPARISON).find((g) => g.id === group)!.rows.find((r) => r.key === key)!;

describe('compareGroups', () => {
  it('marks what differs with B − A in the unit of the comparison, to 1/16 in', () => {
    expect(row('dimensions', 'overallHeight')).toMatchObject({ label: 'Overall height', a: '71 5/8 in', b: '78 1/4 in', difference: '+6 5/8 in', differs: true });
    expect(row('dimensions', 'overallDepth')).toMatchObject({ difference: '\u22121/2 in', differs: true });
    expect(row('dimensions', 'levelOpening')).toMatchObject({ difference: '', differs: false });
    // 0.01 in is below a sixteenth: the same as a builder reads it.
    expect(row('dimensions', 'overallWidth').differs).toBe(false);
  });

  it('counts the rack, its checks and the sheets per material, with a dash for a material a plan does not use', () => {
    expect(row('rack', 'levels')).toMatchObject({ a: '9', b: '10', difference: '+1', differs: true });
    expect(row('rack', 'tubs')).toMatchObject({ a: '27', b: '30', difference: '+3' });
    expect(row('rack', 'columns').differs).toBe(false);
    expect(row('rack', 'dangers')).toMatchObject({ a: '0', b: '1', differs: true });
    expect(row('sheets', 'plywood@0.75')).toMatchObject({ label: 'Plywood', hint: '3/4 in thick', a: '—', b: '1', difference: '+1' });
    expect(row('sheets', 'lumber-2x4@1.5').differs).toBe(false);
    expect(row('sheets', 'all-sheets')).toMatchObject({ a: '7', b: '9', difference: '+2' });
  });

  it('shows cost lines as money with a signed difference', () => {
    expect(row('cost', 'total')).toMatchObject({ label: 'Total with margin', a: '2,543.32', b: '2,842.97', difference: '+299.65', differs: true });
    expect(row('cost', 'labor').difference).toBe('\u221220.00');
    expect(row('cost', 'hardware').differs).toBe(false);
  });
});

describe('differences', () => {
  it('reads millimetres to 0.1 and ignores float noise in money', () => {
    expect(lengthDifference(-12.7, 'mm')).toBe('\u221212.7 mm');
    expect(lengthDifference(0.04, 'mm')).toBe('');
    expect(moneyDifference(0.001)).toBe('');
    expect(moneyDifference(1234.5)).toBe('+1,234.50');
  });
});
