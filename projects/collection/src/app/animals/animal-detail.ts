import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { ErrorBanner, describeApiError } from '@tubwright/kit';
import { of } from 'rxjs';
import { LineChart } from '../charts/line-chart';
import { CollectionApi } from '../core/collection-api';
import type { AnimalProfile, EventKind, EventPage, HusbandryEvent, PlacementHistory, Rack, WeightSeries } from '../core/collection-types';
import type { Page } from '@tubwright/kit';
import { formatDay, formatGrams, formatMoment, formatShortDay } from '../core/format';
import { ShellLink } from '../core/shell-link';
import { Animal, sexLabel, statusLabel } from './animal';
import { EventForm } from './event-form';
import { GeneEditor } from './gene-editor';
import { EVENT_KINDS, EVENT_KIND_LABELS, describeEvent } from './event-text';
import { ageText } from './gene-text';
import { MoveAnimal } from './move-animal';
import { PhotoGallery } from './photo-gallery';

const PAGE = 50;

/** One animal and its whole history: events, weights, sheds, moves, genes and photos. */
@Component({
  selector: 'tw-animal-detail',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatAnchor, MatIcon, ErrorBanner, LineChart, EventForm, GeneEditor, MoveAnimal, PhotoGallery, ShellLink],
  templateUrl: './animal-detail.html',
  styleUrl: './animal-detail.scss',
})
export class AnimalDetail {
  readonly animalId = input.required<number>();

  private readonly api = inject(CollectionApi);
  protected readonly kindFilter = signal<EventKind | null>(null);
  protected readonly limit = signal(PAGE);
  protected readonly notice = signal('');
  /** Said beside the history, where the keeper pressed Undo. */
  protected readonly historyNotice = signal('');
  protected readonly actionError = signal<string | null>(null);

  protected readonly profile = rxResource({
    params: () => ({ id: this.animalId() }),
    stream: ({ params }) => this.api.get<AnimalProfile>(`/animals/${params.id}/profile`),
  });
  protected readonly events = rxResource({
    params: () => ({ id: this.animalId(), kinds: this.kindFilter(), limit: this.limit() }),
    stream: ({ params }) => this.api.get<EventPage>(`/animals/${params.id}/events`, { kinds: params.kinds, limit: params.limit }),
  });
  /** The last page loaded, kept on screen while a filter or "show older" loads the next. */
  protected readonly history = linkedSignal<EventPage | undefined, EventPage | null>({
    source: () => (this.events.hasValue() ? this.events.value() : undefined),
    computation: (page, previous) => page ?? previous?.value ?? null,
  });
  protected readonly weights = rxResource({
    params: () => ({ id: this.animalId() }),
    stream: ({ params }) => this.api.get<WeightSeries>(`/animals/${params.id}/weights`),
  });
  protected readonly placements = rxResource({
    params: () => ({ id: this.animalId() }),
    stream: ({ params }) => this.api.get<PlacementHistory>(`/animals/${params.id}/placements`),
  });
  protected readonly lastShed = rxResource({
    params: () => ({ id: this.animalId() }),
    stream: ({ params }) => this.api.get<EventPage>(`/animals/${params.id}/events`, { kinds: 'shed', limit: 1 }),
  });
  private readonly parentIds = computed(() => {
    const p = this.profile.hasValue() ? this.profile.value() : null;
    return { sireId: p?.sireId ?? null, damId: p?.damId ?? null };
  });
  protected readonly sire = rxResource({
    params: () => this.parentIds().sireId,
    stream: ({ params }) => (params ? this.api.get<Animal>(`/animals/${params}`) : of(null)),
  });
  protected readonly dam = rxResource({
    params: () => this.parentIds().damId,
    stream: ({ params }) => (params ? this.api.get<Animal>(`/animals/${params}`) : of(null)),
  });

  private readonly racks = rxResource({ stream: () => this.api.get<Page<Rack>>('/racks', { limit: 200 }) });
  /** The rack of the current tub, for the link to its map (a tub label is "<rack name>-<level><column letter>"). */
  protected readonly tubRackId = computed(() => {
    const label = this.profile.hasValue() ? this.profile.value().currentTub?.label : undefined;
    if (!label || !this.racks.hasValue()) return null;
    const rackName = label.slice(0, label.lastIndexOf('-'));
    return this.racks.value().items.find((r) => r.name === rackName)?.id ?? null;
  });
  protected readonly loadError = computed(() => {
    const error = this.profile.error();
    return error ? describeApiError(error) : null;
  });
  protected readonly weightSeries = computed(() => {
    const series = this.weights.hasValue() ? this.weights.value() : null;
    return [{ label: 'Weight', points: (series?.points ?? []).map((p) => ({ x: Date.parse(p.occurredAt), y: p.weightG })) }];
  });

  protected readonly kinds = EVENT_KINDS;
  protected readonly kindLabels = EVENT_KIND_LABELS;
  protected readonly describeEvent = describeEvent;
  protected readonly formatDay = formatDay;
  protected readonly formatMoment = formatMoment;
  protected readonly formatGrams = formatGrams;
  protected readonly formatShortDay = (ms: number) => formatShortDay(new Date(ms).toISOString());
  protected readonly formatAxisGrams = (g: number) => formatGrams(g);
  protected readonly ageText = ageText;
  protected readonly sexLabel = sexLabel;
  protected readonly statusLabel = statusLabel;

  protected filterKind(kind: EventKind | null): void {
    this.kindFilter.set(kind);
    this.limit.set(PAGE);
  }

  protected showMore(): void {
    this.limit.update((n) => Math.min(200, n + PAGE * 2));
  }

  protected changed(message: string): void {
    this.notice.set(message);
    this.historyNotice.set('');
    this.actionError.set(null);
    // reload() keeps the current values on screen while the new ones load (no flash).
    for (const part of [this.profile, this.events, this.weights, this.placements, this.lastShed]) part.reload();
  }

  protected undoEvent(event: HusbandryEvent): void {
    this.actionError.set(null);
    this.api.delete(`/events/${event.id}`).subscribe({
      next: () => {
        this.changed('');
        this.historyNotice.set(`Undone: ${EVENT_KIND_LABELS[event.kind].toLowerCase()} of ${formatMoment(event.occurredAt)} (${describeEvent(event)}).`);
      },
      error: (error: unknown) => this.actionError.set(describeApiError(error)),
    });
  }

  protected recorded(event: HusbandryEvent): void {
    this.changed(`Recorded: ${EVENT_KIND_LABELS[event.kind].toLowerCase()}, ${describeEvent(event)}.`);
  }
}
