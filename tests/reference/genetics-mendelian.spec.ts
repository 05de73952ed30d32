import { describe, expect, it } from 'vitest';
import { PairingOutcomesRequest, type PairingOutcomesResponse } from '../../shared/api/genetics.js';
import { pairingOutcomes } from '../../services/calculator/src/domain/genetics/pairing-outcomes.js';

/*
 * Textbook Mendelian ratios, each with its source. Trait names are invented; "visual" is the
 * homozygous recessive phenotype, "normal-looking" the dominant phenotype of the textbooks.
 *   Griffiths = Griffiths et al., Introduction to Genetic Analysis (chapters named, numbering varies by edition).
 *   OpenStax  = OpenStax Biology 2e, chapter 12 "Mendel's Experiments and Heredity".
 */

const run = (input: unknown) => pairingOutcomes(PairingOutcomesRequest.parse(input));

/** Fraction of the genotype class whose states match `genotype` exactly. */
const genotypeFraction = (r: PairingOutcomesResponse, genotype: Record<string, string>) =>
  r.outcomes.find((o) => Object.entries(genotype).every(([t, s]) => o.genotype[t] === s))?.fraction;
const looksRow = (r: PairingOutcomesResponse, looks: Record<string, string>) =>
  r.appearances.find((a) => Object.entries(looks).every(([t, s]) => a.looks[t] === s));

const recessive = [{ name: 'amber', mode: 'recessive' }];

describe('one recessive gene', () => {
  it('het x het: genotypes 1 visual : 2 het : 1 normal', () => {
    const r = run({ traits: recessive, sire: { amber: 'het' }, dam: { amber: 'het' } });
    expect(r.outcomes).toHaveLength(3);
    expect(genotypeFraction(r, { amber: 'visual' })).toBe('1/4'); // OpenStax 12.2 Punnett square of an F1 self-cross, 1:2:1; Griffiths "Single-Gene Inheritance"
    expect(genotypeFraction(r, { amber: 'het' })).toBe('1/2'); // same sources
    expect(genotypeFraction(r, { amber: 'normal' })).toBe('1/4'); // same sources
  });

  it('het x het: 3 normal-looking : 1 visual, and 2/3 of the normal-looking are het', () => {
    const r = run({ traits: recessive, sire: { amber: 'het' }, dam: { amber: 'het' } });
    expect(looksRow(r, { amber: 'normal' })?.fraction).toBe('3/4'); // OpenStax 12.1, Mendel's F2 3:1
    expect(looksRow(r, { amber: 'visual' })?.fraction).toBe('1/4'); // OpenStax 12.1, Mendel's F2 3:1
    // Griffiths "Single-Gene Inheritance": selfed F2 plants of the dominant phenotype, 1/3 bred true and 2/3 segregated
    expect(looksRow(r, { amber: 'normal' })?.hetFraction.amber).toBe('2/3');
    expect(looksRow(r, { amber: 'normal' })?.hetChance.amber).toBe(0.6667);
  });

  it('visual x het (a test cross of a heterozygote): 1 visual : 1 het', () => {
    const r = run({ traits: recessive, sire: { amber: 'visual' }, dam: { amber: 'het' } });
    expect(genotypeFraction(r, { amber: 'visual' })).toBe('1/2'); // OpenStax 12.2 "Test Cross", 1:1; Griffiths "Single-Gene Inheritance"
    expect(genotypeFraction(r, { amber: 'het' })).toBe('1/2'); // same sources
    expect(r.outcomes).toHaveLength(2);
  });

  it('visual x normal: every offspring het', () => {
    const r = run({ traits: recessive, sire: { amber: 'visual' }, dam: {} });
    expect(r.outcomes.map((o) => [o.genotype.amber, o.fraction])).toEqual([['het', '1/1']]); // OpenStax 12.1, the uniform F1 of true-breeding parents
  });
});

describe('one incomplete dominant gene', () => {
  const dusk = [{ name: 'dusk', mode: 'incomplete-dominant' }];

  it('single x single: 1 super : 2 single : 1 normal, each class looking different', () => {
    const r = run({ traits: dusk, sire: { dusk: 'single' }, dam: { dusk: 'single' } });
    expect(looksRow(r, { dusk: 'super' })?.fraction).toBe('1/4'); // OpenStax 12.2 "Incomplete Dominance", snapdragon F2 1 red : 2 pink : 1 white; Griffiths "Gene Interaction"
    expect(looksRow(r, { dusk: 'single' })?.fraction).toBe('1/2'); // same sources
    expect(looksRow(r, { dusk: 'normal' })?.fraction).toBe('1/4'); // same sources
    expect(r.appearances).toHaveLength(3);
  });

  it('super x normal: every offspring single', () => {
    const r = run({ traits: dusk, sire: { dusk: 'super' }, dam: {} });
    expect(r.appearances.map((a) => [a.looks.dusk, a.fraction])).toEqual([['single', '1/1']]); // OpenStax 12.2, red x white snapdragons give all pink F1
  });
});

describe('two independent genes multiply', () => {
  const two = [
    { name: 'amber', mode: 'recessive' },
    { name: 'ash', mode: 'recessive' },
  ];

  it('het/het x het/het: appearances 9 : 3 : 3 : 1', () => {
    const r = run({ traits: two, sire: { amber: 'het', ash: 'het' }, dam: { amber: 'het', ash: 'het' } });
    expect(r.appearances).toHaveLength(4);
    expect(looksRow(r, { amber: 'normal', ash: 'normal' })?.fraction).toBe('9/16'); // OpenStax 12.3 "Law of Independent Assortment", dihybrid 9:3:3:1; Griffiths "Independent Assortment of Genes"
    expect(looksRow(r, { amber: 'visual', ash: 'normal' })?.fraction).toBe('3/16'); // same sources
    expect(looksRow(r, { amber: 'normal', ash: 'visual' })?.fraction).toBe('3/16'); // same sources
    expect(looksRow(r, { amber: 'visual', ash: 'visual' })?.fraction).toBe('1/16'); // same sources
  });

  it('het/het x het/het: genotypes 1:2:1:2:4:2:1:2:1', () => {
    const r = run({ traits: two, sire: { amber: 'het', ash: 'het' }, dam: { amber: 'het', ash: 'het' } });
    expect(r.outcomes).toHaveLength(9);
    // Griffiths "Independent Assortment of Genes": the nine dihybrid genotypes are the products of two 1:2:1 ratios
    expect(genotypeFraction(r, { amber: 'het', ash: 'het' })).toBe('1/4'); // 4/16
    expect(genotypeFraction(r, { amber: 'het', ash: 'normal' })).toBe('1/8'); // 2/16
    expect(genotypeFraction(r, { amber: 'visual', ash: 'het' })).toBe('1/8'); // 2/16
    expect(genotypeFraction(r, { amber: 'visual', ash: 'visual' })).toBe('1/16');
    expect(genotypeFraction(r, { amber: 'normal', ash: 'normal' })).toBe('1/16');
  });

  it('het amber, single dusk x normal: 1/2 carry dusk, and every offspring is a 50 % possible het amber', () => {
    const r = run({
      traits: [
        { name: 'amber', mode: 'recessive' },
        { name: 'dusk', mode: 'incomplete-dominant' },
      ],
      sire: { amber: 'het', dusk: 'single' },
      dam: {},
    });
    // OpenStax 12.1, the product rule: 1/2 (het amber) x 1/2 (dusk) = 1/4 for each of the four combinations
    expect(r.outcomes.map((o) => o.fraction)).toEqual(['1/4', '1/4', '1/4', '1/4']);
    // each gene alone is a 1:1 test cross (OpenStax 12.2 "Test Cross"); dusk is visible, so 1/2 show it
    expect(looksRow(r, { amber: 'normal', dusk: 'single' })?.fraction).toBe('1/2');
    expect(looksRow(r, { amber: 'normal', dusk: 'normal' })?.fraction).toBe('1/2');
    // amber never shows; independent of dusk, each offspring is het with chance 1/2 (Griffiths "Independent Assortment of Genes")
    for (const looks of r.appearances) expect([looks.hetFraction.amber, looks.hetChance.amber]).toEqual(['1/2', 0.5]);
  });
});
