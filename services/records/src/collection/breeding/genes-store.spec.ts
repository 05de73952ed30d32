import { describe, expect, it } from 'vitest';
import { morphLabel, outcomesRequest } from './genes-store.js';

describe('genes to a genetics request and a morph label', () => {
  it('builds the request from both parents, traits once each, possible hets as chances', () => {
    const req = outcomesRequest(
      [{ traitId: 1, trait: 'amber', mode: 'recessive', state: 'het', hetProbability: null }],
      [
        { traitId: 1, trait: 'amber', mode: 'recessive', state: 'possible-het', hetProbability: 0.66667 },
        { traitId: 2, trait: 'dusk', mode: 'incomplete-dominant', state: 'single', hetProbability: null },
      ],
    );
    expect(req).toEqual({
      traits: [{ name: 'amber', mode: 'recessive' }, { name: 'dusk', mode: 'incomplete-dominant' }],
      sire: { amber: 'het' },
      dam: { amber: { state: 'possible-het', hetProbability: 0.6667 }, dusk: 'single' },
    });
    expect(outcomesRequest([], [])).toBeNull();
  });

  it('writes genes the way keepers do', () => {
    expect(morphLabel([])).toBe('normal');
    expect(morphLabel([
      { trait: 'amber', state: 'visual', hetProbability: null },
      { trait: 'dusk', state: 'super', hetProbability: null },
      { trait: 'lattice', state: 'het', hetProbability: null },
      { trait: 'frost', state: 'possible-het', hetProbability: 0.6667 },
    ])).toBe('amber, super dusk, het lattice, 67% possible het frost');
  });
});
