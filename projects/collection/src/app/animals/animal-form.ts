import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { rxResource, takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { ApiError, ErrorBanner, Page, describeApiError, injectShellNavigate, toApiError } from '@tubwright/kit';
import { Observable, switchMap } from 'rxjs';
import { CollectionApi } from '../core/collection-api';
import type { AnimalOrigin, AnimalProfile, SpeciesList } from '../core/collection-types';
import { todayUtc } from '../core/format';
import { ShellLink } from '../core/shell-link';
import { Animal, SEX_OPTIONS, STATUS_OPTIONS } from './animal';
import {
  ANIMAL_FIELDS, AnimalFormValue, EMPTY_ANIMAL, errorText, fieldMessage, formValueFrom, intervalDays, maxChars, pastDay, required, saleFitsStatus, toAnimalRequest,
  toProfileRequest,
} from './animal-form-rules';

/** Add an animal, or change one: its record and, in the same save, its origin, parents and keeping. */
@Component({
  selector: 'tw-animal-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatRadioModule, MatCheckbox, MatButton, MatIcon, ErrorBanner, ShellLink],
  templateUrl: './animal-form.html',
  styleUrl: './animal-form.scss',
})
export class AnimalForm {
  /** null adds a new animal. */
  readonly animalId = input<number | null>(null);

  private readonly api = inject(CollectionApi);
  private readonly navigate = injectShellNavigate();
  private readonly destroyRef = inject(DestroyRef);

  protected readonly form = new FormGroup(
    {
      code: new FormControl(EMPTY_ANIMAL.code, { nonNullable: true, validators: [required('A code is required: the shop\'s own ID for the animal'), maxChars(40)] }),
      name: new FormControl(EMPTY_ANIMAL.name, { nonNullable: true, validators: [maxChars(80)] }),
      species: new FormControl(EMPTY_ANIMAL.species, { nonNullable: true, validators: [required('A species is required'), maxChars(120)] }),
      morph: new FormControl(EMPTY_ANIMAL.morph, { nonNullable: true, validators: [maxChars(200)] }),
      sex: new FormControl<Animal['sex']>(EMPTY_ANIMAL.sex, { nonNullable: true }),
      hatchDate: new FormControl(EMPTY_ANIMAL.hatchDate, { nonNullable: true, validators: [pastDay()] }),
      status: new FormControl<Animal['status']>(EMPTY_ANIMAL.status, { nonNullable: true }),
      origin: new FormControl<AnimalOrigin>(EMPTY_ANIMAL.origin, { nonNullable: true }),
      sireId: new FormControl<number | null>(EMPTY_ANIMAL.sireId),
      damId: new FormControl<number | null>(EMPTY_ANIMAL.damId),
      acquiredFrom: new FormControl(EMPTY_ANIMAL.acquiredFrom, { nonNullable: true, validators: [maxChars(120)] }),
      feedingIntervalDays: new FormControl(EMPTY_ANIMAL.feedingIntervalDays, { nonNullable: true, validators: [intervalDays] }),
      forSale: new FormControl(EMPTY_ANIMAL.forSale, { nonNullable: true }),
      notes: new FormControl(EMPTY_ANIMAL.notes, { nonNullable: true, validators: [maxChars(4000)] }),
    },
    { validators: [saleFitsStatus] },
  );

  /** Set once the animal exists: a new animal whose profile failed is saved again as a change. */
  protected readonly savedId = signal<number | null>(null);
  protected readonly editing = computed(() => this.animalId() ?? this.savedId());
  protected readonly loaded = signal<AnimalProfile | null>(null);
  protected readonly loading = signal(false);
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** Re-reads errors after each change of the form, so errors set by the API show at once. */
  protected readonly changes = toSignal(this.form.events, { initialValue: null });
  protected readonly origin = toSignal(this.form.controls.origin.valueChanges, { initialValue: this.form.controls.origin.value });

  protected readonly today = todayUtc();
  protected readonly sexOptions = SEX_OPTIONS;
  protected readonly statusOptions = STATUS_OPTIONS;

  protected readonly species = rxResource({ stream: () => this.api.get<SpeciesList>('/environment/species') });
  protected readonly speciesNames = computed(() => (this.species.hasValue() ? this.species.value().items.map((s) => s.name) : []));
  private readonly parents = rxResource({
    params: () => (this.origin() === 'bred' ? true : undefined),
    stream: () => this.api.get<Page<Animal>>('/animals', { limit: 200, sort: 'code' }),
  });
  protected readonly males = computed(() => this.parentOptions('male'));
  protected readonly females = computed(() => this.parentOptions('female'));

  constructor() {
    effect(() => {
      const id = this.animalId();
      untracked(() => (id ? this.load(id) : this.reset()));
    });
  }

  protected error(field: keyof AnimalFormValue): string {
    this.changes();
    const control = this.form.controls[field];
    return control.touched || control.dirty ? errorText(control) : '';
  }

  protected saleError(): string {
    this.changes();
    return (this.form.errors?.['forSale'] as string | undefined) ?? errorText(this.form.controls.forSale);
  }

  protected save(): void {
    if (this.busy()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.failure.set('Check the fields marked in red.');
      return;
    }
    const value = this.form.getRawValue();
    const id = this.editing();
    const record$: Observable<Animal> = id ? this.api.patch<Animal>(`/animals/${id}`, toAnimalRequest(value)) : this.api.post<Animal>('/animals', toAnimalRequest(value));
    this.busy.set(true);
    this.failure.set(null);
    let savedRecord: Animal | null = null;
    record$
      .pipe(
        switchMap((animal) => {
          savedRecord = animal;
          this.savedId.set(animal.id);
          return this.api.patch<AnimalProfile>(`/animals/${animal.id}/profile`, toProfileRequest(value));
        }),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe({
        next: (profile) => {
          this.busy.set(false);
          this.form.markAsPristine();
          this.navigate(`animals/${profile.animal.id}`);
        },
        error: (error: unknown) => {
          this.busy.set(false);
          const apiError = toApiError(error);
          this.showFieldError(apiError);
          const saved: Animal | null = savedRecord;
          this.failure.set(
            saved && !id
              ? `${saved.code} was added, but the rest could not be saved: ${describeApiError(apiError)} Correct it and save again.`
              : describeApiError(apiError),
          );
        },
      });
  }

  protected cancel(): void {
    const id = this.editing();
    this.navigate(id ? `animals/${id}` : 'animals');
  }

  private parentOptions(sex: 'male' | 'female'): Animal[] {
    const self = this.editing();
    const all = this.parents.hasValue() ? this.parents.value().items : [];
    const options = all.filter((a) => a.sex === sex && a.id !== self);
    // Keep a recorded parent listed even if it is not on the page of 200.
    const chosen = this.loaded()?.[sex === 'male' ? 'sireId' : 'damId'];
    return chosen && !options.some((a) => a.id === chosen) ? [{ id: chosen, code: `#${chosen}` } as Animal, ...options] : options;
  }

  private showFieldError(apiError: ApiError): void {
    const field = apiError.field as keyof AnimalFormValue | undefined;
    if (!field || !ANIMAL_FIELDS.includes(field)) return;
    const control = this.form.controls[field];
    control.setErrors({ server: fieldMessage(apiError.message, field) });
    control.markAsTouched();
  }

  private reset(): void {
    this.loaded.set(null);
    this.savedId.set(null);
    this.form.reset(EMPTY_ANIMAL);
  }

  private load(id: number): void {
    this.loading.set(true);
    this.failure.set(null);
    this.api
      .get<AnimalProfile>(`/animals/${id}/profile`)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (profile) => {
          this.loading.set(false);
          this.loaded.set(profile);
          this.form.reset(formValueFrom(profile));
        },
        error: (error: unknown) => {
          this.loading.set(false);
          this.failure.set(describeApiError(error));
        },
      });
  }
}
