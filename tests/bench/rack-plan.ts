import { RackPlanRequest } from '../../shared/api/rack-plan.js';
import { planRack } from '../../services/calculator/src/domain/rack-plan.js';
import { medianMs, round } from './stats.js';

/** 72 tubs: 12 levels x 6 columns of a 20.25 x 13.5 x 5.125 in tub, split into sections by the sheet length. */
export const RACK_72 = RackPlanRequest.parse({
  unit: 'in',
  tub: { length: 20.25, width: 13.5, height: 5.125, loadedMass: 3 },
  layout: { levels: 12, columns: 6, dividers: 1 },
  cutting: { include: false },
});

export function rackPlanInProcess(): { medianMs: number; runs: number } {
  const runs = 2000;
  return { medianMs: round(medianMs(() => planRack(RACK_72), runs, 200), 4), runs };
}
