import type {
  AppearanceOutcome,
  GenotypeOutcome,
  PairingOutcomesRequest,
  PairingOutcomesResponse,
} from '../../../../../shared/api/genetics.js';
import { add, compare, divide, formatFraction, multiply, ONE, roundTo, sum, toNumber, ZERO, type Fraction } from './fraction.js';
import { crossTrait, looksOf, type StateChance } from './trait-cross.js';

/** 3^8: eight traits that each split three ways. Beyond this the table is too large to read or send. */
export const MAX_GENOTYPE_CLASSES = 6561;

/** Valid input whose table would be too large (HTTP: 422 naming `traits`). */
export class TooManyOutcomesError extends Error {
  readonly code = 'too_many_outcomes';
  constructor(readonly classes: number) {
    super(
      `This pairing has ${classes} genotype classes; the limit is ${MAX_GENOTYPE_CLASSES}. Follow fewer traits at a time: traits combine independently, so separate tables multiply.`,
    );
    this.name = 'TooManyOutcomesError';
  }
}

type Trait = PairingOutcomesRequest['traits'][number];

interface Combination {
  states: StateChance[];
  probability: Fraction;
}

const HET_DECIMALS = 4;

/**
 * Every offspring class of one pairing, exactly. Traits are assumed unlinked, so the joint
 * distribution is the product of the per-trait distributions (Mendel's independent assortment).
 */
export function pairingOutcomes(request: PairingOutcomesRequest): PairingOutcomesResponse {
  const { traits } = request;
  const perTrait = traits.map((trait) => crossTrait(trait.mode, geneOf(request.sire, trait.name), geneOf(request.dam, trait.name)));
  const classes = perTrait.reduce((n, states) => n * states.length, 1);
  if (classes > MAX_GENOTYPE_CLASSES) throw new TooManyOutcomesError(classes);

  let combinations: Combination[] = [{ states: [], probability: ONE }];
  for (const states of perTrait) {
    combinations = combinations.flatMap((c) =>
      states.map((s) => ({ states: [...c.states, s], probability: multiply(c.probability, s.probability) })),
    );
  }

  const outcomes = combinations.map((c) => ({
    sortKey: c.states.map((s) => s.copies).join(''),
    exact: c.probability,
    outcome: {
      name: genotypeName(traits, c.states),
      genotype: Object.fromEntries(traits.map((t, i) => [t.name, c.states[i]!.state])),
      probability: toNumber(c.probability),
      fraction: formatFraction(c.probability),
    } satisfies GenotypeOutcome,
  }));

  return {
    outcomes: sortByChanceThenName(outcomes, (o) => o.outcome.name).map((o) => o.outcome),
    appearances: appearances(traits, combinations),
  };
}

// Parents arrive as parsed JSON: read only own keys, so a trait called "constructor" is not found on the prototype.
function geneOf<G>(parent: Record<string, G>, name: string): G | undefined {
  return Object.hasOwn(parent, name) ? parent[name] : undefined;
}

function appearances(traits: Trait[], combinations: Combination[]): AppearanceOutcome[] {
  const groups = new Map<string, { looks: ReturnType<typeof looksOf>[]; members: Combination[] }>();
  for (const c of combinations) {
    const looks = traits.map((t, i) => looksOf(t.mode, c.states[i]!.copies));
    const key = looks.join('|');
    const group = groups.get(key) ?? { looks, members: [] };
    group.members.push(c);
    groups.set(key, group);
  }

  const rows = [...groups.entries()].map(([key, { looks, members }]) => {
    const probability = sum(members.map((m) => m.probability));
    const hetChance: Record<string, number> = {};
    const hetFraction: Record<string, string> = {};
    traits.forEach((trait, i) => {
      if (trait.mode !== 'recessive' || looks[i] !== 'normal') return;
      // P(het | looks) = P(het and looks) / P(looks): the keeper's "possible het" percentage
      const het = members.reduce((acc, m) => (m.states[i]!.copies === 1 ? add(acc, m.probability) : acc), ZERO);
      const chance = divide(het, probability);
      hetChance[trait.name] = roundTo(chance, HET_DECIMALS);
      hetFraction[trait.name] = formatFraction(chance);
    });
    return {
      sortKey: key,
      exact: probability,
      outcome: {
        name: looksName(traits, looks),
        looks: Object.fromEntries(traits.map((t, i) => [t.name, looks[i]!])),
        probability: toNumber(probability),
        fraction: formatFraction(probability),
        hetChance,
        hetFraction,
      } satisfies AppearanceOutcome,
    };
  });
  return sortByChanceThenName(rows, (r) => r.outcome.name).map((r) => r.outcome);
}

function genotypeName(traits: Trait[], states: StateChance[]): string {
  const parts = traits.flatMap((t, i) => {
    const s = states[i]!;
    if (s.copies === 0) return [];
    if (s.state === 'het') return [`het ${t.name}`];
    if (s.state === 'super') return [`super ${t.name}`];
    return [t.name]; // visual recessive or single form
  });
  return parts.length ? parts.join(', ') : 'normal';
}

function looksName(traits: Trait[], looks: ReturnType<typeof looksOf>[]): string {
  const parts = traits.flatMap((t, i) => (looks[i] === 'normal' ? [] : looks[i] === 'super' ? [`super ${t.name}`] : [t.name]));
  return parts.length ? parts.join(', ') : 'normal';
}

/** Most likely first, then by name; the copy counts break a tie between equal names (possible only with odd trait names). */
function sortByChanceThenName<T extends { exact: Fraction; sortKey: string }>(rows: T[], name: (row: T) => string): T[] {
  const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
  return [...rows].sort((a, b) => compare(b.exact, a.exact) || byText(name(a), name(b)) || byText(a.sortKey, b.sortKey));
}

