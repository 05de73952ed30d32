import { describe, expect, it } from 'vitest';
import { speciesList } from './species-ranges.js';

describe('speciesList', () => {
  it('lists the ball python with its common-practice ranges even with no animals', () => {
    // Common practice: warm side 88 to 92 °F, cool side 76 to 80 °F, humidity 50 to 60 %.
    expect(speciesList([])).toEqual([{ name: 'Python regius', commonName: 'ball python', animalCount: 0, ranges: { warmF: [88, 92], coolF: [76, 80], humidityPct: [50, 60] } }]);
  });

  it('merges spellings that differ only in case or spaces, and keeps species it has no ranges for', () => {
    const list = speciesList([
      { name: 'python regius', count: 2 },
      { name: 'Python regius ', count: 3 },
      { name: 'Morelia spilota', count: 4 },
      { name: 'Liasis olivaceus', count: 1 },
      { name: '  ', count: 9 },
    ]);
    expect(list.map((s) => [s.name, s.animalCount, s.commonName, s.ranges === null])).toEqual([
      ['Liasis olivaceus', 1, null, true],
      ['Morelia spilota', 4, 'carpet python', true],
      ['Python regius', 5, 'ball python', false],
    ]);
  });
});
