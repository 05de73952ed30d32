import { addDays } from '../shared/dates.js';

/*
 * Incubation, common practice: eggs kept at 88 to 90 °F hatch about 55 to 60 days after laying.
 * Laying window, common practice (from memory): a female lays about 30 days after her pre-lay
 * shed (we give 27 to 33), or roughly 44 to 54 days after ovulation when the shed was not seen.
 */
export const HATCH_DAYS = { from: 55, to: 60 };
export const INCUBATION_RANGE_F = { min: 88, max: 90 };
export const LAY_AFTER_PRE_LAY_SHED_DAYS = { from: 27, to: 33 };
export const LAY_AFTER_OVULATION_DAYS = { from: 44, to: 54 };

export function expectedHatch(laidOn: string, incubationTempF: number | null) {
  const outside = incubationTempF !== null && (incubationTempF < INCUBATION_RANGE_F.min || incubationTempF > INCUBATION_RANGE_F.max);
  return {
    from: addDays(laidOn, HATCH_DAYS.from),
    to: addDays(laidOn, HATCH_DAYS.to),
    warning: outside
      ? `Incubation at ${incubationTempF} °F is outside ${INCUBATION_RANGE_F.min} to ${INCUBATION_RANGE_F.max} °F: the 55 to 60 day estimate is less reliable (cooler eggs take longer).`
      : null,
  };
}

export function layingWindow(preLayShedDate: string | null, ovulationDate: string | null) {
  if (preLayShedDate) return { from: addDays(preLayShedDate, LAY_AFTER_PRE_LAY_SHED_DAYS.from), to: addDays(preLayShedDate, LAY_AFTER_PRE_LAY_SHED_DAYS.to), basis: 'pre-lay-shed' as const };
  if (ovulationDate) return { from: addDays(ovulationDate, LAY_AFTER_OVULATION_DAYS.from), to: addDays(ovulationDate, LAY_AFTER_OVULATION_DAYS.to), basis: 'ovulation' as const };
  return null;
}
