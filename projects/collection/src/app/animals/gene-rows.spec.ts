import { rowsFromGenes, statesFor, toSetGenesRequest } from './gene-rows';

const traits = [
  { id: 1, name: 'amber', mode: 'recessive' as const },
  { id: 2, name: 'dusk', mode: 'incomplete-dominant' as const },
];

describe('gene rows', () => {
  it('offers the states of the trait\'s mode', () => {
    expect(statesFor('recessive')).toEqual(['het', 'visual', 'possible-het']);
    expect(statesFor('dominant')).toEqual(['single', 'super']);
  });

  it('turns rows into the request, the possible-het chance from percent to a fraction', () => {
    const request = toSetGenesRequest(
      [
        { traitId: 1, state: 'possible-het', hetPercent: '66.67' },
        { traitId: 2, state: 'super', hetPercent: '' },
        { traitId: null, state: 'het', hetPercent: '' },
      ],
      traits,
    );
    expect(request).toEqual({ genes: [{ traitId: 1, state: 'possible-het', hetProbability: 0.6667 }, { traitId: 2, state: 'super' }] });
  });

  it('refuses what the service would refuse, in words', () => {
    expect(toSetGenesRequest([{ traitId: 1, state: 'het', hetPercent: '' }, { traitId: 1, state: 'visual', hetPercent: '' }], traits)).toBe('amber is listed twice.');
    expect(toSetGenesRequest([{ traitId: 2, state: 'het', hetPercent: '' }], traits)).toMatch(/^dusk is incomplete dominant: pick single/);
    expect(toSetGenesRequest([{ traitId: 1, state: 'possible-het', hetPercent: '100' }], traits)).toMatch(/between 0 and 100/);
    expect(toSetGenesRequest([{ traitId: 9, state: 'het', hetPercent: '' }], traits)).toMatch(/Pick a trait/);
  });

  it('reads recorded genes back into rows', () => {
    expect(rowsFromGenes([{ traitId: 1, trait: 'amber', mode: 'recessive', state: 'possible-het', hetProbability: 0.6667 }])).toEqual([
      { traitId: 1, state: 'possible-het', hetPercent: '66.67' },
    ]);
  });
});
