import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import type { AnimalOrigin, AnimalProfile, UpdateProfileRequest } from '../core/collection-types';
import { todayUtc } from '../core/format';
import type { Animal } from './animal';

/*
 * The animal form's rules, as pure functions: validators whose errors carry the sentence to show,
 * and the two requests one save sends (the foundation's animal record, then the collection's
 * profile: origin, parents, feeding interval, for sale).
 */

export const DEFAULT_SPECIES = 'Python regius';

export interface AnimalFormValue {
  code: string;
  name: string;
  species: string;
  morph: string;
  sex: Animal['sex'];
  hatchDate: string;
  status: Animal['status'];
  origin: AnimalOrigin;
  sireId: number | null;
  damId: number | null;
  acquiredFrom: string;
  feedingIntervalDays: string;
  forSale: boolean;
  notes: string;
}

export const EMPTY_ANIMAL: AnimalFormValue = {
  code: '',
  name: '',
  species: DEFAULT_SPECIES,
  morph: '',
  sex: 'unknown',
  hatchDate: '',
  status: 'active',
  origin: 'unknown',
  sireId: null,
  damId: null,
  acquiredFrom: '',
  feedingIntervalDays: '',
  forSale: false,
  notes: '',
};

/** Names the API uses in `error.field` are the form's control names. */
export const ANIMAL_FIELDS = Object.keys(EMPTY_ANIMAL) as (keyof AnimalFormValue)[];

const text = (control: AbstractControl) => String(control.value ?? '').trim();

export function required(message: string): ValidatorFn {
  // Not `required`: the template's `required` attribute (for the asterisk) sets that key to `true`.
  return (control) => (text(control) ? null : { missing: message });
}

export function maxChars(max: number): ValidatorFn {
  return (control) => (text(control).length > max ? { maxChars: `At most ${max} characters` } : null);
}

/** A day that has happened: `YYYY-MM-DD` no later than today (UTC, the day the API checks against). */
export function pastDay(today: () => string = todayUtc): ValidatorFn {
  return (control) => {
    const value = text(control);
    if (!value) return null;
    if (!/^\d{4}-\d{2}-\d{2}$/.test(value) || Number.isNaN(Date.parse(`${value}T00:00:00Z`))) return { date: 'Give a date like 2026-06-14' };
    return value > today() ? { future: 'A hatch date cannot be in the future' } : null;
  };
}

/** Blank (the default for the animal's age) or a whole number of days, 1 to 90. */
export const intervalDays: ValidatorFn = (control) => {
  const value = text(control);
  if (!value) return null;
  const days = Number(value);
  return Number.isInteger(days) && days >= 1 && days <= 90 ? null : { interval: 'Whole days from 1 to 90, or blank for the default' };
};

/** On the form: sold and deceased animals are not offered for sale (the API refuses it too). */
export const saleFitsStatus: ValidatorFn = (group): ValidationErrors | null => {
  const status = group.get('status')?.value as Animal['status'] | undefined;
  const clash = group.get('forSale')?.value === true && (status === 'sold' || status === 'deceased');
  return clash ? { forSale: `A ${status} animal cannot be offered for sale` } : null;
};

/** The first error's sentence, for `<mat-error>`. */
export function errorText(control: AbstractControl | null | undefined): string {
  const errors = control?.errors;
  if (!errors) return '';
  // Our rules carry a sentence; Angular's own validators only `true`.
  const sentence = Object.values(errors).find((e): e is string => typeof e === 'string');
  return sentence ?? 'Check this value';
}

/** POST /animals or PATCH /animals/:id: the foundation's record. */
export function toAnimalRequest(value: AnimalFormValue) {
  return {
    code: value.code.trim(),
    name: value.name.trim(),
    species: value.species.trim(),
    morph: value.morph.trim(),
    sex: value.sex,
    hatchDate: value.hatchDate.trim() || null,
    status: value.status,
    notes: value.notes,
  };
}

/** PATCH /animals/:id/profile: parents only when bred here, a source only when acquired. */
export function toProfileRequest(value: AnimalFormValue): UpdateProfileRequest {
  const interval = value.feedingIntervalDays.trim();
  return {
    origin: value.origin,
    acquiredFrom: value.origin === 'acquired' ? value.acquiredFrom.trim() : '',
    sireId: value.origin === 'bred' ? value.sireId : null,
    damId: value.origin === 'bred' ? value.damId : null,
    feedingIntervalDays: interval ? Number(interval) : null,
    forSale: value.forSale,
  };
}

export function formValueFrom(profile: AnimalProfile): AnimalFormValue {
  const a = profile.animal;
  return {
    code: a.code,
    name: a.name,
    species: a.species,
    morph: a.morph,
    sex: a.sex,
    hatchDate: a.hatchDate ?? '',
    status: a.status,
    origin: profile.origin,
    sireId: profile.sireId,
    damId: profile.damId,
    acquiredFrom: profile.acquiredFrom,
    feedingIntervalDays: profile.feedingIntervalDays === null ? '' : String(profile.feedingIntervalDays),
    forSale: profile.forSale,
    notes: a.notes,
  };
}

/** The API's message without the `field: ` it may start with (the form shows it under the field). */
export function fieldMessage(message: string, field: string): string {
  return message.startsWith(`${field}: `) ? message.slice(field.length + 2) : message;
}
