import type { FeedingResult } from '../../../../../shared/api/collection-husbandry.js';
import { addDays, daysBetween } from '../shared/dates.js';

/*
 * Feeding defaults, common practice (from memory): hatchlings every 5 to 7 days, adults every 10 to
 * 14 days, a prey item of about 10 % of body mass. Juveniles sit between (7 to 10 days, our
 * interpolation). The due list uses the long end of each range so that nobody is overfed by default;
 * a keeper who wants another rhythm sets the animal's own interval.
 */

export type FeedingStage = 'hatchling' | 'juvenile' | 'adult';

export const FEEDING_INTERVAL_DAYS: Record<FeedingStage, { min: number; max: number }> = {
  hatchling: { min: 5, max: 7 },
  juvenile: { min: 7, max: 10 },
  adult: { min: 10, max: 14 },
};

/** Stage limits: first six months a hatchling, adult from two years (shop choice). */
const HATCHLING_MAX_DAYS = 182;
const JUVENILE_MAX_DAYS = 730;
/** Without a hatch date, by mass (shop choice, sized for ball pythons). */
const HATCHLING_MAX_G = 200;
const JUVENILE_MAX_G = 900;

export const PREY_FRACTION_OF_BODY_MASS = 0.1;
export const REFUSAL_STREAK_FLAG = 3;
export const WEIGHT_LOSS_FLAG_PCT = 10;
export const WEIGHT_LOSS_LOOKBACK_DAYS = 60;

export function feedingStage(hatchDate: string | null, weightG: number | null, onDate: string): FeedingStage {
  if (hatchDate) {
    const ageDays = daysBetween(hatchDate, onDate);
    return ageDays <= HATCHLING_MAX_DAYS ? 'hatchling' : ageDays <= JUVENILE_MAX_DAYS ? 'juvenile' : 'adult';
  }
  if (weightG !== null) return weightG <= HATCHLING_MAX_G ? 'hatchling' : weightG <= JUVENILE_MAX_G ? 'juvenile' : 'adult';
  return 'adult';
}

export const defaultIntervalDays = (stage: FeedingStage): number => FEEDING_INTERVAL_DAYS[stage].max;

/** About 10 % of body mass, to the gram; null without a weight. */
export const suggestedPreyMassG = (weightG: number | null): number | null =>
  weightG === null || weightG <= 0 ? null : Math.max(1, Math.round(weightG * PREY_FRACTION_OF_BODY_MASS));

/** Refused or regurgitated meals in a row, counting back from the latest feeding. */
export function refusalStreak(resultsNewestFirst: readonly FeedingResult[]): number {
  let streak = 0;
  for (const result of resultsNewestFirst) {
    if (result !== 'refused' && result !== 'regurgitated') break;
    streak++;
  }
  return streak;
}

/**
 * How far the latest weight lies below the highest weight of the lookback window before it, in
 * percent to one decimal; null with fewer than two weights or no loss.
 */
export function weightLossPct(weightsOldestFirst: readonly { occurredAt: string; weightG: number }[]): number | null {
  if (weightsOldestFirst.length < 2) return null;
  const latest = weightsOldestFirst[weightsOldestFirst.length - 1]!;
  const earlier = weightsOldestFirst
    .slice(0, -1)
    .filter((w) => daysBetween(w.occurredAt, latest.occurredAt) <= WEIGHT_LOSS_LOOKBACK_DAYS);
  if (earlier.length === 0) return null;
  const peak = Math.max(...earlier.map((w) => w.weightG));
  if (latest.weightG >= peak) return null;
  return Math.round(((peak - latest.weightG) / peak) * 1000) / 10;
}

export interface DueInput {
  hatchDate: string | null;
  weightG: number | null;
  ownIntervalDays: number | null;
  lastFedAt: string | null;
}

/** When the animal is next due; never fed means due on the day asked. */
export function feedingDue(input: DueInput, onDate: string) {
  const stage = feedingStage(input.hatchDate, input.weightG, onDate);
  const intervalDays = input.ownIntervalDays ?? defaultIntervalDays(stage);
  const dueOn = input.lastFedAt ? addDays(input.lastFedAt.slice(0, 10), intervalDays) : onDate;
  const daysOverdue = daysBetween(dueOn, onDate);
  return { stage, intervalDays, dueOn, daysOverdue, isDue: daysOverdue >= 0 };
}
