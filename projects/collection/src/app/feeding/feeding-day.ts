import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ApiError, ErrorBanner, describeApiError } from '@tubwright/kit';
import { PREY_SIZES } from '../animals/event-text';
import { CollectionApi } from '../core/collection-api';
import type { BulkFeedingRequest, DueAnimal, DueList, EventBatch, PreySize, RackMap, Tub } from '../core/collection-types';
import { fromLocalInput, toLocalInput } from '../core/format';
import { ShellLink } from '../core/shell-link';
import { FeedingGridState, FeedingMark, GridTub, KeyInput, applyGridKey, countMarks, initialGridState, markTub } from './feeding-grid-keys';

export const MARK_LABELS: Record<FeedingMark, string> = { accepted: 'Accepted', refused: 'Refused', offered: 'Offered', regurgitated: 'Regurgitated' };
const MARK_LETTERS: Record<FeedingMark, string> = { accepted: 'A', refused: 'R', offered: 'O', regurgitated: 'G' };

/**
 * Feeding day for one rack: walk the rack with the keyboard, one keystroke per tub, then save every
 * result as one entry (all or nothing) that can be undone as a whole.
 */
@Component({
  selector: 'tw-feeding-day',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, MatFormFieldModule, MatInput, ErrorBanner, ShellLink],
  templateUrl: './feeding-day.html',
  styleUrl: './feeding-day.scss',
})
export class FeedingDay {
  readonly rackId = input.required<number>();

  private readonly api = inject(CollectionApi);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;

  protected readonly rack = rxResource({ params: () => this.rackId(), stream: ({ params }) => this.api.get<RackMap>(`/racks/${params}`) });
  protected readonly due = rxResource({ stream: () => this.api.get<DueList>('/feeding/due') });

  protected readonly gridTubs = computed<GridTub[]>(() =>
    this.rack.hasValue() ? this.rack.value().tubs.map((t) => ({ id: t.id, level: t.level, column: t.column, occupied: !!t.occupant })) : [],
  );
  /** Starts over whenever the rack (re)loads: after a save the marks are in the history. */
  protected readonly grid = linkedSignal<GridTub[], FeedingGridState>({ source: this.gridTubs, computation: (tubs) => initialGridState(tubs) });
  protected readonly counts = computed(() => countMarks(this.grid().marks));
  protected readonly levels = computed(() => {
    if (!this.rack.hasValue()) return [];
    const rack = this.rack.value();
    return Array.from({ length: rack.levels }, (_, i) => rack.tubs.filter((t) => t.level === i + 1).sort((a, b) => a.column - b.column));
  });
  protected readonly dueByAnimal = computed(() => {
    const map = new Map<number, DueAnimal>();
    if (this.due.hasValue()) for (const group of this.due.value().racks) for (const a of group.animals) map.set(a.animalId, a);
    return map;
  });
  protected readonly dueHere = computed(() => {
    if (!this.rack.hasValue()) return 0;
    return this.rack.value().tubs.filter((t) => t.occupant && this.dueByAnimal().has(t.occupant.animalId)).length;
  });

  protected readonly fedAt = signal(toLocalInput(new Date()));
  /** Until the keeper types a time, the entry is stamped when it is saved (a feeding round takes a while). */
  private fedAtEdited = false;
  protected readonly preyKind = signal('rat');
  protected readonly preySize = signal<PreySize | ''>('');
  protected readonly preySizes = PREY_SIZES;
  protected readonly saving = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly saved = signal<EventBatch | null>(null);
  protected readonly undone = signal(false);
  /** Results of the entry just saved, by animal, shown in the cells until it is undone. */
  protected readonly savedByAnimal = computed(() => {
    const batch = this.saved();
    const map = new Map<number, string>();
    if (batch && !this.undone()) for (const e of batch.events) if (e.result) map.set(e.animalId, e.result);
    return map;
  });
  protected readonly markLabels = MARK_LABELS;
  protected readonly markLetters = MARK_LETTERS;
  protected readonly marks: FeedingMark[] = ['accepted', 'refused', 'offered', 'regurgitated'];
  /** Kept for a retry of the same entry after a dropped connection, so it is written once. */
  private retryKey: string | null = null;

  protected editFedAt(value: string): void {
    this.fedAtEdited = true;
    this.fedAt.set(value);
  }

  protected onKey(event: KeyboardEvent): void {
    this.press({ key: event.key, ctrlKey: event.ctrlKey, metaKey: event.metaKey, altKey: event.altKey }, event);
  }

  /** The toolbar's buttons do what their key does, for a mouse or a touch screen. */
  protected pressKey(key: string): void {
    this.press({ key });
  }

  protected focusTub(tub: Tub): void {
    if (!tub.occupant) return;
    this.grid.update((s) => ({ ...s, cursor: tub.id }));
  }

  protected clickMark(tub: Tub, mark: FeedingMark): void {
    this.grid.update((s) => markTub(s, tub.id, mark));
  }

  protected cellLabel(tub: Tub): string {
    if (!tub.occupant) return `${tub.label}, empty`;
    const mark = this.grid().marks[tub.id];
    const due = this.dueByAnimal().get(tub.occupant.animalId);
    const saved = this.savedByAnimal().get(tub.occupant.animalId);
    return [tub.label, tub.occupant.code, tub.occupant.name, due ? 'due' : 'not due', saved ? `saved ${saved}` : '', mark ? MARK_LABELS[mark] : 'not marked']
      .filter(Boolean)
      .join(', ');
  }

  protected save(): void {
    const rack = this.rack.hasValue() ? this.rack.value() : null;
    if (!rack) return;
    if (!this.fedAtEdited) this.fedAt.set(toLocalInput(new Date()));
    const occurredAt = fromLocalInput(this.fedAt());
    if (!occurredAt) return this.error.set('Fed at: give a date and time.');
    if (!this.preyKind().trim()) return this.error.set('Prey: say what was offered, e.g. rat.');
    const entries = Object.entries(this.grid().marks).map(([tubId, result]) => ({ tubId: Number(tubId), result }));
    if (!entries.length) return this.error.set('Mark at least one tub first.');
    const body: BulkFeedingRequest = { occurredAt, preyKind: this.preyKind().trim(), entries, ...(this.preySize() ? { preySize: this.preySize() as PreySize } : {}) };
    this.retryKey ??= newKey();
    this.saving.set(true);
    this.error.set(null);
    this.api.post<EventBatch>(`/racks/${rack.id}/feeding`, body, { idempotencyKey: this.retryKey }).subscribe({
      next: (batch) => {
        this.retryKey = null;
        this.saving.set(false);
        this.saved.set(batch);
        this.undone.set(false);
        this.rack.reload();
        this.due.reload();
      },
      error: (error: unknown) => {
        this.saving.set(false);
        if (!(error instanceof ApiError && error.status === 0)) this.retryKey = null;
        this.error.set(describeApiError(error));
      },
    });
  }

  protected undoSaved(): void {
    const batch = this.saved();
    if (!batch) return;
    this.api.delete<EventBatch>(`/event-batches/${batch.id}`).subscribe({
      next: () => {
        this.undone.set(true);
        this.due.reload();
      },
      error: (error: unknown) => this.error.set(describeApiError(error)),
    });
  }

  protected savedSummary(batch: EventBatch): string {
    const counts = new Map<string, number>();
    for (const e of batch.events) if (e.result) counts.set(e.result, (counts.get(e.result) ?? 0) + 1);
    return [...counts].map(([result, n]) => `${n} ${result}`).join(', ');
  }

  private press(key: KeyInput, event?: KeyboardEvent): void {
    const { state, handled } = applyGridKey(this.grid(), this.gridTubs(), key);
    if (!handled) return;
    event?.preventDefault();
    this.grid.set(state);
    // Keep the browser's focus on the cursor so screen readers follow it.
    queueMicrotask(() => this.host.querySelector<HTMLElement>(`[data-tub-id="${state.cursor}"]`)?.focus());
  }
}

function newKey(): string {
  return typeof crypto !== 'undefined' && 'randomUUID' in crypto ? crypto.randomUUID() : `${Date.now()}-${Math.random().toString(36).slice(2)}`;
}
