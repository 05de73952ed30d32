import { z } from 'zod';
import { IsoDate, IsoDateTime } from './common.js';

/*
 * Husbandry events: feeding, weight, shed, cleaning, health and notes. Times are when it happened
 * (never in the future); masses in grams.
 */

export const EVENT_KINDS = ['feeding', 'weight', 'shed', 'cleaning', 'health', 'note'] as const;
export type EventKind = (typeof EVENT_KINDS)[number];
export const FEEDING_RESULTS = ['offered', 'accepted', 'refused', 'regurgitated'] as const;
export type FeedingResult = (typeof FEEDING_RESULTS)[number];
export const PREY_SIZES = ['pinky', 'fuzzy', 'hopper', 'weaned', 'small', 'medium', 'large', 'extra-large', 'jumbo'] as const;
export const SHED_QUALITIES = ['complete', 'in-pieces'] as const;

/** Accepts a time with `Z` or an offset; stored as UTC. */
export const PastDateTime = z.iso
  .datetime({ offset: true, error: 'must be a date and time like 2026-12-02T09:30:00Z' })
  .describe('ISO 8601 date and time, e.g. 2026-12-02T09:30:00Z; not in the future.');

const Note = z.string().max(2000).default('').describe('Free text.');
const PreyKind = z.string().trim().min(1, 'is required').max(40).describe('What was offered, e.g. "rat", "mouse".');
const PreySize = z.enum(PREY_SIZES).describe('Size class of the prey item.');
const PreyMassG = z.number().positive('must be more than 0 grams').max(5000).describe('Mass of the prey item, grams.');

export const CreateEventRequest = z
  .discriminatedUnion('kind', [
    z.object({
      kind: z.literal('feeding'),
      occurredAt: PastDateTime,
      preyKind: PreyKind,
      preySize: PreySize.optional(),
      preyMassG: PreyMassG.optional(),
      result: z.enum(FEEDING_RESULTS).describe('offered (left in the tub), accepted, refused or regurgitated.'),
      note: Note,
    }).strict(),
    z.object({
      kind: z.literal('weight'),
      occurredAt: PastDateTime,
      weightG: z.number().positive('must be more than 0 grams').max(200000).describe('Body mass, grams.'),
      note: Note,
    }).strict(),
    z.object({
      kind: z.literal('shed'),
      occurredAt: PastDateTime,
      shed: z.enum(SHED_QUALITIES).describe('complete (one piece) or in-pieces (a stuck or patchy shed).'),
      note: Note,
    }).strict(),
    z.object({ kind: z.literal('cleaning'), occurredAt: PastDateTime, note: Note }).strict(),
    z.object({ kind: z.literal('health'), occurredAt: PastDateTime, note: z.string().trim().min(1, 'is required').max(2000) }).strict(),
    z.object({ kind: z.literal('note'), occurredAt: PastDateTime, note: z.string().trim().min(1, 'is required').max(2000) }).strict(),
  ])
  .describe('One event; the fields depend on `kind`.');
export type CreateEventRequest = z.infer<typeof CreateEventRequest>;
export const CREATE_EVENT_EXAMPLE = { kind: 'feeding', occurredAt: '2026-12-01T18:00:00Z', preyKind: 'rat', preySize: 'small', preyMassG: 45, result: 'accepted', note: '' };

export const HusbandryEvent = z
  .object({
    id: z.number().int(),
    animalId: z.number().int(),
    animalCode: z.string(),
    kind: z.enum(EVENT_KINDS),
    occurredAt: IsoDateTime,
    preyKind: z.string().nullable(),
    preySize: z.enum(PREY_SIZES).nullable(),
    preyMassG: z.number().nullable(),
    result: z.enum(FEEDING_RESULTS).nullable().describe('Feeding result; null for other kinds.'),
    weightG: z.number().nullable().describe('Weight events only.'),
    shed: z.enum(SHED_QUALITIES).nullable(),
    note: z.string(),
    batchId: z.number().int().nullable().describe('The bulk entry this event came from, if any.'),
    createdBy: z.string(),
    createdAt: IsoDateTime,
  })
  .describe('One husbandry event; fields that do not apply to the kind are null.');
export type HusbandryEvent = z.infer<typeof HusbandryEvent>;

export const EventListQuery = z
  .object({
    kinds: z
      .string()
      .regex(new RegExp(`^(${EVENT_KINDS.join('|')})(,(${EVENT_KINDS.join('|')}))*$`), `is a comma-separated list of ${EVENT_KINDS.join(', ')}`)
      .optional()
      .describe('Only these kinds, comma-separated, e.g. feeding,weight.'),
    limit: z.coerce.number().int().min(1).max(200).default(50),
    offset: z.coerce.number().int().min(0).default(0),
    sort: z.enum(['occurredAt', '-occurredAt']).default('-occurredAt').describe('By time; newest first unless `occurredAt`.'),
  })
  .strict();
export const EventPage = z.object({
  items: z.array(HusbandryEvent),
  total: z.number().int(),
  limit: z.number().int(),
  offset: z.number().int(),
});

export const WeightSeries = z
  .object({
    animalId: z.number().int(),
    points: z.array(z.object({ occurredAt: IsoDateTime, weightG: z.number() })).describe('Oldest first, for a growth chart.'),
    latestWeightG: z.number().nullable(),
    suggestedPreyMassG: z.number().nullable().describe('About 10 % of the latest weight (common practice), rounded to the gram.'),
  })
  .describe('Weights of one animal over time.');

export const BulkFeedingRequest = z
  .object({
    occurredAt: PastDateTime,
    preyKind: PreyKind.describe('Prey for every entry that does not name its own.'),
    preySize: PreySize.optional(),
    entries: z
      .array(
        z
          .object({
            tubId: z.number().int().positive().describe('A tub of this rack with an animal in it.'),
            result: z.enum(FEEDING_RESULTS),
            preyKind: PreyKind.optional(),
            preySize: PreySize.optional(),
            preyMassG: PreyMassG.optional(),
            note: z.string().max(2000).optional(),
          })
          .strict(),
      )
      .min(1, 'list at least one tub')
      .max(500)
      .describe('One result per tub; a tub at most once.'),
  })
  .strict()
  .describe('Feeding day for one rack: every result is written together or not at all.');
export const BULK_FEEDING_EXAMPLE = {
  occurredAt: '2026-12-01T19:00:00Z',
  preyKind: 'rat',
  preySize: 'small',
  entries: [
    { tubId: 1, result: 'accepted' },
    { tubId: 2, result: 'refused' },
  ],
};

export const EventBatch = z
  .object({
    id: z.number().int().describe('Use it to undo the whole entry.'),
    rackId: z.number().int(),
    kind: z.enum(EVENT_KINDS),
    occurredAt: IsoDateTime,
    eventCount: z.number().int(),
    undoneAt: IsoDateTime.nullable(),
    events: z.array(HusbandryEvent),
  })
  .describe('A bulk entry and its events.');

export const EventExportQuery = z
  .object({
    from: IsoDate.optional().describe('First day, inclusive.'),
    to: IsoDate.optional().describe('Last day, inclusive.'),
    kind: z.enum(EVENT_KINDS).optional(),
  })
  .strict();
