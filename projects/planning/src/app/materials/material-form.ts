import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, OnInit, afterNextRender, computed, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, describeApiError, toApiError } from '@tubwright/kit';
import { errorText } from '../plan-editor/plan-form';
import { stripFieldPrefix } from '../plan-editor/field-errors';
import { PlanApi } from '../shared/plan-api';
import type { MaterialInput, ShopMaterial } from '../shared/plan-types';
import { lengthText, trimDecimals } from '../shared/plan-units';
import { NumberRule, numberRule, readTyped } from './material-rules';

type NumberField = 'thicknessIn' | 'densityKgM3' | 'modulusMPa' | 'heatedModulusMPa' | 'pricePerSheet' | 'sheetLengthIn' | 'sheetWidthIn';

/** Field rules as PutMaterialRequest has them (shared/api/plans.ts). */
const RULES: Record<NumberField, NumberRule> = {
  thicknessIn: { label: 'Thickness', kind: 'inches', max: 12, unit: 'in' },
  densityKgM3: { label: 'Density', kind: 'number', max: 20_000, unit: 'kg/m³' },
  modulusMPa: { label: 'Modulus', kind: 'number', max: 500_000, unit: 'MPa' },
  heatedModulusMPa: { label: 'Modulus over heat', kind: 'number', max: 500_000, unit: 'MPa', optional: true },
  pricePerSheet: { label: 'Price', kind: 'number', max: 1_000_000, unit: '', zeroAllowed: true },
  sheetLengthIn: { label: 'Length', kind: 'inches', max: 1200, unit: 'in' },
  sheetWidthIn: { label: 'Width', kind: 'inches', max: 240, unit: 'in' },
};
const numberControl = (field: NumberField) => new FormControl('', { nonNullable: true, validators: [numberRule(RULES[field])] });

/** Edits one material in place; the whole material is sent (the API's PUT replaces it). */
@Component({
  selector: 'tw-material-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatButton, ErrorBanner],
  templateUrl: './material-form.html',
  styleUrl: './material-form.scss',
  host: { '(keydown.escape)': 'cancel.emit()' },
})
export class MaterialForm implements OnInit {
  readonly material = input.required<ShopMaterial>();
  readonly saved = output<ShopMaterial>();
  readonly cancel = output<void>();

  private readonly api = inject(PlanApi);
  private readonly destroyRef = inject(DestroyRef);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly form = new FormGroup({
    label: new FormControl('', { nonNullable: true, validators: [(c) => (String(c.value).trim() ? null : { required: 'A name is required' }), Validators.maxLength(120)] }),
    thicknessIn: numberControl('thicknessIn'),
    densityKgM3: numberControl('densityKgM3'),
    modulusMPa: numberControl('modulusMPa'),
    heatedModulusMPa: numberControl('heatedModulusMPa'),
    pricePerSheet: numberControl('pricePerSheet'),
    sheetLengthIn: numberControl('sheetLengthIn'),
    sheetWidthIn: numberControl('sheetWidthIn'),
    source: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(1000)] }),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly board = computed(() => this.material().kind === 'board');
  /** Re-reads errors after each change of the form, so errors set by the API show at once. */
  protected readonly changes = toSignal(this.form.events, { initialValue: null });

  constructor() {
    afterNextRender(() => this.host.nativeElement.querySelector<HTMLInputElement>('input')?.focus());
  }

  ngOnInit(): void {
    const m = this.material();
    this.form.setValue({
      label: m.label,
      thicknessIn: lengthText(m.thicknessIn, 'in'),
      densityKgM3: trimDecimals(m.densityKgM3, 3),
      modulusMPa: trimDecimals(m.modulusMPa, 3),
      heatedModulusMPa: m.heatedModulusMPa === null ? '' : trimDecimals(m.heatedModulusMPa, 3),
      pricePerSheet: trimDecimals(m.pricePerSheet, 2),
      sheetLengthIn: lengthText(m.sheetLengthIn, 'in'),
      sheetWidthIn: lengthText(m.sheetWidthIn, 'in'),
      source: m.source,
    });
  }

  protected error(field: keyof typeof this.form.controls): string {
    this.changes();
    const control = this.form.controls[field];
    if (!(control.touched || control.dirty)) return '';
    return errorText(control);
  }

  protected save(): void {
    if (this.busy()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.host.nativeElement.querySelector<HTMLElement>('input[aria-invalid="true"], textarea[aria-invalid="true"]')?.focus();
      return;
    }
    const v = this.form.getRawValue();
    const read = (field: NumberField) => readTyped(v[field], RULES[field].kind);
    const body: MaterialInput = {
      label: v.label.trim(),
      kind: this.material().kind,
      thicknessIn: read('thicknessIn')!,
      densityKgM3: read('densityKgM3')!,
      modulusMPa: read('modulusMPa')!,
      heatedModulusMPa: read('heatedModulusMPa'),
      source: v.source.trim(),
      pricePerSheet: read('pricePerSheet')!,
      sheetLengthIn: read('sheetLengthIn')!,
      sheetWidthIn: read('sheetWidthIn')!,
    };
    this.busy.set(true);
    this.failure.set(null);
    this.api
      .putMaterial(this.material().key, body)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (material) => {
          this.busy.set(false);
          this.saved.emit(material);
        },
        error: (error: unknown) => {
          this.busy.set(false);
          const apiError = toApiError(error);
          const field = apiError.field as keyof typeof this.form.controls | undefined;
          const control = field && field in this.form.controls ? this.form.controls[field] : null;
          if (control) {
            // `densityKgM3: densityKgM3 must be …` reads better as `Density must be …`.
            const label = (RULES as Partial<Record<string, NumberRule>>)[field!]?.label ?? 'Name';
            control.setErrors({ server: stripFieldPrefix(apiError.message, field).replace(field!, label) });
            control.markAsTouched();
            this.failure.set('The server refused a value: see the marked field.');
          } else {
            this.failure.set(describeApiError(apiError));
          }
        },
      });
  }
}
