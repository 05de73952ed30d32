import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { ErrorStateMatcher } from '@angular/material/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, describeApiError, toApiError } from '@tubwright/kit';
import { Observable, Subject, Subscription, map, merge } from 'rxjs';
import { ChecksPanel } from '../results/checks-panel';
import { CostPanel } from '../results/cost-panel';
import { CuttingPlans } from '../results/cutting-plans';
import { HeatPanel } from '../results/heat-panel';
import { KeyDimensions } from '../results/key-dimensions';
import { PartsList } from '../results/parts-list';
import { RackElevation } from '../results/rack-elevation';
import { SHEET_MATERIALS, materialName } from '../shared/material-names';
import { PlanApi, saveBlob } from '../shared/plan-api';
import type { Plan, PlanVersionListItem, PriceListItem, RackPlanRequest, RackPlanResponse } from '../shared/plan-types';
import { LengthUnit, lengthText, readLength, showLength } from '../shared/plan-units';
import { formatMoney } from '../shared/money';
import { TubModel } from '../tub-models/tub-model';
import { CalcState, calcStream, initialCalcState } from './calc-stream';
import { clearServerErrors, showOnField } from './field-errors';
import { PlanField } from './plan-field';
import { PlanFormValue, convertFormUnit, createPlanForm, fromRackPlanRequest, revalidateAll, toRackPlanRequest } from './plan-form';

/** Errors show as soon as a field is edited or left, not only after a submit: results follow typing. */
class ShowWhenEditedOrTouched implements ErrorStateMatcher {
  isErrorState(control: AbstractControl | null): boolean {
    return !!control && control.invalid && (control.dirty || control.touched);
  }
}

interface CalcRequest {
  spec: RackPlanRequest;
  /** The shop's prices for the keys the spec leaves open (the records service merges them the same way on save). */
  shopPrices: Record<string, number>;
}

type Group = 'tub' | 'layout' | 'allowances' | 'construction' | 'sections' | 'base' | 'heat' | 'limits' | 'prices';

/** Tub sizes differ from a model's when they are more than 1/32 in apart (a unit round trip stays within). */
const SAME_SIZE_IN = 1 / 32;

/**
 * The plan editor: a form for the tub, layout and construction on one side, the calculator's
 * answer on the other, updated as the user types. Opens a saved plan (`planId`) or starts a new
 * one (optionally from a tub model).
 */
@Component({
  selector: 'tw-plan-editor',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatFormFieldModule,
    MatInput,
    MatButton,
    MatIcon,
    MatProgressBar,
    ErrorBanner,
    PlanField,
    KeyDimensions,
    RackElevation,
    PartsList,
    CuttingPlans,
    HeatPanel,
    ChecksPanel,
    CostPanel,
  ],
  providers: [{ provide: ErrorStateMatcher, useClass: ShowWhenEditedOrTouched }],
  templateUrl: './plan-editor.html',
  styleUrl: './plan-editor.scss',
})
export class PlanEditor {
  readonly planId = input<number | null>(null);
  /** Start a new plan from this tub model. */
  readonly tubModelId = input<number | null>(null);
  /** Asks the element to show another sub-path. */
  readonly navigate = input.required<(path: string, options?: { replace?: boolean }) => void>();

  private readonly api = inject(PlanApi);
  private readonly auth = inject(AuthSession);
  private readonly destroyRef = inject(DestroyRef);

  protected readonly form = createPlanForm();
  protected readonly details = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(120)] }),
    notes: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(4000)] }),
  });
  protected readonly canWrite = computed(() => ['owner', 'builder'].includes(this.auth.role() ?? ''));

  protected readonly tubModels = signal<TubModel[]>([]);
  protected readonly sheetMaterials = SHEET_MATERIALS.map((id) => ({ id, label: materialName(id) }));
  protected readonly priceItems = signal<PriceListItem[]>([]);
  private readonly shopPrices = signal<Record<string, number>>({});

  protected readonly plan = signal<Plan | null>(null);
  protected readonly loadError = signal<string | null>(null);
  protected readonly loading = signal(false);
  protected readonly versions = signal<PlanVersionListItem[]>([]);
  /** The spec as loaded (or last saved): members the form does not show are kept from it. */
  private baseSpec: RackPlanRequest | null = null;
  /** The request text right after loading or saving, to tell whether there is anything to save. */
  private readonly baseline = signal<string | null>(null);
  private readonly baselineDetails = signal<string>('');
  protected readonly openGroups = signal<ReadonlySet<Group>>(new Set<Group>(['tub', 'layout']));

  private readonly kick = new Subject<void>();
  private readonly retries = new Subject<void>();
  /** A request per edit, or null while the form is invalid (nothing the API would refuse is sent). */
  private readonly requests: Observable<CalcRequest | null> = merge(this.form.valueChanges, this.kick).pipe(
    map(() => {
      clearServerErrors(this.form);
      return this.form.valid ? { spec: this.currentSpec(), shopPrices: this.shopPrices() } : null;
    }),
  );
  private calcSubscription?: Subscription;
  private readonly initialValue = this.form.getRawValue();
  protected readonly calc = signal<CalcState<CalcRequest, RackPlanResponse>>(initialCalcState());
  /** What the panels draw: the newest calculation, else the saved result of the opened plan. */
  protected readonly shown = computed<{ request: RackPlanRequest; result: RackPlanResponse; live: boolean } | null>(() => {
    const calc = this.calc();
    if (calc.result && calc.resultFor) return { request: calc.resultFor.spec, result: calc.result, live: true };
    const plan = this.plan();
    return plan ? { request: plan.spec, result: plan.result, live: false } : null;
  });
  protected readonly bannerError = signal<string | null>(null);
  protected readonly retryable = signal(false);

  /** Values filled in by code (a loaded plan) without sending a request. */
  private readonly filled = new Subject<void>();
  private readonly formValue = toSignal(merge(this.form.valueChanges, this.kick, this.filled).pipe(map(() => this.form.getRawValue())), {
    initialValue: this.form.getRawValue(),
  });
  protected readonly unit = computed(() => this.formValue().unit);
  protected readonly heatEnabled = computed(() => this.formValue().heat.enabled);
  protected readonly sectionsMode = computed(() => this.formValue().sections.mode);
  protected readonly selectedTubModel = computed(() => this.formValue().tubModelId);
  /** The unit the typed lengths are in, to convert them when the user switches. */
  private lengthUnit: LengthUnit = 'in';
  private readonly detailsValue = toSignal(this.details.valueChanges.pipe(map(() => this.details.getRawValue())), {
    initialValue: this.details.getRawValue(),
  });
  protected readonly specChanged = computed(() => {
    this.formValue();
    const baseline = this.baseline();
    return baseline === null || JSON.stringify(this.currentSpec()) !== baseline;
  });
  protected readonly detailsChanged = computed(() => JSON.stringify(this.detailsValue()) !== this.baselineDetails());
  protected readonly saving = signal(false);
  protected readonly saveStatus = signal<string | null>(null);
  protected readonly saveError = signal<string | null>(null);
  protected readonly downloading = signal<'pdf' | 'csv' | null>(null);

  protected readonly summary = computed(() => {
    const shown = this.shown();
    if (!shown) return '';
    const r = shown.result;
    const sheets = r.cost.sheets.reduce((n, s) => n + s.count, 0);
    return (
      `${shown.request.layout.levels} levels × ${shown.request.layout.columns} columns · ` +
      `${showLength(r.dimensions.overallWidth, r.unit)} wide × ${showLength(r.dimensions.overallHeight, r.unit)} tall · ` +
      `${sheets} ${sheets === 1 ? 'sheet' : 'sheets'} · ${formatMoney(r.cost.total)}`
    );
  });

  constructor() {
    this.wireDependentControls();
    this.loadReferenceData();

    this.destroyRef.onDestroy(() => this.calcSubscription?.unsubscribe());

    effect(() => {
      const id = this.planId();
      const tubModelId = this.tubModelId();
      untracked(() => (id ? this.open(id) : this.startNew(tubModelId)));
    });
  }

  protected isOpen(group: Group): boolean {
    return this.openGroups().has(group);
  }

  protected toggleGroup(group: Group, event: Event): void {
    const open = (event.target as HTMLDetailsElement).open;
    this.openGroups.update((set) => {
      const next = new Set(set);
      if (open) next.add(group);
      else next.delete(group);
      return next;
    });
  }

  protected back(event: MouseEvent): void {
    if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey) return;
    event.preventDefault();
    this.navigate()('plans');
  }

  protected retry(): void {
    this.retries.next();
  }

  protected chooseTubModel(event: Event): void {
    const value = (event.target as HTMLSelectElement).value;
    const id = value ? Number(value) : null;
    this.form.controls.tubModelId.setValue(id);
    const model = this.tubModels().find((m) => m.id === id);
    if (model) this.fillTub(model);
  }

  protected save(asNewPlan = false): void {
    if (this.saving()) return;
    if (this.details.invalid || this.form.invalid) {
      this.details.markAllAsTouched();
      this.form.markAllAsTouched();
      this.saveError.set(this.details.invalid ? 'Give the plan a name before saving.' : 'Fix the marked fields before saving.');
      return;
    }
    const plan = this.plan();
    const { name, notes } = this.details.getRawValue();
    const spec = this.currentSpec();
    const tubModelId = this.form.controls.tubModelId.value;
    this.saving.set(true);
    this.saveError.set(null);
    this.saveStatus.set(null);
    const request =
      plan && !asNewPlan
        ? this.api.update(plan.id, { name: name.trim(), notes, tubModelId, ...(this.specChanged() ? { spec } : {}) })
        : this.api.create({ name: asNewPlan && plan && name.trim() === plan.name ? `${name.trim()} (copy)`.slice(0, 120) : name.trim(), notes, tubModelId, spec });
    request.pipe(takeUntilDestroyed(this.destroyRef)).subscribe({
      next: (saved) => {
        this.saving.set(false);
        const created = !plan || asNewPlan;
        const newVersion = !created && saved.version !== plan.version;
        this.adopt(saved);
        this.saveStatus.set(created ? `Saved “${saved.name}”.` : newVersion ? `Saved version ${saved.version}.` : 'Saved the name and notes.');
        if (created) this.navigate()(`plans/${saved.id}`, { replace: !plan });
        else this.loadVersions(saved.id);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const apiError = toApiError(error);
        if (apiError.field === 'name' || apiError.field === 'notes') {
          this.details.get(apiError.field)?.setErrors({ server: apiError.message });
          this.details.get(apiError.field)?.markAsTouched();
        } else if (showOnField(this.form, apiError)) {
          this.openGroupOf(apiError.field);
        }
        this.saveError.set(describeApiError(apiError));
      },
    });
  }

  protected download(kind: 'pdf' | 'csv'): void {
    const plan = this.plan();
    if (!plan || this.downloading()) return;
    this.downloading.set(kind);
    this.saveError.set(null);
    const path = kind === 'pdf' ? `/plans/${plan.id}/build-sheet.pdf` : `/plans/${plan.id}/cut-list.csv`;
    const slug = plan.name.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-+|-+$/g, '').toLowerCase() || `plan-${plan.id}`;
    this.api
      .file(path)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (blob) => {
          this.downloading.set(null);
          saveBlob(blob, `${slug}-${kind === 'pdf' ? 'build-sheet.pdf' : 'cut-list.csv'}`);
        },
        error: (error: unknown) => {
          this.downloading.set(null);
          this.saveError.set(describeApiError(error));
        },
      });
  }

  /** Puts an earlier version's spec into the form; saving makes it the newest version. */
  protected loadVersion(version: number): void {
    const plan = this.plan();
    if (!plan) return;
    this.api
      .version(plan.id, version)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (v) => {
          this.fillForm(v.spec, this.form.controls.tubModelId.value);
          this.saveStatus.set(`Version ${version} is in the form; save to make it version ${plan.version + 1}.`);
          this.kick.next();
        },
        error: (error: unknown) => this.saveError.set(describeApiError(error)),
      });
  }

  protected versionLine(v: PlanVersionListItem): string {
    const s = v.summary;
    return `${s.levels} × ${s.columns}, ${showLength(s.overallWidth, v.unit)} × ${showLength(s.overallHeight, v.unit)}, ${s.sheets} sheets, ${formatMoney(s.total)}`;
  }

  protected date(iso: string): string {
    return new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
  }

  protected shopPrice(key: string): string {
    const price = this.shopPrices()[key];
    return price === undefined ? 'calculator default' : `shop: ${price}`;
  }

  protected priceControl(key: string): FormControl<number | null> {
    return this.form.controls.prices.controls[key] as FormControl<number | null>;
  }

  // -------------------------------------------------------------------------------------------

  private currentSpec(): RackPlanRequest {
    return toRackPlanRequest(this.form.getRawValue() as PlanFormValue, this.baseSpec);
  }

  /** A new plan or another saved plan: results of the one before must not show. */
  private restartCalc(): void {
    this.calcSubscription?.unsubscribe();
    this.calc.set(initialCalcState());
    this.bannerError.set(null);
    this.calcSubscription = calcStream(
      this.requests,
      (q: CalcRequest) => this.api.calculate({ ...q.spec, prices: { ...q.shopPrices, ...q.spec.prices } }),
      { retries: this.retries },
    ).subscribe((state) => {
      this.calc.set(state);
      this.showCalcError(state);
    });
  }

  private startNew(tubModelId: number | null): void {
    this.restartCalc();
    this.form.reset(this.initialValue, { emitEvent: false });
    this.lengthUnit = this.initialValue.unit;
    this.applyEnabledStates();
    this.filled.next();
    this.saveStatus.set(null);
    this.saveError.set(null);
    this.plan.set(null);
    this.baseSpec = null;
    this.baseline.set(null);
    this.details.reset({ name: '', notes: '' });
    this.baselineDetails.set(JSON.stringify(this.details.getRawValue()));
    this.versions.set([]);
    if (tubModelId) {
      this.api
        .tubModel(tubModelId)
        .pipe(takeUntilDestroyed(this.destroyRef))
        .subscribe({
          next: (model) => {
            this.form.controls.tubModelId.setValue(model.id);
            this.fillTub(model);
            if (!this.details.controls.name.value) this.details.controls.name.setValue(`${model.name}, ${this.form.controls.layout.value.levels} high x ${this.form.controls.layout.value.columns} wide`);
          },
          error: (error: unknown) => this.loadError.set(describeApiError(error)),
        });
    }
  }

  private open(id: number): void {
    if (this.plan()?.id === id) return;
    this.restartCalc();
    this.plan.set(null);
    this.loading.set(true);
    this.loadError.set(null);
    this.api
      .get(id)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (plan) => {
          this.loading.set(false);
          this.adopt(plan);
          this.fillForm(plan.spec, plan.tubModelId);
          this.baseline.set(JSON.stringify(this.currentSpec()));
          // Whatever was computed while loading (an empty form) must not mark the saved result as stale.
          this.restartCalc();
          this.loadVersions(plan.id);
        },
        error: (error: unknown) => {
          this.loading.set(false);
          this.loadError.set(describeApiError(error));
        },
      });
  }

  /** A plan just loaded or saved becomes the baseline for "anything to save?". */
  private adopt(plan: Plan): void {
    this.plan.set(plan);
    this.baseSpec = plan.spec;
    this.details.setValue({ name: plan.name, notes: plan.notes });
    this.details.markAsPristine();
    this.baselineDetails.set(JSON.stringify(this.details.getRawValue()));
    this.baseline.set(JSON.stringify(this.currentSpec()));
  }

  private loadVersions(id: number): void {
    this.api
      .versions(id)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({ next: (page) => this.versions.set(page.items), error: () => this.versions.set([]) });
  }

  private fillForm(spec: RackPlanRequest, tubModelId: number | null): void {
    const value = fromRackPlanRequest(spec, tubModelId);
    const { prices, ...rest } = value;
    this.form.patchValue(rest, { emitEvent: false });
    this.ensurePriceControls(Object.keys(prices));
    const priceGroup = this.form.controls.prices;
    for (const [key, control] of Object.entries(priceGroup.controls)) control.setValue(prices[key] ?? null, { emitEvent: false });
    this.lengthUnit = value.unit;
    this.applyEnabledStates();
    revalidateAll(this.form);
    this.form.markAsPristine();
    this.filled.next();
  }

  private fillTub(model: TubModel): void {
    const unit = this.form.controls.unit.value;
    const toUnit = (valueIn: number) => lengthText(unit === 'in' ? valueIn : valueIn * 25.4, unit);
    this.form.controls.tub.patchValue({ length: toUnit(model.lengthIn), width: toUnit(model.widthIn), height: toUnit(model.heightIn) });
    this.form.controls.tub.markAsDirty();
  }

  private loadReferenceData(): void {
    this.api
      .tubModels()
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({ next: (models) => this.tubModels.set(models), error: () => this.tubModels.set([]) });
    this.api
      .priceList()
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (items) => {
          const used = items.filter((i) => i.usedByCalculator);
          this.priceItems.set(used);
          this.shopPrices.set(Object.fromEntries(used.map((i) => [i.key, i.price])));
          this.ensurePriceControls(used.map((i) => i.key));
          // An opened plan shows its saved result until the user changes something.
          if (!this.plan() || this.calc().resultFor) this.kick.next();
        },
        // Without the shop's prices the calculator uses its own defaults; the plan still computes.
        error: () => this.priceItems.set([]),
      });
  }

  private ensurePriceControls(keys: string[]): void {
    const group = this.form.controls.prices;
    for (const key of keys) {
      if (!group.contains(key)) {
        group.addControl(key, new FormControl<number | null>(null, { validators: [Validators.min(0), Validators.max(1_000_000)] }), { emitEvent: false });
      }
    }
  }

  /** Validators that read a sibling re-run when the sibling changes; the unit switch converts every length. */
  private wireDependentControls(): void {
    const f = this.form.controls;
    const rerun = (source: AbstractControl, target: AbstractControl) =>
      source.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => target.updateValueAndValidity({ emitEvent: false }));
    rerun(f.layout.controls.columns, f.layout.controls.dividers);
    rerun(f.base.controls.casterCount, f.base.controls.lockingCasters);
    rerun(f.layout.controls.levels, f.sections.controls.levelsPerSection);

    f.unit.valueChanges.pipe(takeUntilDestroyed()).subscribe((to) => {
      convertFormUnit(this.form, this.lengthUnit, to);
      this.lengthUnit = to;
      revalidateAll(this.form);
    });
    f.heat.controls.enabled.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.applyEnabledStates());
    f.sections.controls.mode.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.applyEnabledStates());

    // Typed sizes that no longer match the chosen model make the tub a typed one.
    f.tub.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => {
      const model = this.tubModels().find((m) => m.id === f.tubModelId.value);
      if (!model) return;
      const unit = f.unit.value;
      const t = f.tub.getRawValue();
      const same = (text: string, valueIn: number) => {
        const v = readLength(text, unit);
        return v !== null && Math.abs((unit === 'in' ? v : v / 25.4) - valueIn) <= SAME_SIZE_IN;
      };
      if (!(same(t.length, model.lengthIn) && same(t.width, model.widthIn) && same(t.height, model.heightIn))) {
        f.tubModelId.setValue(null);
      }
    });
  }

  private applyEnabledStates(): void {
    const f = this.form.controls;
    const heatOn = f.heat.controls.enabled.value;
    for (const name of ['wattsPerFoot', 'endMargin', 'supplyVoltage', 'thermostatRatingW'] as const) {
      const control = f.heat.controls[name];
      if (heatOn) control.enable({ emitEvent: false });
      else control.disable({ emitEvent: false });
    }
    const listed = f.sections.controls.mode.value === 'listed';
    if (listed) {
      f.sections.controls.levelsPerSection.enable({ emitEvent: false });
      f.sections.controls.maxSidePanelLength.disable({ emitEvent: false });
    } else {
      f.sections.controls.levelsPerSection.disable({ emitEvent: false });
      f.sections.controls.maxSidePanelLength.enable({ emitEvent: false });
    }
  }

  private showCalcError(state: CalcState<CalcRequest, RackPlanResponse>): void {
    if (!state.error) {
      this.bannerError.set(null);
      this.retryable.set(false);
      return;
    }
    const error = state.error;
    const onField = (error.status === 400 || error.status === 422) && showOnField(this.form, error);
    if (onField) this.openGroupOf(error.field);
    const prefix = error.status === 400 || error.status === 422 ? 'The calculator cannot work with this' : 'The calculator did not answer';
    this.bannerError.set(`${prefix}: ${describeApiError(error)}`);
    this.retryable.set(!(error.status === 400 || error.status === 422));
  }

  private openGroupOf(field: string | undefined): void {
    const group = field?.replace(/^spec\./, '').split(/[.[]/)[0] as Group | undefined;
    if (group) this.openGroups.update((set) => new Set(set).add(group));
  }
}
