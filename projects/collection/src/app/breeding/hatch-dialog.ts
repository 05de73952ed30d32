import { ChangeDetectionStrategy, Component, DestroyRef, Injector, ViewEncapsulation, computed, effect, inject, signal, untracked } from '@angular/core';
import { rxResource, takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { KeyValuePipe } from '@angular/common';
import { AbstractControl, FormArray, FormControl, FormGroup, ReactiveFormsModule, ValidatorFn } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { ApiError, ErrorBanner, MODULE_BASE_PATH, Page, describeApiError, toApiError } from '@tubwright/kit';
import { Observable, catchError, of, throwError } from 'rxjs';
import { errorText, fieldMessage, maxChars, pastDay, required } from '../animals/animal-form-rules';
import { geneLabel } from '../animals/gene-text';
import { SEX_OPTIONS } from '../animals/animal';
import { CollectionApi } from '../core/collection-api';
import type { Clutch, HatchResponse, LooksState, PairingOutcomesView, Trait } from '../core/collection-types';
import { formatDay, formatPercent, todayUtc } from '../core/format';
import { LOOKS_BY_MODE, LOOKS_LABELS, TracedTrait, expectedGenes, hatchlingCode, hatchlingField, looksToSend, tracedTraits } from './hatch-rows';

export interface HatchDialogData {
  clutch: Clutch;
  /** e.g. "PR-001 × PR-002". */
  pairingLabel: string;
}

/** What the dialog closes with: the hatch if it was recorded, and a page to open if a link was followed. */
export interface HatchDialogResult {
  hatch: HatchResponse | null;
  open?: string;
}

type Sex = (typeof SEX_OPTIONS)[number][0];
type HatchlingForm = FormGroup<{ code: FormControl<string>; name: FormControl<string>; sex: FormControl<Sex>; looks: FormGroup<Record<string, FormControl<LooksState>>> }>;

const notBefore = (day: string): ValidatorFn => (control: AbstractControl) =>
  control.value && String(control.value) < day ? { early: `The clutch was laid on ${formatDay(day)}` } : null;

/**
 * Records a clutch's hatch: the day, and one row per hatchling (code, name, sex, what it shows).
 * The parents' outcome table says what each hatchling may carry; the service stores exactly that.
 */
@Component({
  selector: 'tw-hatch-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  // Off, to size Material's form-field insides in the row table; every rule is scoped to the tag.
  encapsulation: ViewEncapsulation.None,
  imports: [ReactiveFormsModule, KeyValuePipe, MatDialogModule, MatFormFieldModule, MatInput, MatButton, ErrorBanner],
  templateUrl: './hatch-dialog.html',
  styleUrl: './hatch-dialog.scss',
})
export class HatchDialog {
  protected readonly data = inject<HatchDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject<MatDialogRef<HatchDialog, HatchDialogResult>>(MatDialogRef);
  private readonly api = inject(CollectionApi);
  private readonly destroyRef = inject(DestroyRef);
  private readonly base = inject(MODULE_BASE_PATH);

  protected readonly clutch = this.data.clutch;
  protected readonly today = todayUtc();
  protected readonly sexOptions = SEX_OPTIONS;
  protected readonly looksLabels = LOOKS_LABELS;
  protected readonly formatDay = formatDay;
  protected readonly formatPercent = formatPercent;
  protected readonly geneLabel = geneLabel;

  /** 422 means the parents carry no recorded gene: every hatchling is plain normal. */
  protected readonly outcomes = rxResource({
    stream: () =>
      this.api.get<PairingOutcomesView>(`/pairings/${this.clutch.pairingId}/outcomes`).pipe(
        catchError((error: unknown) => (error instanceof ApiError && error.status === 422 ? of(null) : throwError(() => error))),
      ),
  });
  private readonly traitList = rxResource({ stream: () => this.api.get<Page<Trait>>('/traits', { limit: 200, sort: 'name' }) });
  protected readonly table = computed(() => (this.outcomes.hasValue() ? (this.outcomes.value()?.outcomes ?? null) : null));
  protected readonly traits = computed<TracedTrait[]>(() => tracedTraits(this.table(), this.traitList.hasValue() ? this.traitList.value().items : []));
  protected readonly ready = computed(() => this.outcomes.hasValue() && (this.traitList.hasValue() || !!this.traitList.error()));

  protected readonly form = new FormGroup({
    hatchedOn: new FormControl(this.today < this.clutch.laidOn ? this.clutch.laidOn : this.today, {
      nonNullable: true,
      validators: [required('The hatch date is required'), pastDay(), notBefore(this.clutch.laidOn)],
    }),
    count: new FormControl(String(this.clutch.fertileEggs || 1), { nonNullable: true }),
    prefix: new FormControl(`C${this.clutch.id}-`, { nonNullable: true, validators: [maxChars(36)] }),
    hatchlings: new FormArray<HatchlingForm>([]),
  });
  protected readonly rows = this.form.controls.hatchlings;
  private readonly changes = toSignal(this.form.events, { initialValue: null });

  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly done = signal<HatchResponse | null>(null);

  constructor() {
    this.resize();
    // The traits arrive with the outcome table: every row gets a "shows" choice per trait.
    effect(() => {
      const traits = this.traits();
      untracked(() => this.rows.controls.forEach((row) => this.addLooks(row, traits)));
    });
    this.form.controls.count.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.resize());
    this.form.controls.prefix.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.renumber());
  }

  protected countError(): string {
    this.changes();
    const n = Number(this.form.controls.count.value);
    return Number.isInteger(n) && n >= 1 && n <= this.clutch.fertileEggs ? '' : `From 1 to ${this.clutch.fertileEggs} (the fertile eggs)`;
  }

  protected error(control: AbstractControl): string {
    this.changes();
    return control.touched || control.dirty ? errorText(control) : '';
  }

  protected looksOptions(trait: TracedTrait): readonly LooksState[] {
    return LOOKS_BY_MODE[trait.mode];
  }

  protected looksControl(row: HatchlingForm, trait: string): FormControl<LooksState> | null {
    return row.controls.looks.controls[trait] ?? null;
  }

  /** The genes the row's hatchling will be recorded with, or null when these parents cannot give that look. */
  protected genesOf(row: HatchlingForm): string[] | null {
    this.changes();
    return expectedGenes(this.table(), this.traits(), row.controls.looks.getRawValue());
  }

  protected save(): void {
    if (this.busy() || !this.ready()) return;
    const impossible = this.rows.controls.findIndex((row) => this.genesOf(row) === null);
    if (this.form.invalid || this.countError() || impossible >= 0) {
      this.form.markAllAsTouched();
      this.failure.set(impossible >= 0 ? `Hatchling ${impossible + 1}: these parents cannot produce that look. Check what it shows.` : 'Check the fields marked in red.');
      return;
    }
    const v = this.form.getRawValue();
    const body = {
      hatchedOn: v.hatchedOn,
      hatchlings: v.hatchlings.map((h) => ({ code: h.code.trim(), name: h.name.trim(), sex: h.sex, looks: looksToSend(h.looks) })),
    };
    this.busy.set(true);
    this.failure.set(null);
    this.api
      .post<HatchResponse>(`/clutches/${this.clutch.id}/hatch`, body)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (hatch) => {
          this.busy.set(false);
          this.done.set(hatch);
          this.dialogRef.disableClose = false;
        },
        error: (error: unknown) => {
          this.busy.set(false);
          const apiError = toApiError(error);
          this.showFieldError(apiError);
          this.failure.set(describeApiError(apiError));
        },
      });
  }

  protected href(id: number): string {
    return `${this.base}/animals/${id}`;
  }

  /** Links leave the dialog: the page opens once it has closed (the shell navigates the module). */
  protected open(event: MouseEvent, id: number): void {
    if (event.button !== 0 || event.ctrlKey || event.metaKey || event.shiftKey || event.altKey) return;
    event.preventDefault();
    this.dialogRef.close({ hatch: this.done(), open: `animals/${id}` });
  }

  protected close(): void {
    this.dialogRef.close({ hatch: this.done() });
  }

  private showFieldError(apiError: ApiError): void {
    if (apiError.field === 'hatchedOn') {
      this.form.controls.hatchedOn.setErrors({ server: fieldMessage(apiError.message, 'hatchedOn') });
      this.form.controls.hatchedOn.markAsTouched();
      return;
    }
    const at = hatchlingField(apiError.field);
    const row = at ? this.rows.at(at.index) : null;
    if (row && at && (at.field === 'code' || at.field === 'name')) {
      row.controls[at.field].setErrors({ server: fieldMessage(apiError.message, apiError.field!) });
      row.controls[at.field].markAsTouched();
    }
  }

  /** Rows follow the count: new rows get the next codes, rows already there keep what was typed. */
  private resize(): void {
    const n = Number(this.form.controls.count.value);
    if (!Number.isInteger(n) || n < 1 || n > this.clutch.fertileEggs) return;
    while (this.rows.length > n) this.rows.removeAt(this.rows.length - 1);
    while (this.rows.length < n) {
      const number = this.rows.length + 1;
      this.rows.push(
        new FormGroup({
          code: new FormControl(hatchlingCode(this.form.controls.prefix.value, number), { nonNullable: true, validators: [required('A code is required'), maxChars(40)] }),
          name: new FormControl('', { nonNullable: true, validators: [maxChars(80)] }),
          sex: new FormControl<Sex>('unknown', { nonNullable: true }),
          looks: new FormGroup<Record<string, FormControl<LooksState>>>({}),
        }),
      );
      this.addLooks(this.rows.at(this.rows.length - 1), this.traits());
    }
  }

  private addLooks(row: HatchlingForm, traits: readonly TracedTrait[]): void {
    for (const t of traits) {
      if (!row.controls.looks.controls[t.name]) row.controls.looks.addControl(t.name, new FormControl<LooksState>('normal', { nonNullable: true }), { emitEvent: false });
    }
  }

  /** A new prefix renumbers the codes the keeper has not typed over. */
  private renumber(): void {
    this.rows.controls.forEach((row, i) => {
      if (!row.controls.code.dirty) row.controls.code.setValue(hatchlingCode(this.form.controls.prefix.value, i + 1));
    });
  }
}

/** Opens the dialog (see open-hatch-dialog.ts, which loads this file on first use). */
export function showHatchDialog(injector: Injector, clutch: Clutch, pairingLabel: string): Observable<HatchDialogResult | undefined> {
  return injector
    .get(MatDialog)
    .open<HatchDialog, HatchDialogData, HatchDialogResult>(HatchDialog, { data: { clutch, pairingLabel }, width: '1040px', maxWidth: '96vw', autoFocus: 'first-tabbable' })
    .afterClosed();
}
