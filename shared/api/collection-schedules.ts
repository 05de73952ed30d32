import { z } from 'zod';
import { IsoDate, IsoDateTime } from './common.js';

export const FeedingStage = z.enum(['hatchling', 'juvenile', 'adult']);

export const DueQuery = z
  .object({ date: IsoDate.optional().describe('The feeding day; today (UTC) if left out.') })
  .strict();

export const DueAnimal = z
  .object({
    animalId: z.number().int(),
    code: z.string(),
    name: z.string(),
    species: z.string(),
    tubId: z.number().int().nullable(),
    tubLabel: z.string().nullable(),
    stage: FeedingStage.describe('From age (or weight when the hatch date is unknown).'),
    intervalDays: z.number().int().describe('The animal\'s own interval, or the default for its stage.'),
    lastFedAt: IsoDateTime.nullable().describe('Last feeding event of any result.'),
    lastResult: z.string().nullable(),
    dueOn: IsoDate.describe('Last feeding plus the interval; the day asked for when never fed.'),
    daysOverdue: z.number().int(),
    refusalStreak: z.number().int().describe('Refusals and regurgitations in a row, latest first.'),
    refusalFlag: z.boolean().describe('Three or more in a row (shop choice).'),
    weightLossPct: z.number().nullable().describe('Drop of the latest weight below the highest of the 60 days before it, percent.'),
    weightLossFlag: z.boolean().describe('10 % or more (shop choice).'),
    latestWeightG: z.number().nullable(),
    suggestedPreyMassG: z.number().nullable().describe('About 10 % of the latest weight (common practice).'),
  })
  .describe('An animal due to be fed on the day.');
export type DueAnimal = z.infer<typeof DueAnimal>;

export const DueList = z
  .object({
    date: IsoDate,
    total: z.number().int(),
    racks: z.array(z.object({ rackId: z.number().int(), rackName: z.string(), animals: z.array(DueAnimal) })).describe('By rack name, tubs top level first.'),
    unplaced: z.array(DueAnimal).describe('Due animals that are in no tub.'),
  })
  .describe('Who is due to eat, grouped by rack.');

export const DigestRequest = z
  .object({ date: IsoDate.optional().describe('The feeding day; today (UTC) if left out.') })
  .strict()
  .describe('Sends the due list to every active keeper (the owner when there is none).');

export const DigestResponse = z.object({
  date: IsoDate,
  sentTo: z.array(z.string()),
  dueCount: z.number().int(),
  flaggedCount: z.number().int(),
});

