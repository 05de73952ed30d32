import { Signal, computed, signal } from '@angular/core';
import { toApiError } from '@tubwright/kit';

/*
 * Small signal forms: each field's problem is a computed sentence, shown once the person has
 * tried to save, plus what the server said about a field. Lighter than @angular/forms for the
 * few plain forms of this module (the element carries its own copy of every library it uses).
 */

export type Checks<F extends string> = Record<F, Signal<string | null>>;

export class FieldCheck<F extends string> {
  /** Set by the first save attempt: problems show from then on. */
  readonly tried = signal(false);
  private readonly server = signal<Partial<Record<F, string>>>({});

  constructor(private readonly checks: Checks<F>) {}

  /** What to show under a field, or null. */
  problem(field: F): string | null {
    const own = this.tried() ? this.checks[field]() : null;
    return own ?? this.server()[field] ?? null;
  }

  /** True when the form may be sent; marks the attempt either way. */
  ready(): boolean {
    this.tried.set(true);
    this.server.set({});
    return (Object.keys(this.checks) as F[]).every((f) => this.checks[f]() === null);
  }

  /** Puts a server error on the field it names; false when it names none of ours. */
  placeServerError(error: unknown, rename: Partial<Record<string, F>> = {}): boolean {
    const apiError = toApiError(error);
    const field = (apiError.field && (rename[apiError.field] ?? apiError.field)) as F | undefined;
    if (!field || !(field in this.checks)) return false;
    this.server.update((s) => ({ ...s, [field]: apiError.message }));
    return true;
  }

  /** Typing in a field clears what the server said about it. */
  edited(field: F): void {
    if (this.server()[field]) this.server.update((s) => ({ ...s, [field]: undefined }));
  }
}

export const required = (value: Signal<string>, message: string) => computed(() => (value().trim() ? null : message));

export function percentProblem(text: string): string | null {
  if (!/^\d{1,3}(\.\d{1,2})?$/.test(text.trim()) || Number(text) > 100) return 'Enter a percentage from 0 to 100, at most two decimals';
  return null;
}

export function wholeProblem(text: string, min: number, max: number, unit: string): string | null {
  const n = Number(text);
  return /^\d+$/.test(text.trim()) && n >= min && n <= max ? null : `Enter whole ${unit} from ${min} to ${max}`;
}

/** A loose check; the server has the last word on e-mail addresses. */
export const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;
