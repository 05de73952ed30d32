import { describe, expect, it } from 'vitest';
import { PairingOutcomesRequest } from '../../../../../shared/api/genetics.js';
import { pairingOutcomes } from '../../../../calculator/src/domain/genetics/pairing-outcomes.js';
import { hatchlingGenes, type TraitRef } from './hatchling-genes.js';

// The outcome tables come from the genetics domain itself; these tests check how a hatchling reads them.
const traits: TraitRef[] = [
  { id: 1, name: 'amber', mode: 'recessive' },
  { id: 2, name: 'dusk', mode: 'incomplete-dominant' },
  { id: 3, name: 'frost', mode: 'dominant' },
];
const table = (sire: object, dam: object) => pairingOutcomes(PairingOutcomesRequest.parse({ traits: traits.map(({ name, mode }) => ({ name, mode })), sire, dam }));

describe('hatchling genes from the parents and what it shows', () => {
  it('het x het: a normal-looking hatchling is 2/3 possible het (Mendel, OpenStax Biology 2e ch. 12)', () => {
    const r = hatchlingGenes(traits, table({ amber: 'het' }, { amber: 'het' }), {}, 'h');
    expect(r).toEqual({ ok: true, genes: [{ traitId: 1, state: 'possible-het', hetProbability: 0.6667 }] });
    const visual = hatchlingGenes(traits, table({ amber: 'het' }, { amber: 'het' }), { amber: 'visual' }, 'h');
    expect(visual).toEqual({ ok: true, genes: [{ traitId: 1, state: 'visual', hetProbability: null }] });
  });

  it('visual x normal: every hatchling is het for sure; single x single shows single or super', () => {
    expect(hatchlingGenes(traits, table({ amber: 'visual' }, {}), {}, 'h')).toEqual({ ok: true, genes: [{ traitId: 1, state: 'het', hetProbability: null }] });
    const r = hatchlingGenes(traits, table({ dusk: 'single' }, { dusk: 'single' }), { dusk: 'super' }, 'h');
    expect(r).toEqual({ ok: true, genes: [{ traitId: 2, state: 'super', hetProbability: null }] });
  });

  it('stores a shown dominant trait as single unless only super is possible', () => {
    expect(hatchlingGenes(traits, table({ frost: 'single' }, {}), { frost: 'visual' }, 'h')).toMatchObject({ genes: [{ traitId: 3, state: 'single' }] });
    expect(hatchlingGenes(traits, table({ frost: 'super' }, { frost: 'super' }), { frost: 'visual' }, 'h')).toMatchObject({ genes: [{ traitId: 3, state: 'super' }] });
  });

  it('refuses looks the parents cannot produce, unknown traits and states that do not fit', () => {
    expect(hatchlingGenes(traits, table({ amber: 'het' }, {}), { amber: 'visual' }, 'hatchlings[0].looks')).toMatchObject({ ok: false, field: 'hatchlings[0].looks' });
    expect(hatchlingGenes(traits, table({ amber: 'het' }, {}), { lattice: 'visual' }, 'h')).toMatchObject({ ok: false, field: 'h.lattice' });
    expect(hatchlingGenes(traits, table({ amber: 'het' }, {}), { amber: 'super' }, 'h')).toMatchObject({ ok: false, field: 'h.amber' });
  });
});
