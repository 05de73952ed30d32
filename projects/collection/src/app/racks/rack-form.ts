import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, output, signal } from '@angular/core';
import { rxResource, takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, ValidatorFn } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { AuthSession, ErrorBanner, Page, describeApiError, toApiError } from '@tubwright/kit';
import { errorText, fieldMessage, maxChars, required } from '../animals/animal-form-rules';
import { CollectionApi } from '../core/collection-api';
import type { PlanListItem, RackMap } from '../core/collection-types';

/** The API's limits (shared/api/collection-racks.ts). */
const MAX_LEVELS = 30;
const MAX_COLUMNS = 12;
const RACK_NAME = /^[A-Za-z0-9][A-Za-z0-9 _.-]*$/;

function wholeNumber(label: string, max: number): ValidatorFn {
  return (control) => {
    const n = Number(control.value);
    return Number.isInteger(n) && n >= 1 && n <= max ? null : { range: `${label}: a whole number from 1 to ${max}` };
  };
}
const rackName: ValidatorFn = (control) => {
  const value = String(control.value ?? '').trim();
  return !value || RACK_NAME.test(value) ? null : { pattern: 'Letters, digits, spaces, dots, dashes and underscores, starting with a letter or digit' };
};

/**
 * A new rack: by hand (levels x tubs per level), or, for the owner, from a saved plan, whose
 * levels and columns it takes. Keepers cannot read plans, so they are never asked for them.
 */
@Component({
  selector: 'tw-rack-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatButton, ErrorBanner],
  template: `
    <form [formGroup]="form" (ngSubmit)="create()" aria-labelledby="add-rack-heading" novalidate>
      @if (canUsePlans()) {
        <mat-form-field appearance="outline" subscriptSizing="dynamic" class="plan">
          <mat-label>Built from a saved plan</mat-label>
          <select matNativeControl formControlName="planId">
            <option [ngValue]="null">None: enter the size by hand</option>
            @for (plan of plans(); track plan.id) {
              <option [ngValue]="plan.id">{{ plan.name }} · {{ plan.summary.levels }} × {{ plan.summary.columns }}</option>
            }
          </select>
          <mat-hint>{{ plans().length ? 'its levels and columns fill in' : plansHint() }}</mat-hint>
        </mat-form-field>
      }
      <div class="form-row">
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>Name (used on tub labels)</mat-label>
          <input matInput formControlName="name" maxlength="20" autocomplete="off" required />
          <mat-error>{{ error('name') }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic" class="narrow">
          <mat-label>Levels</mat-label>
          <input matInput type="number" formControlName="levels" min="1" [max]="maxLevels" step="1" [readonly]="fromPlan()" required />
          <mat-error>{{ error('levels') }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic" class="narrow">
          <mat-label>Tubs per level</mat-label>
          <input matInput type="number" formControlName="columns" min="1" [max]="maxColumns" step="1" [readonly]="fromPlan()" required />
          <mat-error>{{ error('columns') }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>Where it stands</mat-label>
          <input matInput formControlName="location" maxlength="80" autocomplete="off" />
          <mat-error>{{ error('location') }}</mat-error>
        </mat-form-field>
        <button mat-flat-button type="submit" [disabled]="saving()">Build {{ tubCount() }} tubs</button>
      </div>
      @if (fromPlan()) {
        <p class="muted">The size comes from the plan; pick “None” to change it.</p>
      }
    </form>
    @if (failure(); as message) {
      <tw-error-banner [message]="message" />
    }
  `,
  styles: `
    :host { display: block; }
    .plan { width: 100%; max-width: 560px; margin-bottom: 12px; }
    .narrow { flex: 0 1 130px !important; }
    p { margin: 8px 0 0; }
  `,
})
export class RackForm {
  readonly created = output<RackMap>();

  private readonly api = inject(CollectionApi);
  private readonly auth = inject(AuthSession);
  private readonly destroyRef = inject(DestroyRef);
  /** GET /plans answers the owner (and builders and sales), never a keeper. */
  protected readonly canUsePlans = computed(() => this.auth.role() === 'owner');

  protected readonly form = new FormGroup({
    planId: new FormControl<number | null>(null),
    name: new FormControl('', { nonNullable: true, validators: [required('A name is required'), maxChars(20), rackName] }),
    levels: new FormControl(5, { nonNullable: true, validators: [wholeNumber('Levels', MAX_LEVELS)] }),
    columns: new FormControl(3, { nonNullable: true, validators: [wholeNumber('Tubs per level', MAX_COLUMNS)] }),
    location: new FormControl('', { nonNullable: true, validators: [maxChars(80)] }),
  });
  protected readonly maxLevels = MAX_LEVELS;
  protected readonly maxColumns = MAX_COLUMNS;
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);
  private readonly changes = toSignal(this.form.events, { initialValue: null });
  private readonly planId = toSignal(this.form.controls.planId.valueChanges, { initialValue: null });
  protected readonly fromPlan = computed(() => this.planId() !== null);
  protected readonly tubCount = computed(() => {
    this.changes();
    const n = Number(this.form.controls.levels.value) * Number(this.form.controls.columns.value);
    return Number.isFinite(n) && n > 0 ? n : 0;
  });

  private readonly plansPage = rxResource({
    params: () => (this.canUsePlans() ? true : undefined),
    stream: () => this.api.get<Page<PlanListItem>>('/plans', { limit: 200, sort: 'name', status: 'active' }),
  });
  protected readonly plans = computed(() => (this.plansPage.hasValue() ? this.plansPage.value().items : []));
  protected readonly plansHint = computed(() => (this.plansPage.error() ? 'the saved plans could not be loaded' : this.plansPage.isLoading() ? 'loading the saved plans…' : 'no saved plans yet'));

  constructor() {
    this.form.controls.planId.valueChanges.pipe(takeUntilDestroyed()).subscribe((id) => {
      const plan = this.plans().find((p) => p.id === id);
      if (!plan) return;
      this.form.patchValue({ levels: plan.summary.levels, columns: plan.summary.columns });
      this.form.controls.levels.markAsTouched();
      this.form.controls.columns.markAsTouched();
    });
  }

  protected error(field: 'name' | 'levels' | 'columns' | 'location'): string {
    this.changes();
    const control = this.form.controls[field];
    return control.touched || control.dirty ? errorText(control) : '';
  }

  protected create(): void {
    if (this.saving()) return;
    if (this.form.invalid) return this.form.markAllAsTouched();
    const v = this.form.getRawValue();
    const body = { name: v.name.trim(), levels: Number(v.levels), columns: Number(v.columns), planId: v.planId, location: v.location.trim() };
    this.saving.set(true);
    this.failure.set(null);
    this.api
      .post<RackMap>('/racks', body)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (rack) => {
          this.saving.set(false);
          this.created.emit(rack);
        },
        error: (error: unknown) => {
          this.saving.set(false);
          const apiError = toApiError(error);
          const field = apiError.field as keyof typeof this.form.controls | undefined;
          if (field && field in this.form.controls) {
            this.form.controls[field].setErrors({ server: fieldMessage(apiError.message, field) });
            this.form.controls[field].markAsTouched();
          }
          this.failure.set(describeApiError(apiError));
        },
      });
  }
}
