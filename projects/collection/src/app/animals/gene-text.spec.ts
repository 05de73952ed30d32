import { ageText, geneLabel } from './gene-text';

describe('geneLabel', () => {
  it('writes genes the way keepers do', () => {
    expect(geneLabel({ trait: 'amber', state: 'het', hetProbability: null })).toBe('het amber');
    expect(geneLabel({ trait: 'amber', state: 'possible-het', hetProbability: 0.6667 })).toBe('66.7 % possible het amber');
    expect(geneLabel({ trait: 'dusk', state: 'super', hetProbability: null })).toBe('super dusk');
    expect(geneLabel({ trait: 'dusk', state: 'single', hetProbability: null })).toBe('dusk');
    expect(geneLabel({ trait: 'lattice', state: 'visual', hetProbability: null })).toBe('lattice');
  });
});

describe('ageText', () => {
  const today = new Date('2026-12-02T12:00:00Z');
  it('counts days, weeks, months and years', () => {
    expect(ageText('2026-12-01', today)).toBe('1 day');
    expect(ageText('2026-11-04', today)).toBe('4 weeks');
    expect(ageText('2026-06-02', today)).toBe('6 months');
    expect(ageText('2024-09-01', today)).toBe('2 years 3 months');
    expect(ageText('2023-12-01', today)).toBe('3 years');
    expect(ageText(null, today)).toBe('Unknown');
    expect(ageText('2027-01-01', today)).toBe('Not hatched yet');
  });
});
