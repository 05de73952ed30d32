import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { map, startWith, switchMap } from 'rxjs';
import { errorText } from './plan-form';

let nextId = 0;

/**
 * One number or length of the plan form, with its label, unit, hint and the sentence of its
 * first error (the control's own validation, or what the API said about it).
 */
@Component({
  selector: 'tw-plan-field',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput],
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      @if (kind() === 'count' || kind() === 'number') {
        <input
          matInput
          type="number"
          [id]="id"
          [formControl]="control()"
          [attr.name]="name() || null"
          [attr.min]="min()"
          [attr.max]="max()"
          [attr.step]="kind() === 'count' ? 1 : 'any'"
          inputmode="decimal"
          autocomplete="off"
        />
      } @else {
        <input
          matInput
          type="text"
          [id]="id"
          [formControl]="control()"
          [attr.name]="name() || null"
          [placeholder]="placeholder()"
          [attr.inputmode]="unit() === 'mm' ? 'decimal' : 'text'"
          autocomplete="off"
          spellcheck="false"
        />
      }
      @if (suffix()) {
        <span matTextSuffix class="suffix">{{ suffix() }}</span>
      }
      @if (hint()) {
        <mat-hint>{{ hint() }}</mat-hint>
      }
      <mat-error>{{ error() }}</mat-error>
    </mat-form-field>
  `,
  styles: `
    :host { display: block; }
    mat-form-field { width: 100%; }
    .suffix { color: var(--mat-sys-on-surface-variant); padding-left: 4px; }
  `,
})
export class PlanField {
  readonly control = input.required<FormControl>();
  readonly label = input.required<string>();
  /** length: fractions of an inch or mm as typed text; mass: lb or kg; count: whole number; number: any. */
  readonly kind = input<'length' | 'mass' | 'count' | 'number'>('length');
  readonly unit = input<'in' | 'mm'>('in');
  readonly hint = input('');
  readonly placeholder = input('');
  readonly name = input('');
  readonly min = input<number | null>(null);
  readonly max = input<number | null>(null);
  /** Shown after the value; lengths and masses default to the unit. */
  readonly unitLabel = input<string | null>(null);

  protected readonly id = `tw-plan-field-${nextId++}`;
  protected readonly suffix = computed(() => {
    const given = this.unitLabel();
    if (given !== null) return given;
    if (this.kind() === 'length') return this.unit();
    if (this.kind() === 'mass') return this.unit() === 'in' ? 'lb' : 'kg';
    return '';
  });
  /** Follows the control's events so an error set from outside (the API) shows without a keystroke. */
  protected readonly error = toSignal(
    toObservable(this.control).pipe(switchMap((c) => c.events.pipe(startWith(null), map(() => errorText(c))))),
    { initialValue: '' },
  );
}
