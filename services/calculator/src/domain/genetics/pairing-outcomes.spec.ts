import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  INHERITANCE_MODES,
  PAIRING_OUTCOMES_EXAMPLE,
  PairingOutcomesRequest,
  STATES_BY_MODE,
  type InheritanceMode,
  type ParentGene,
  type PairingOutcomesResponse,
} from '../../../../../shared/api/genetics.js';
import { add, fraction, ONE, ZERO, type Fraction } from './fraction.js';
import { MAX_GENOTYPE_CLASSES, pairingOutcomes, TooManyOutcomesError } from './pairing-outcomes.js';

const run = (input: unknown) => pairingOutcomes(PairingOutcomesRequest.parse(input));

const parseFraction = (text: string): Fraction => {
  const [n, d] = text.split('/');
  return fraction(BigInt(n!), BigInt(d!));
};
const total = (rows: { fraction: string }[]) => rows.reduce((acc, r) => add(acc, parseFraction(r.fraction)), ZERO);

describe('pairing outcomes, worked examples', () => {
  // amber het x het: 1/4 normal, 1/2 het, 1/4 visual; dusk single x normal: 1/2 single, 1/2 normal.
  const result = run(PAIRING_OUTCOMES_EXAMPLE);

  it('lists every genotype class, most likely first, then by name', () => {
    expect(result.outcomes.map((o) => [o.name, o.fraction])).toEqual([
      ['het amber', '1/4'],
      ['het amber, dusk', '1/4'],
      ['amber', '1/8'],
      ['amber, dusk', '1/8'],
      ['dusk', '1/8'],
      ['normal', '1/8'],
    ]);
    // the row the contract shows
    expect(result.outcomes).toContainEqual({ name: 'amber, dusk', genotype: { amber: 'visual', dusk: 'single' }, probability: 0.125, fraction: '1/8' });
  });

  it('groups by looks and gives the het chance of the normal-looking', () => {
    expect(result.appearances).toEqual([
      { name: 'dusk', looks: { amber: 'normal', dusk: 'single' }, probability: 0.375, fraction: '3/8', hetChance: { amber: 0.6667 }, hetFraction: { amber: '2/3' } },
      { name: 'normal', looks: { amber: 'normal', dusk: 'normal' }, probability: 0.375, fraction: '3/8', hetChance: { amber: 0.6667 }, hetFraction: { amber: '2/3' } },
      { name: 'amber', looks: { amber: 'visual', dusk: 'normal' }, probability: 0.125, fraction: '1/8', hetChance: {}, hetFraction: {} },
      { name: 'amber, dusk', looks: { amber: 'visual', dusk: 'single' }, probability: 0.125, fraction: '1/8', hetChance: {}, hetFraction: {} },
    ]);
  });

  it('a dominant super looks like its single form', () => {
    const r = run({ traits: [{ name: 'dusk', mode: 'dominant' }], sire: { dusk: 'single' }, dam: { dusk: 'single' } });
    expect(r.outcomes.map((o) => [o.name, o.fraction])).toEqual([['dusk', '1/2'], ['normal', '1/4'], ['super dusk', '1/4']]);
    // 3:1, as for any single dominant gene
    expect(r.appearances.map((a) => [a.looks.dusk, a.fraction])).toEqual([['visual', '3/4'], ['normal', '1/4']]);
  });

  it('reports het chance 0 and 1 as well as the in-between', () => {
    const r = run({
      traits: [{ name: 'amber', mode: 'recessive' }, { name: 'ash', mode: 'recessive' }],
      sire: { amber: 'visual' },
      dam: {},
    });
    expect(r.appearances).toHaveLength(1);
    expect(r.appearances[0]!.hetFraction).toEqual({ amber: '1/1', ash: '0/1' });
    expect(r.appearances[0]!.hetChance).toEqual({ amber: 1, ash: 0 });
  });

  it('a 50 % possible het x het gives 1/8 visual and het chance 4/7 among the normal-looking', () => {
    // normal-looking = 7/8, of which het 1/2 (see trait-cross.spec), so 1/2 / 7/8 = 4/7
    const r = run({ traits: [{ name: 'amber', mode: 'recessive' }], sire: { amber: { state: 'possible-het', hetProbability: 0.5 } }, dam: { amber: 'het' } });
    expect(r.appearances.map((a) => [a.name, a.fraction, a.hetFraction])).toEqual([
      ['normal', '7/8', { amber: '4/7' }],
      ['amber', '1/8', {}],
    ]);
    expect(r.appearances[0]!.hetChance.amber).toBe(0.5714);
  });

  it('reads only own keys, so a trait named like an Object member is still absent', () => {
    const r = run({ traits: [{ name: 'constructor', mode: 'recessive' }], sire: {}, dam: {} });
    expect(r.outcomes).toEqual([{ name: 'normal', genotype: { constructor: 'normal' }, probability: 1, fraction: '1/1' }]);
  });

  it(`refuses more than ${MAX_GENOTYPE_CLASSES} genotype classes`, () => {
    const names = ['a1', 'a2', 'a3', 'a4', 'a5', 'a6', 'a7', 'a8', 'a9'];
    const hets = (n: number) => ({
      traits: names.slice(0, n).map((name) => ({ name, mode: 'recessive' })),
      sire: Object.fromEntries(names.slice(0, n).map((name) => [name, 'het'])),
      dam: Object.fromEntries(names.slice(0, n).map((name) => [name, 'het'])),
    });
    expect(run(hets(8)).outcomes).toHaveLength(3 ** 8);
    expect(() => run(hets(9))).toThrow(TooManyOutcomesError);
  });
});

// ---------------------------------------------------------------------------------------------
// Properties

const TRAIT_NAMES = ['amber', 'dusk', 'ash', 'coral', 'fern', 'slate'] as const;

const geneFor = (mode: InheritanceMode): fc.Arbitrary<ParentGene | undefined> => {
  const states = fc.constantFrom<ParentGene>(...STATES_BY_MODE[mode]);
  const options: fc.Arbitrary<ParentGene | undefined>[] = [fc.constant(undefined), states];
  if (mode === 'recessive') {
    options.push(fc.integer({ min: 0, max: 10_000 }).map((n): ParentGene => ({ state: 'possible-het', hetProbability: n / 10_000 })));
  }
  return fc.oneof(...options);
};

const arbitraryPairing = fc
  .uniqueArray(fc.constantFrom(...TRAIT_NAMES), { minLength: 1, maxLength: 5 })
  .chain((names) => fc.tuple(...names.map((name) => fc.constantFrom(...INHERITANCE_MODES).map((mode) => ({ name, mode })))))
  .chain((traits) =>
    fc.record({
      traits: fc.constant(traits),
      sire: fc.tuple(...traits.map((t) => geneFor(t.mode))),
      dam: fc.tuple(...traits.map((t) => geneFor(t.mode))),
    }),
  )
  .map(({ traits, sire, dam }) => {
    const genes = (values: (ParentGene | undefined)[]) =>
      Object.fromEntries(traits.flatMap((t, i) => (values[i] === undefined ? [] : [[t.name, values[i]!]])));
    return PairingOutcomesRequest.parse({ traits, sire: genes(sire), dam: genes(dam) });
  });

/** Marginal distribution of one trait, read back from the joint table. */
const marginal = (result: PairingOutcomesResponse, trait: string) => {
  const byState = new Map<string, Fraction>();
  for (const o of result.outcomes) byState.set(o.genotype[trait]!, add(byState.get(o.genotype[trait]!) ?? ZERO, parseFraction(o.fraction)));
  return Object.fromEntries([...byState].sort(([a], [b]) => a.localeCompare(b)));
};

describe('pairing outcomes, properties', () => {
  it('genotype and appearance probabilities each add up to exactly 1', () => {
    fc.assert(
      fc.property(arbitraryPairing, (request) => {
        const r = pairingOutcomes(request);
        expect(total(r.outcomes)).toEqual(ONE);
        expect(total(r.appearances)).toEqual(ONE);
      }),
    );
  });

  it('swapping sire and dam changes nothing', () => {
    fc.assert(
      fc.property(arbitraryPairing, (request) => {
        expect(pairingOutcomes({ ...request, sire: request.dam, dam: request.sire })).toEqual(pairingOutcomes(request));
      }),
    );
  });

  it('a trait absent from both parents is normal in every class and changes no probability', () => {
    fc.assert(
      fc.property(arbitraryPairing, fc.constantFrom(...INHERITANCE_MODES), (request, mode) => {
        const withGhost = pairingOutcomes({ ...request, traits: [...request.traits, { name: 'ghost', mode }] });
        const without = pairingOutcomes(request);
        expect(withGhost.outcomes.every((o) => o.genotype.ghost === 'normal')).toBe(true);
        expect(withGhost.appearances.every((a) => a.looks.ghost === 'normal')).toBe(true);
        if (mode === 'recessive') expect(withGhost.appearances.every((a) => a.hetFraction.ghost === '0/1')).toBe(true);
        expect(withGhost.outcomes.map((o) => o.fraction)).toEqual(without.outcomes.map((o) => o.fraction));
        expect(withGhost.appearances.map((a) => a.fraction)).toEqual(without.appearances.map((a) => a.fraction));
      }),
    );
  });

  it('each trait in the joint table has the distribution of its own one-trait pairing (independence)', () => {
    fc.assert(
      fc.property(arbitraryPairing, (request) => {
        const joint = pairingOutcomes(request);
        for (const trait of request.traits) {
          const alone = pairingOutcomes({
            traits: [trait],
            sire: Object.hasOwn(request.sire, trait.name) ? { [trait.name]: request.sire[trait.name]! } : {},
            dam: Object.hasOwn(request.dam, trait.name) ? { [trait.name]: request.dam[trait.name]! } : {},
          });
          expect(marginal(joint, trait.name)).toEqual(marginal(alone, trait.name));
        }
      }),
    );
  });

  it('het chances are probabilities, given only for normal-looking recessive traits, and hetChance is hetFraction rounded', () => {
    fc.assert(
      fc.property(arbitraryPairing, (request) => {
        for (const a of pairingOutcomes(request).appearances) {
          const expected = request.traits.filter((t) => t.mode === 'recessive' && a.looks[t.name] === 'normal').map((t) => t.name);
          expect(Object.keys(a.hetFraction).sort()).toEqual([...expected].sort());
          for (const name of expected) {
            const exact = parseFraction(a.hetFraction[name]!);
            expect(exact.num >= 0n && exact.num <= exact.den).toBe(true);
            // hetChance = k / 10^4 within half a unit of the exact value, checked in integers
            const k = BigInt(Math.round(a.hetChance[name]! * 10_000));
            const gap = k * exact.den - 10_000n * exact.num;
            expect(2n * (gap < 0n ? -gap : gap) <= exact.den).toBe(true);
          }
        }
      }),
    );
  });
});
