import {
  LOOKS_BY_MODE,
  STATES_BY_MODE,
  type GenotypeState,
  type InheritanceMode,
  type LooksState,
  type ParentGene,
} from '../../../../../shared/api/genetics.js';
import { add, fraction, fromDecimal, multiply, ONE, subtract, isZero, ZERO, type Fraction } from './fraction.js';

/** Copies of the gene at one locus: every mode is the same two-allele locus, only the names differ. */
export type Copies = 0 | 1 | 2;

export interface StateChance {
  state: GenotypeState;
  copies: Copies;
  probability: Fraction;
}

const HALF = fraction(1, 2);

const COPIES_BY_STATE: Record<GenotypeState, Copies> = { normal: 0, het: 1, single: 1, visual: 2, super: 2 };

/**
 * Chance that one gamete of this parent carries the gene (Mendel's law of segregation: each gamete
 * gets one of the two copies, each with chance 1/2). A possible het is het with chance p, so it
 * passes the gene with chance p x 1/2; for a single offspring that mixture is exact.
 */
export function gameteChance(gene: ParentGene | undefined): Fraction {
  if (gene === undefined) return ZERO;
  if (typeof gene === 'object') return multiply(fromDecimal(gene.hetProbability), HALF);
  return multiply(fraction(COPIES_BY_STATE[gene]), HALF);
}

/** Offspring distribution for one trait: one gamete from each parent, drawn independently. States with chance 0 are left out. */
export function crossTrait(mode: InheritanceMode, sire: ParentGene | undefined, dam: ParentGene | undefined): StateChance[] {
  const fromSire = gameteChance(sire);
  const fromDam = gameteChance(dam);
  const noneFromSire = subtract(ONE, fromSire);
  const noneFromDam = subtract(ONE, fromDam);
  const byCopies: [Fraction, Fraction, Fraction] = [
    multiply(noneFromSire, noneFromDam),
    add(multiply(fromSire, noneFromDam), multiply(noneFromSire, fromDam)),
    multiply(fromSire, fromDam),
  ];
  const states = STATES_BY_MODE[mode];
  return ([0, 1, 2] as const)
    .filter((copies) => !isZero(byCopies[copies]))
    .map((copies) => ({ state: states[copies], copies, probability: byCopies[copies] }));
}

/** What the trait looks like: a recessive shows only with two copies; a dominant shows the same with one or two. */
export function looksOf(mode: InheritanceMode, copies: Copies): LooksState {
  switch (mode) {
    case 'recessive':
      return copies === 2 ? 'visual' : 'normal';
    case 'incomplete-dominant':
      return LOOKS_BY_MODE[mode][copies];
    case 'dominant':
      return copies === 0 ? 'normal' : 'visual';
  }
}
