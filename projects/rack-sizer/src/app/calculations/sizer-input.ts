import type { RackPlanRequestInput } from '@tubwright/shared/api/rack-plan';
import { type LengthUnit, parseInches } from '@tubwright/shared/units';

export type SizeField = 'length' | 'width' | 'height';
export type CountField = 'levels' | 'columns';
export type SizerField = SizeField | CountField;

/** What the visitor typed, field by field. */
export type SizerText = Record<SizerField, string>;
export type SizerValues = Record<SizerField, number>;

export const EMPTY_TEXT: SizerText = { length: '', width: '', height: '', levels: '', columns: '' };

/** Tubs larger than this are not tubs; the calculator's stock limits give the real answer (422). */
const MAX_SIZE: Record<LengthUnit, number> = { in: 120, mm: 3048 };
/** The public API's layout limits (shared/api/rack-plan.ts). */
export const COUNT_LIMITS: Record<CountField, { min: number; max: number }> = {
  levels: { min: 1, max: 30 },
  columns: { min: 1, max: 12 },
};

type Read = { value: number } | { error: string };

/** `6 1/2`, `6.5` or `6 1/2"` in inches; `165` or `165.1` in millimetres. */
export function readSize(text: string, unit: LengthUnit): Read {
  const trimmed = text.trim();
  if (!trimmed) return { error: 'Enter the size' };
  const value = unit === 'in' ? parseInches(trimmed) : readMillimetres(trimmed);
  if (value === null) return { error: unit === 'in' ? 'Use inches, e.g. 16 1/4 or 16.25' : 'Use millimetres, e.g. 413' };
  if (value <= 0) return { error: 'Must be more than zero' };
  if (value > MAX_SIZE[unit]) return { error: `Must be at most ${MAX_SIZE[unit]} ${unit}` };
  return { value };
}

function readMillimetres(text: string): number | null {
  const m = /^(\d+(?:[.,]\d*)?|[.,]\d+)\s*(?:mm)?$/i.exec(text);
  return m ? Number(m[1]!.replace(',', '.')) : null;
}

export function readCount(text: string, field: CountField): Read {
  const { min, max } = COUNT_LIMITS[field];
  const trimmed = text.trim();
  if (!trimmed) return { error: 'Enter a number' };
  if (!/^\d+$/.test(trimmed)) return { error: 'Use a whole number' };
  const value = Number(trimmed);
  if (value < min || value > max) return { error: `From ${min} to ${max}` };
  return { value };
}

export interface SizerReading {
  /** Every field read; null while any field is empty or wrong. */
  values: SizerValues | null;
  errors: Partial<Record<SizerField, string>>;
}

export function readSizer(text: SizerText, unit: LengthUnit): SizerReading {
  const reads: Record<SizerField, Read> = {
    length: readSize(text.length, unit),
    width: readSize(text.width, unit),
    height: readSize(text.height, unit),
    levels: readCount(text.levels, 'levels'),
    columns: readCount(text.columns, 'columns'),
  };
  const errors: Partial<Record<SizerField, string>> = {};
  const values: Partial<SizerValues> = {};
  for (const [field, read] of Object.entries(reads) as Array<[SizerField, Read]>) {
    if ('error' in read) errors[field] = read.error;
    else values[field] = read.value;
  }
  return { values: Object.keys(errors).length ? null : (values as SizerValues), errors };
}

/**
 * The request for POST /api/v1/calc/rack-plan (and the quote request's `spec`): the visitor's tub and
 * layout, every construction choice left to the calculator's defaults so the shop's rules apply.
 * Nesting is kept short: the visitor waits for it on every change.
 */
export function rackSpec(values: SizerValues, unit: LengthUnit): RackPlanRequestInput {
  return {
    unit,
    tub: { length: values.length, width: values.width, height: values.height },
    layout: { levels: values.levels, columns: values.columns },
    cutting: { include: true, timeLimitMs: 300 },
  };
}

/** A calculator field (`tub.height`, `spec.layout.levels`) to the widget field it concerns. */
export function sizerFieldOf(apiField: string | undefined): SizerField | null {
  const path = (apiField ?? '').replace(/^spec\./, '');
  const map: Record<string, SizerField> = {
    'tub.length': 'length',
    'tub.width': 'width',
    'tub.height': 'height',
    'layout.levels': 'levels',
    'layout.columns': 'columns',
  };
  return map[path] ?? null;
}
