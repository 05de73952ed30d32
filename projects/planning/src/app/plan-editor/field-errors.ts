import { AbstractControl, FormControl, FormGroup } from '@angular/forms';
import { ApiError } from '@tubwright/kit';

/**
 * The form control an API error names, or null when the form has no such field.
 * Accepts the calculator's paths (`layout.levels`, `sections.levelsPerSection[1]`) and the
 * records service's (`spec.tub.length`); price keys contain dots (`prices.sheet.pvc-rigid`).
 */
export function controlForField(form: FormGroup, field: string | undefined): FormControl | null {
  if (!field) return null;
  const path = field.replace(/^spec\./, '').replace(/\[\d+\]/g, '');
  const found = path.startsWith('prices.') ? form.get(['prices', path.slice('prices.'.length)]) : form.get(path);
  return found instanceof FormControl ? found : null;
}

/**
 * Puts an API error on the field it names (as the `server` error, which the next edit clears).
 * Returns false when no field of the form matches, so the caller shows it in a banner instead.
 */
export function showOnField(form: FormGroup, error: ApiError): boolean {
  const control = controlForField(form, error.field);
  if (!control) return false;
  control.setErrors({ ...control.errors, server: stripFieldPrefix(error.message, error.field) });
  control.markAsTouched();
  return true;
}

/** Removes server errors left from an earlier answer, keeping the control's own validation. */
export function clearServerErrors(control: AbstractControl): void {
  if (control instanceof FormGroup) {
    Object.values(control.controls).forEach((child) => clearServerErrors(child));
    return;
  }
  if (control.errors?.['server']) control.updateValueAndValidity({ emitEvent: false });
}

/** `layout.levels: Too small…` → `Too small…`: the field already says where. */
export function stripFieldPrefix(message: string, field: string | undefined): string {
  if (!field) return message;
  for (const prefix of [`${field}: `, `spec.${field.replace(/^spec\./, '')}: `]) {
    if (message.startsWith(prefix)) return message.slice(prefix.length);
  }
  return message;
}
