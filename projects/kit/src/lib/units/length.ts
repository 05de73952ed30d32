import { Pipe, PipeTransform } from '@angular/core';
import { LengthUnit, formatLength as formatSharedLength } from '@tubwright/shared/units';

export type { LengthUnit };

/** A length stored in inches, shown as `34 1/8 in` or `866.8 mm`; a missing value as a dash. */
export function formatLength(valueIn: number | null | undefined, unit: LengthUnit = 'in'): string {
  if (valueIn === null || valueIn === undefined || !Number.isFinite(valueIn)) return '—';
  return formatSharedLength(valueIn, unit);
}

@Pipe({ name: 'length' })
export class LengthPipe implements PipeTransform {
  transform(valueIn: number | null | undefined, unit: LengthUnit = 'in'): string {
    return formatLength(valueIn, unit);
  }
}
