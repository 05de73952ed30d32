import { z } from 'zod';

/*
 * Public contract of POST /api/v1/genetics/pairing-outcomes. Member names are relied on by
 * integrators and the collection screen: add members, never rename them.
 */

export const INHERITANCE_MODES = ['recessive', 'incomplete-dominant', 'dominant'] as const;
export type InheritanceMode = (typeof INHERITANCE_MODES)[number];

/** Genotype states by mode, fewest copies of the gene first (0, 1, 2). */
export const STATES_BY_MODE = {
  recessive: ['normal', 'het', 'visual'],
  'incomplete-dominant': ['normal', 'single', 'super'],
  dominant: ['normal', 'single', 'super'],
} as const satisfies Record<InheritanceMode, readonly [string, string, string]>;
export type GenotypeState = (typeof STATES_BY_MODE)[InheritanceMode][number];
export const GENOTYPE_STATES = ['normal', 'het', 'visual', 'single', 'super'] as const satisfies readonly GenotypeState[];

/** What an animal looks like for one trait: a dominant trait's super form looks like its single form. */
export const LOOKS_BY_MODE = {
  recessive: ['normal', 'visual'],
  'incomplete-dominant': ['normal', 'single', 'super'],
  dominant: ['normal', 'visual'],
} as const satisfies Record<InheritanceMode, readonly string[]>;
export type LooksState = (typeof LOOKS_BY_MODE)[InheritanceMode][number];
export const LOOKS_STATES = ['normal', 'visual', 'single', 'super'] as const satisfies readonly LooksState[];

/** A parent that may or may not carry a recessive trait (e.g. a normal-looking sibling of a visual). */
export const POSSIBLE_HET = 'possible-het';

export const MAX_TRAITS = 12;
/** Het probabilities are read as exact decimals; four places keep the fractions readable. */
const HET_PROBABILITY_DECIMALS = 4;

// ---------------------------------------------------------------------------------------------
// Request

const TraitName = z
  .string()
  .min(1, 'a trait name must not be empty')
  .max(40, 'a trait name has at most 40 characters')
  .regex(
    /^[A-Za-z0-9](?:[A-Za-z0-9 ._-]*[A-Za-z0-9])?$/,
    'a trait name uses letters, digits, spaces, dots, dashes and underscores, and starts and ends with a letter or digit',
  )
  .describe('The shop\'s own trait name, e.g. "amber".');

export const Trait = z
  .object({
    name: TraitName,
    mode: z
      .enum(INHERITANCE_MODES)
      .describe(
        'How the trait is inherited: `recessive` (states normal, het, visual), `incomplete-dominant` (normal, single, super; the super form looks different) or `dominant` (normal, single, super; the super form looks like the single form).',
      ),
  })
  .strict()
  .describe('One trait of the pairing and how it is inherited.');

/** Places after the point in the decimal a number was written as (its shortest round-trip form). */
const decimalPlaces = (value: number): number => {
  const match = /^-?\d+(?:\.(\d+))?(?:e([+-]?\d+))?$/.exec(String(value));
  return match ? Math.max(0, (match[1]?.length ?? 0) - Number(match[2] ?? 0)) : Number.POSITIVE_INFINITY;
};

export const PossibleHet = z
  .object({
    state: z.literal(POSSIBLE_HET),
    hetProbability: z
      .number()
      .min(0, 'hetProbability must be between 0 and 1')
      .max(1, 'hetProbability must be between 0 and 1')
      .refine((p) => decimalPlaces(p) <= HET_PROBABILITY_DECIMALS, `hetProbability has at most ${HET_PROBABILITY_DECIMALS} decimal places`)
      .describe('Chance that this parent is het, 0 to 1 with at most four decimals, e.g. 0.5 or 0.6667 (a normal-looking sibling of a visual from het x het parents is het with chance 2/3).'),
  })
  .strict()
  .describe('For recessive traits only: a normal-looking parent that is het with the given probability.');

export const ParentGene = z
  .union([z.enum(GENOTYPE_STATES), PossibleHet], {
    error: `a gene state is one of ${GENOTYPE_STATES.join(', ')}, or { "state": "possible-het", "hetProbability": 0.5 }`,
  })
  .describe('The parent\'s state for one trait.');
export type ParentGene = z.infer<typeof ParentGene>;

const Parent = (who: string) =>
  z
    .record(TraitName, ParentGene)
    .describe(`The ${who}'s genes by trait name; every key must be a listed trait and a trait left out is normal.`);

export const PairingOutcomesRequest = z
  .object({
    traits: z
      .array(Trait)
      .min(1, 'list at least one trait')
      .max(MAX_TRAITS, `list at most ${MAX_TRAITS} traits`)
      .describe(`The traits to follow, 1 to ${MAX_TRAITS}, with unique names; they are assumed to be on different chromosomes (inherited independently).`),
    sire: Parent('sire (father)'),
    dam: Parent('dam (mother)'),
  })
  .strict()
  .superRefine((request, ctx) => {
    const modeByName = new Map<string, InheritanceMode>();
    const firstIndexByName = new Map<string, number>();
    request.traits.forEach((trait, index) => {
      // case-insensitive, so "Amber" and "amber" cannot be two different traits in one table
      const key = trait.name.toLowerCase();
      const first = firstIndexByName.get(key);
      if (first !== undefined) {
        ctx.addIssue({ code: 'custom', path: ['traits', index, 'name'], message: `trait "${trait.name}" is listed twice (also traits[${first}])` });
        return;
      }
      firstIndexByName.set(key, index);
      modeByName.set(trait.name, trait.mode);
    });
    for (const parent of ['sire', 'dam'] as const) {
      for (const [name, gene] of Object.entries(request[parent])) {
        const mode = modeByName.get(name);
        if (!mode) {
          ctx.addIssue({ code: 'custom', path: [parent, name], message: `"${name}" is not one of the listed traits` });
          continue;
        }
        const allowed: readonly string[] = mode === 'recessive' ? [...STATES_BY_MODE[mode], POSSIBLE_HET] : STATES_BY_MODE[mode];
        const state = typeof gene === 'string' ? gene : gene.state;
        if (!allowed.includes(state)) {
          ctx.addIssue({ code: 'custom', path: [parent, name], message: `"${state}" does not fit the ${mode} trait "${name}"; use ${allowed.join(', ')}` });
        }
      }
    }
  })
  .describe('Two parents and the traits to follow; every offspring class is computed exactly.');
export type PairingOutcomesRequest = z.infer<typeof PairingOutcomesRequest>;

/** Invented trait names; also the example in the API document. */
export const PAIRING_OUTCOMES_EXAMPLE = {
  traits: [
    { name: 'amber', mode: 'recessive' },
    { name: 'dusk', mode: 'incomplete-dominant' },
  ],
  sire: { amber: 'het', dusk: 'single' },
  dam: { amber: 'het' },
} satisfies z.input<typeof PairingOutcomesRequest>;

// ---------------------------------------------------------------------------------------------
// Response

const Probability = z.number().min(0).max(1).describe('Exact probability as a number (for display; `fraction` is exact).');
const FractionText = z
  .string()
  .regex(/^\d+\/\d+$/)
  .describe('The probability exactly, as a reduced "numerator/denominator", e.g. "1/8"; certainty is "1/1".');

export const GenotypeOutcome = z
  .object({
    name: z.string().describe('Keeper-style label in trait order, e.g. "het amber, dusk"; "normal" when nothing is carried.'),
    genotype: z.record(z.string(), z.enum(GENOTYPE_STATES)).describe('State of every listed trait.'),
    probability: Probability,
    fraction: FractionText,
  })
  .describe('One genotype class of the offspring.');
export type GenotypeOutcome = z.infer<typeof GenotypeOutcome>;

export const AppearanceOutcome = z
  .object({
    name: z.string().describe('Label of what the animal shows, e.g. "amber, super dusk"; "normal" when it shows nothing.'),
    looks: z
      .record(z.string(), z.enum(LOOKS_STATES))
      .describe('What every listed trait looks like: recessive normal or visual, incomplete-dominant normal, single or super, dominant normal or visual.'),
    probability: Probability,
    fraction: FractionText,
    hetChance: z
      .record(z.string(), z.number().min(0).max(1))
      .describe('For each recessive trait this class does not show: the chance such an animal is het, rounded to 4 decimals (het x het gives 0.6667).'),
    hetFraction: z.record(z.string(), FractionText).describe('The same chances exactly, e.g. "2/3".'),
  })
  .describe('One class of offspring that look alike.');
export type AppearanceOutcome = z.infer<typeof AppearanceOutcome>;

export const PairingOutcomesResponse = z
  .object({
    outcomes: z.array(GenotypeOutcome).describe('Every genotype class with a chance above zero, most likely first, then by name; the fractions add up to exactly 1.'),
    appearances: z.array(AppearanceOutcome).describe('Every class by what it looks like, most likely first, then by name; the fractions add up to exactly 1.'),
  })
  .describe('Offspring of one pairing, exactly.');
export type PairingOutcomesResponse = z.infer<typeof PairingOutcomesResponse>;
