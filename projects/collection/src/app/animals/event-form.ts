import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, describeApiError } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import type { CreateEventRequest, EventKind, FeedingResult, HusbandryEvent, PreySize, ShedQuality } from '../core/collection-types';
import { fromLocalInput, toLocalInput } from '../core/format';
import { EVENT_KINDS, EVENT_KIND_LABELS, FEEDING_RESULTS, FEEDING_RESULT_LABELS, PREY_SIZES, SHED_LABELS } from './event-text';

/** Records one feeding, weight, shed, cleaning, health note or note for an animal. */
@Component({
  selector: 'tw-event-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, ErrorBanner],
  template: `
    <form (submit)="$event.preventDefault(); save()" aria-label="Record an event">
      <div class="row">
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>What</mat-label>
          <select matNativeControl [value]="kind()" (change)="kind.set($any($event.target).value)">
            @for (k of kinds; track k) {
              <option [value]="k">{{ kindLabels[k] }}</option>
            }
          </select>
        </mat-form-field>
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>When</mat-label>
          <input matInput type="datetime-local" [value]="when()" [max]="maxWhen" (input)="when.set($any($event.target).value)" required />
        </mat-form-field>
      </div>

      @switch (kind()) {
        @case ('feeding') {
          <div class="row">
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Result</mat-label>
              <select matNativeControl [value]="result()" (change)="result.set($any($event.target).value)">
                @for (r of results; track r) {
                  <option [value]="r">{{ resultLabels[r] }}</option>
                }
              </select>
            </mat-form-field>
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Prey</mat-label>
              <input matInput [value]="preyKind()" (input)="preyKind.set($any($event.target).value)" maxlength="40" required />
            </mat-form-field>
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Size</mat-label>
              <select matNativeControl [value]="preySize()" (change)="preySize.set($any($event.target).value)">
                <option value="">Not given</option>
                @for (s of preySizes; track s) {
                  <option [value]="s">{{ s }}</option>
                }
              </select>
            </mat-form-field>
            <mat-form-field appearance="outline" subscriptSizing="dynamic" class="narrow">
              <mat-label>Prey mass (g)</mat-label>
              <input matInput type="number" min="1" max="5000" step="1" [value]="preyMassG()" (input)="preyMassG.set($any($event.target).value)" />
              @if (suggestedPreyMassG(); as g) {
                <mat-hint>About {{ g }} g suggested</mat-hint>
              }
            </mat-form-field>
          </div>
        }
        @case ('weight') {
          <div class="row">
            <mat-form-field appearance="outline" subscriptSizing="dynamic" class="narrow">
              <mat-label>Weight (g)</mat-label>
              <input matInput type="number" min="1" max="200000" step="1" [value]="weightG()" (input)="weightG.set($any($event.target).value)" required />
            </mat-form-field>
          </div>
        }
        @case ('shed') {
          <div class="row">
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Shed</mat-label>
              <select matNativeControl [value]="shed()" (change)="shed.set($any($event.target).value)">
                <option value="complete">{{ shedLabels.complete }}</option>
                <option value="in-pieces">{{ shedLabels['in-pieces'] }}</option>
              </select>
            </mat-form-field>
          </div>
        }
      }
      <mat-form-field appearance="outline" subscriptSizing="dynamic" class="note">
        <mat-label>{{ noteRequired() ? 'Note (required)' : 'Note' }}</mat-label>
        <textarea matInput rows="2" maxlength="2000" [value]="note()" (input)="note.set($any($event.target).value)"></textarea>
      </mat-form-field>

      @if (error(); as message) {
        <tw-error-banner [message]="message" />
      }
      <div class="actions">
        <button mat-flat-button type="submit" [disabled]="saving()">Record {{ kindLabels[kind()].toLowerCase() }}</button>
      </div>
    </form>
  `,
  styles: `
    :host { display: block; }
    .row { display: flex; flex-wrap: wrap; align-items: flex-start; gap: 12px; margin-bottom: 12px; }
    .row mat-form-field { flex: 1 1 160px; }
    .row .narrow { flex: 0 1 180px; }
    .note { width: 100%; margin-bottom: 12px; }
    .actions { display: flex; justify-content: flex-end; }
  `,
})
export class EventForm {
  readonly animalId = input.required<number>();
  readonly suggestedPreyMassG = input<number | null>(null);
  readonly recorded = output<HusbandryEvent>();

  private readonly api = inject(CollectionApi);
  protected readonly kinds = EVENT_KINDS;
  protected readonly kindLabels = EVENT_KIND_LABELS;
  protected readonly results = FEEDING_RESULTS;
  protected readonly resultLabels = FEEDING_RESULT_LABELS;
  protected readonly preySizes = PREY_SIZES;
  protected readonly shedLabels = SHED_LABELS;
  protected readonly maxWhen = toLocalInput(new Date(Date.now() + 60_000));

  protected readonly kind = signal<EventKind>('feeding');
  protected readonly when = signal(toLocalInput(new Date()));
  protected readonly result = signal<FeedingResult>('accepted');
  protected readonly preyKind = signal('rat');
  protected readonly preySize = signal<PreySize | ''>('');
  protected readonly preyMassG = signal('');
  protected readonly weightG = signal('');
  protected readonly shed = signal<ShedQuality>('complete');
  protected readonly note = signal('');
  protected readonly saving = signal(false);
  protected readonly error = signal<string | null>(null);

  protected noteRequired(): boolean {
    return this.kind() === 'health' || this.kind() === 'note';
  }

  protected save(): void {
    const body = this.body();
    if (typeof body === 'string') {
      this.error.set(body);
      return;
    }
    this.saving.set(true);
    this.error.set(null);
    this.api.post<HusbandryEvent>(`/animals/${this.animalId()}/events`, body).subscribe({
      next: (event) => {
        this.saving.set(false);
        this.note.set('');
        this.weightG.set('');
        this.recorded.emit(event);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(describeApiError(error));
      },
    });
  }

  /** The request, or a sentence saying what is missing. */
  private body(): CreateEventRequest | string {
    const occurredAt = fromLocalInput(this.when());
    if (!occurredAt) return 'When: give a date and time.';
    const note = this.note().trim();
    switch (this.kind()) {
      case 'feeding': {
        const preyKind = this.preyKind().trim();
        if (!preyKind) return 'Prey: say what was offered, e.g. rat.';
        const mass = this.preyMassG() === '' ? undefined : Number(this.preyMassG());
        if (mass !== undefined && !(mass > 0)) return 'Prey mass: must be more than 0 grams.';
        return { kind: 'feeding', occurredAt, preyKind, result: this.result(), note, ...(this.preySize() ? { preySize: this.preySize() as PreySize } : {}), ...(mass !== undefined ? { preyMassG: mass } : {}) };
      }
      case 'weight': {
        const weightG = Number(this.weightG());
        if (!(weightG > 0)) return 'Weight: must be more than 0 grams.';
        return { kind: 'weight', occurredAt, weightG, note };
      }
      case 'shed':
        return { kind: 'shed', occurredAt, shed: this.shed(), note };
      case 'cleaning':
        return { kind: 'cleaning', occurredAt, note };
      case 'health':
      case 'note':
        if (!note) return 'Note: write what you saw.';
        return { kind: this.kind() as 'health' | 'note', occurredAt, note };
    }
  }
}
