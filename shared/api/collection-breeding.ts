import { z } from 'zod';
import { IsoDate, IsoDateTime, listQuery, page } from './common.js';
import { INHERITANCE_MODES, LOOKS_STATES, PairingOutcomesResponse } from './genetics.js';

/*
 * The shop's trait list, animal genes, pairings, clutches and hatchlings. Dates are days (no time);
 * temperatures in °F and humidity in percent as the field names say.
 */

const TraitName = z
  .string()
  .trim()
  .min(1, 'is required')
  .max(40)
  .regex(/^[A-Za-z0-9](?:[A-Za-z0-9 ._-]*[A-Za-z0-9])?$/, 'uses letters, digits, spaces, dots, dashes and underscores');

export const Trait = z.object({
  id: z.number().int(),
  name: z.string(),
  mode: z.enum(INHERITANCE_MODES),
  notes: z.string(),
  createdAt: IsoDateTime,
});
export const TraitPage = page(Trait);
export const TraitListQuery = listQuery(['name', 'mode']).extend({ mode: z.enum(INHERITANCE_MODES).optional() });
export const CreateTraitRequest = z
  .object({ name: TraitName, mode: z.enum(INHERITANCE_MODES), notes: z.string().max(2000).default('') })
  .strict()
  .describe('A trait of the shop\'s list; names are unique (ignoring case).');
export const UpdateTraitRequest = z
  .object({ name: TraitName.optional(), mode: z.enum(INHERITANCE_MODES).optional(), notes: z.string().max(2000).optional() })
  .strict()
  .describe('Rename a trait (animals keep it: genes point at the trait, not its name), or change its mode or notes. A mode whose states do not fit the genes animals carry is refused (409): between incomplete-dominant and dominant always fits, to or from recessive only while no animal carries the trait.');

export const GENE_STATES = ['het', 'visual', 'single', 'super', 'possible-het'] as const;
export const AnimalGene = z.object({
  traitId: z.number().int(),
  trait: z.string(),
  mode: z.enum(INHERITANCE_MODES),
  state: z.enum(GENE_STATES),
  hetProbability: z.number().nullable().describe('For possible-het: the chance of being het, 0 to 1.'),
});
export const AnimalGenes = z.object({ animalId: z.number().int(), genes: z.array(AnimalGene) });
export const SetGenesRequest = z
  .object({
    genes: z
      .array(
        z
          .object({
            traitId: z.number().int().positive(),
            state: z.enum(GENE_STATES).describe('het/visual for recessive traits (possible-het with hetProbability), single/super for the others.'),
            hetProbability: z.number().gt(0).lt(1).optional().describe('Only with possible-het.'),
          })
          .strict(),
      )
      .max(30),
  })
  .strict()
  .describe('Replaces the animal\'s genes; a trait left out is normal.');

export const PAIRING_STATUSES = ['planned', 'introduced', 'locked', 'ovulated', 'pre-lay-shed', 'laid', 'failed', 'closed'] as const;
export const OBSERVATION_KINDS = ['introduced', 'lock', 'separated'] as const;

export const LayingWindow = z
  .object({
    from: IsoDate,
    to: IsoDate,
    basis: z.enum(['pre-lay-shed', 'ovulation']),
  })
  .nullable()
  .describe('Expected laying days (common practice, from memory): 27 to 33 days after the pre-lay shed, otherwise 44 to 54 days after ovulation.');

export const PairingObservation = z.object({
  id: z.number().int(),
  kind: z.enum(OBSERVATION_KINDS),
  observedOn: IsoDate,
  notes: z.string(),
});

const AnimalRef = z.object({ id: z.number().int(), code: z.string(), name: z.string() });

export const Pairing = z.object({
  id: z.number().int(),
  sire: AnimalRef,
  dam: AnimalRef,
  season: z.string().describe('e.g. "2026-27".'),
  status: z.enum(PAIRING_STATUSES),
  ovulationDate: IsoDate.nullable(),
  preLayShedDate: IsoDate.nullable(),
  layingWindow: LayingWindow,
  observations: z.array(PairingObservation),
  notes: z.string(),
  createdAt: IsoDateTime,
});
export const PairingPage = page(Pairing);
export const PairingListQuery = listQuery(['season', 'status', 'createdAt']).extend({
  season: z.string().max(20).optional(),
  status: z.enum(PAIRING_STATUSES).optional(),
});

const Season = z.string().trim().min(1, 'is required').max(20).describe('The breeding season, e.g. "2026-27".');
export const CreatePairingRequest = z
  .object({
    sireId: z.number().int().positive().describe('A male of the collection.'),
    damId: z.number().int().positive().describe('A female of the collection.'),
    season: Season,
    status: z.enum(PAIRING_STATUSES).default('planned'),
    ovulationDate: IsoDate.nullable().default(null),
    preLayShedDate: IsoDate.nullable().default(null),
    notes: z.string().max(4000).default(''),
  })
  .strict();
export const CREATE_PAIRING_EXAMPLE = { sireId: 1, damId: 2, season: '2026-27', notes: '' };
export const UpdatePairingRequest = z
  .object({
    season: Season.optional(),
    status: z.enum(PAIRING_STATUSES).optional(),
    ovulationDate: IsoDate.nullable().optional(),
    preLayShedDate: IsoDate.nullable().optional(),
    notes: z.string().max(4000).optional(),
  })
  .strict();
export const CreateObservationRequest = z
  .object({ kind: z.enum(OBSERVATION_KINDS), observedOn: IsoDate.describe('Not in the future.'), notes: z.string().max(2000).default('') })
  .strict()
  .describe('An introduction, a lock or a separation seen on a day.');

export const PairingOutcomesView = z
  .object({ pairingId: z.number().int(), outcomes: PairingOutcomesResponse })
  .describe('The genetics outcome tables for the pair\'s recorded genes.');

export const Clutch = z.object({
  id: z.number().int(),
  pairingId: z.number().int(),
  laidOn: IsoDate,
  fertileEggs: z.number().int(),
  slugs: z.number().int(),
  incubationTempF: z.number().nullable(),
  humidityPct: z.number().nullable(),
  expectedHatchFrom: IsoDate.describe('Laid on + 55 days (common practice at 88 to 90 °F).'),
  expectedHatchTo: IsoDate.describe('Laid on + 60 days.'),
  incubationWarning: z.string().nullable().describe('Set when the incubation temperature is outside 88 to 90 °F: the estimate is less reliable.'),
  hatchedOn: IsoDate.nullable(),
  hatchlingCount: z.number().int().nullable(),
  notes: z.string(),
  createdAt: IsoDateTime,
});
export const ClutchPage = page(Clutch);
export const ClutchListQuery = listQuery(['laidOn', 'expectedHatchFrom', 'createdAt']).extend({
  pairingId: z.coerce.number().int().positive().optional(),
});
export const CreateClutchRequest = z
  .object({
    pairingId: z.number().int().positive(),
    laidOn: IsoDate.describe('Not in the future.'),
    fertileEggs: z.number().int().min(0).max(100),
    slugs: z.number().int().min(0).max(100).default(0),
    incubationTempF: z.number().min(60).max(110).nullable().default(null),
    humidityPct: z.number().min(0).max(100).nullable().default(null),
    notes: z.string().max(4000).default(''),
  })
  .strict();
export const CREATE_CLUTCH_EXAMPLE = { pairingId: 1, laidOn: '2026-11-20', fertileEggs: 6, slugs: 1, incubationTempF: 89, humidityPct: 95 };
export const UpdateClutchRequest = z
  .object({
    fertileEggs: z.number().int().min(0).max(100).optional(),
    slugs: z.number().int().min(0).max(100).optional(),
    incubationTempF: z.number().min(60).max(110).nullable().optional(),
    humidityPct: z.number().min(0).max(100).nullable().optional(),
    notes: z.string().max(4000).optional(),
  })
  .strict();

export const HatchRequest = z
  .object({
    hatchedOn: IsoDate.describe('Not in the future, not before the lay date.'),
    hatchlings: z
      .array(
        z
          .object({
            code: z.string().trim().min(1, 'is required').max(40),
            name: z.string().trim().max(80).default(''),
            sex: z.enum(['male', 'female', 'unknown']).default('unknown'),
            looks: z
              .record(z.string(), z.enum(LOOKS_STATES))
              .default({})
              .describe('What the hatchling shows per trait of its parents (visual, single, super); traits left out look normal.'),
          })
          .strict(),
      )
      .min(1, 'list at least one hatchling')
      .max(100),
  })
  .strict()
  .describe('Records the hatch: every hatchling becomes an animal with its parents and the genes it has or may carry.');
export const HATCH_EXAMPLE = { hatchedOn: '2027-01-16', hatchlings: [{ code: 'PR-101', sex: 'female', looks: { amber: 'visual' } }, { code: 'PR-102', looks: {} }] };

export const HatchResponse = z.object({
  clutch: Clutch,
  hatchlings: z.array(z.object({ id: z.number().int(), code: z.string(), genes: z.array(AnimalGene) })),
});
