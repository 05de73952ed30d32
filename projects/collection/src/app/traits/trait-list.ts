import { ChangeDetectionStrategy, Component, DestroyRef, inject, signal } from '@angular/core';
import { rxResource, takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, Page, PageHeader, describeApiError, toApiError } from '@tubwright/kit';
import { Observable } from 'rxjs';
import { errorText, fieldMessage, maxChars, required } from '../animals/animal-form-rules';
import { CollectionApi } from '../core/collection-api';
import type { InheritanceMode, Trait } from '../core/collection-types';
import { INHERITANCE_MODES, MODE_LABELS, MODE_MEANINGS } from './trait-modes';

/** The API's rule for trait names (shared/api/collection-breeding.ts). */
const NAME_PATTERN = /^[A-Za-z0-9](?:[A-Za-z0-9 ._-]*[A-Za-z0-9])?$/;
const nameRules = [
  required('A name is required'),
  maxChars(40),
  (c: { value: unknown }) => (!String(c.value ?? '').trim() || NAME_PATTERN.test(String(c.value).trim()) ? null : { pattern: 'Letters, digits, spaces, dots, dashes and underscores; start and end with a letter or digit' }),
];

function traitForm(trait?: Trait) {
  return new FormGroup({
    name: new FormControl(trait?.name ?? '', { nonNullable: true, validators: nameRules }),
    mode: new FormControl<InheritanceMode>(trait?.mode ?? 'recessive', { nonNullable: true }),
    notes: new FormControl(trait?.notes ?? '', { nonNullable: true, validators: [maxChars(2000)] }),
  });
}
type TraitForm = ReturnType<typeof traitForm>;

/** The shop's trait list: what the gene editor, pairings and hatch recording pick from. */
@Component({
  selector: 'tw-trait-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatButton, MatIcon, ErrorBanner, PageHeader],
  templateUrl: './trait-list.html',
  styleUrl: './trait-list.scss',
})
export class TraitList {
  private readonly api = inject(CollectionApi);
  private readonly destroyRef = inject(DestroyRef);

  protected readonly traits = rxResource({ stream: () => this.api.get<Page<Trait>>('/traits', { limit: 200, sort: 'name' }) });
  protected readonly modes = INHERITANCE_MODES;
  protected readonly modeLabels = MODE_LABELS;
  protected readonly meanings = MODE_MEANINGS;

  protected readonly addForm = traitForm();
  protected readonly editForm = signal<TraitForm | null>(null);
  protected readonly editingId = signal<number | null>(null);
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly notice = signal('');
  private readonly addChanges = toSignal(this.addForm.events, { initialValue: null });
  /** Bumped when an edit form changes, so its errors re-read. */
  private readonly editTick = signal(0);

  protected addError(field: 'name' | 'notes'): string {
    this.addChanges();
    const control = this.addForm.controls[field];
    return control.touched || control.dirty ? errorText(control) : '';
  }

  protected editError(field: 'name' | 'mode' | 'notes'): string {
    this.editTick();
    const control = this.editForm()?.controls[field];
    return control && (control.touched || control.dirty) ? errorText(control) : '';
  }

  protected add(): void {
    if (this.busy()) return;
    if (this.addForm.invalid) return this.addForm.markAllAsTouched();
    const v = this.addForm.getRawValue();
    this.write(this.api.post<Trait>('/traits', { name: v.name.trim(), mode: v.mode, notes: v.notes }), this.addForm, (trait) => {
      this.addForm.reset({ name: '', mode: v.mode, notes: '' });
      this.notice.set(`Added ${trait.name} (${MODE_LABELS[trait.mode].toLowerCase()}).`);
    });
  }

  protected edit(trait: Trait): void {
    const form = traitForm(trait);
    form.events.pipe(takeUntilDestroyed(this.destroyRef)).subscribe(() => this.editTick.update((n) => n + 1));
    this.editForm.set(form);
    this.editingId.set(trait.id);
    this.failure.set(null);
  }

  protected cancelEdit(): void {
    this.editForm.set(null);
    this.editingId.set(null);
  }

  protected saveEdit(trait: Trait): void {
    const form = this.editForm();
    if (!form || this.busy()) return;
    if (form.invalid) return form.markAllAsTouched();
    const v = form.getRawValue();
    // Only what changed: a rename alone must not trip the mode rule, and the reverse.
    const body: Partial<Record<'name' | 'mode' | 'notes', string>> = {};
    if (v.name.trim() !== trait.name) body.name = v.name.trim();
    if (v.mode !== trait.mode) body.mode = v.mode;
    if (v.notes !== trait.notes) body.notes = v.notes;
    if (!Object.keys(body).length) return this.cancelEdit();
    this.write(this.api.patch<Trait>(`/traits/${trait.id}`, body), form, (saved) => {
      this.cancelEdit();
      this.notice.set(saved.name === trait.name ? `Saved ${saved.name}.` : `Renamed ${trait.name} to ${saved.name}; animals carrying it show the new name.`);
    });
  }

  private write(request: Observable<Trait>, form: TraitForm, done: (trait: Trait) => void): void {
    this.busy.set(true);
    this.failure.set(null);
    this.notice.set('');
    request.pipe(takeUntilDestroyed(this.destroyRef)).subscribe({
      next: (trait) => {
        this.busy.set(false);
        done(trait);
        this.traits.reload();
      },
      error: (error: unknown) => {
        this.busy.set(false);
        const apiError = toApiError(error);
        const field = apiError.field as keyof TraitForm['controls'] | undefined;
        if (field && field in form.controls) {
          form.controls[field].setErrors({ server: fieldMessage(apiError.message, field) });
          form.controls[field].markAsTouched();
        }
        this.failure.set(describeApiError(apiError));
      },
    });
  }
}
