import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, ValidatorFn, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { AuthSession, ErrorBanner, describeApiError, toApiError } from '@tubwright/kit';
import { pairwise, startWith } from 'rxjs';
import { errorText } from '../plan-editor/plan-form';
import { PlanApi } from '../shared/plan-api';
import { LengthUnit, convertLengthText, lengthText, readLength, readNumber } from '../shared/plan-units';
import { TubModel } from './tub-model';
import { TubModelPhotoPanel } from './tub-model-photo-panel';

type SizeField = 'lengthIn' | 'widthIn' | 'heightIn';
const SIZE_FIELDS: SizeField[] = ['lengthIn', 'widthIn', 'heightIn'];
/** The API's limit on a tub's outside size, inches. */
const MAX_SIZE_IN = 120;

/** A size typed in the entry unit; the API keeps inches. */
function sizeRule(label: string): ValidatorFn {
  return (control: AbstractControl) => {
    const raw = String(control.value ?? '');
    if (!raw.trim()) return { required: `${label} is required` };
    const unit = (control.parent?.get('unit')?.value as LengthUnit | undefined) ?? 'in';
    const value = readLength(raw, unit);
    if (value === null) return { length: unit === 'in' ? 'Type inches like 16 1/4 or 16.25' : 'Type millimetres like 412.75' };
    const inches = unit === 'in' ? value : value / 25.4;
    if (inches <= 0) return { range: `${label} must be greater than zero` };
    if (inches > MAX_SIZE_IN) return { range: `${label} is more than ${MAX_SIZE_IN} in: check the unit` };
    return null;
  };
}

const volumeRule: ValidatorFn = (control) => {
  const raw = String(control.value ?? '');
  if (!raw.trim()) return null;
  const value = readNumber(raw);
  if (value === null || value <= 0 || value > 1000) return { volume: 'A volume from 0 to 1000 quarts, or blank' };
  return null;
};

/** Add or edit a tub model, with how to measure it; retire one that is no longer sold. */
@Component({
  selector: 'tw-tub-model-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatButton, ErrorBanner, TubModelPhotoPanel],
  templateUrl: './tub-model-form.html',
  styleUrl: './tub-model-form.scss',
})
export class TubModelForm {
  readonly tubModelId = input<number | null>(null);
  readonly navigate = input.required<(path: string, options?: { replace?: boolean }) => void>();

  private readonly api = inject(PlanApi);
  private readonly auth = inject(AuthSession);
  private readonly destroyRef = inject(DestroyRef);
  protected readonly canWrite = computed(() => ['owner', 'builder'].includes(this.auth.role() ?? ''));

  protected readonly form = new FormGroup({
    unit: new FormControl<LengthUnit>('in', { nonNullable: true }),
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] }),
    maker: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(120)] }),
    lengthIn: new FormControl('', { nonNullable: true, validators: [sizeRule('Length')] }),
    widthIn: new FormControl('', { nonNullable: true, validators: [sizeRule('Width')] }),
    heightIn: new FormControl('', { nonNullable: true, validators: [sizeRule('Height')] }),
    volumeQt: new FormControl('', { nonNullable: true, validators: [volumeRule] }),
    notes: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(2000)] }),
  });
  protected readonly unit = toSignal(this.form.controls.unit.valueChanges, { initialValue: 'in' as LengthUnit });
  protected readonly model = signal<TubModel | null>(null);
  protected readonly loading = signal(false);
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly confirmRetire = signal(false);
  /** Re-reads errors after each change of the form, so errors set by the API show at once. */
  protected readonly changes = toSignal(this.form.events, { initialValue: null });

  constructor() {
    this.form.controls.unit.valueChanges
      .pipe(startWith(this.form.controls.unit.value), pairwise(), takeUntilDestroyed())
      .subscribe(([from, to]) => {
        for (const field of SIZE_FIELDS) {
          const control = this.form.controls[field];
          control.setValue(convertLengthText(control.value, from, to), { emitEvent: false });
          control.updateValueAndValidity({ emitEvent: false });
        }
      });
    effect(() => {
      const id = this.tubModelId();
      untracked(() => (id ? this.load(id) : this.model.set(null)));
    });
  }

  protected error(field: keyof typeof this.form.controls): string {
    this.changes();
    const control = this.form.controls[field];
    return control.touched || control.dirty ? errorText(control) : '';
  }

  protected save(): void {
    if (this.busy()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const inches = (text: string) => {
      const value = readLength(text, v.unit)!;
      return v.unit === 'in' ? value : value / 25.4;
    };
    const body = {
      name: v.name.trim(),
      maker: v.maker.trim(),
      lengthIn: inches(v.lengthIn),
      widthIn: inches(v.widthIn),
      heightIn: inches(v.heightIn),
      volumeQt: readNumber(v.volumeQt),
      notes: v.notes,
    };
    this.busy.set(true);
    this.failure.set(null);
    this.api
      .saveTubModel(this.model()?.id ?? null, body)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: () => {
          this.busy.set(false);
          this.navigate()('tub-models');
        },
        error: (error: unknown) => {
          this.busy.set(false);
          const apiError = toApiError(error);
          const control = apiError.field ? this.form.get(apiError.field) : null;
          if (control && apiError.field !== 'unit') {
            control.setErrors({ server: apiError.message.replace(`${apiError.field}: `, '') });
            control.markAsTouched();
          }
          this.failure.set(describeApiError(apiError));
        },
      });
  }

  protected retire(): void {
    const model = this.model();
    if (!model || this.busy()) return;
    this.busy.set(true);
    this.failure.set(null);
    this.api
      .retireTubModel(model.id)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: () => {
          this.busy.set(false);
          this.navigate()('tub-models');
        },
        error: (error: unknown) => {
          this.busy.set(false);
          this.confirmRetire.set(false);
          this.failure.set(describeApiError(error));
        },
      });
  }

  protected photoChanged(photoId: number | null): void {
    this.model.update((m) => (m ? { ...m, photoId } : m));
  }

  protected cancel(): void {
    this.navigate()('tub-models');
  }

  private load(id: number): void {
    this.loading.set(true);
    this.api
      .tubModel(id)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (model) => {
          this.loading.set(false);
          this.model.set(model);
          this.form.setValue(
            {
              unit: 'in',
              name: model.name,
              maker: model.maker,
              lengthIn: lengthText(model.lengthIn, 'in'),
              widthIn: lengthText(model.widthIn, 'in'),
              heightIn: lengthText(model.heightIn, 'in'),
              volumeQt: model.volumeQt === null ? '' : String(model.volumeQt),
              notes: model.notes,
            },
            { emitEvent: false },
          );
          this.form.markAsPristine();
        },
        error: (error: unknown) => {
          this.loading.set(false);
          this.failure.set(describeApiError(error));
        },
      });
  }
}
