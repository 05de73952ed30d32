import { toInches } from '@tubwright/shared/units';
import type { RackPlanResponse } from '../../core/orders-types';

/** The calculator's default doorway clearance: a standard 6 ft 8 in interior door (from memory). */
export const DEFAULT_DOORWAY_IN = 80;

export interface DoorwayCheck {
  sections: number;
  /** The tallest stacking section, carried through the door on its own. */
  tallestSectionIn: number;
  doorwayIn: number;
  passes: boolean;
  /** Doorway minus section; negative when it does not pass. */
  spareIn: number;
}

/**
 * Does each section of the rack pass the doorway? Sections stack, so the tallest one decides.
 * `doorwayIn` is the customer's doorway; without it the plan's own limit (or 80 in) applies.
 */
export function checkDoorway(result: Pick<RackPlanResponse, 'unit' | 'sections'>, spec: unknown, doorwayIn: number | null = null): DoorwayCheck {
  const heights = result.sections.map((s) => toInches(s.height, result.unit));
  const tallestSectionIn = heights.length ? Math.max(...heights) : 0;
  const clearance = doorwayIn ?? planDoorwayIn(spec) ?? DEFAULT_DOORWAY_IN;
  const spareIn = clearance - tallestSectionIn;
  return { sections: heights.length, tallestSectionIn, doorwayIn: clearance, passes: spareIn >= 0, spareIn };
}

/** `limits.doorwayHeight` of a rack-plan spec, in inches, when the spec sets one. */
export function planDoorwayIn(spec: unknown): number | null {
  if (!spec || typeof spec !== 'object') return null;
  const s = spec as { unit?: unknown; limits?: { doorwayHeight?: unknown } };
  const height = s.limits?.doorwayHeight;
  if (typeof height !== 'number' || !(height > 0)) return null;
  return toInches(height, s.unit === 'mm' ? 'mm' : 'in');
}
