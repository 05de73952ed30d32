import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, Page, describeApiError } from '@tubwright/kit';
import { Animal } from '../animals/animal';
import { CollectionApi } from '../core/collection-api';
import type { EmptyTubList, PlacementHistory, RackMap as RackMapData, Tub } from '../core/collection-types';
import { formatDay } from '../core/format';
import { ShellLink } from '../core/shell-link';

/**
 * A rack as it stands: levels from the top, tubs left to right, with the animal in each. Select a
 * tub to open its animal, move it to an empty tub, or put an animal into an empty one.
 */
@Component({
  selector: 'tw-rack-map',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, MatFormFieldModule, MatInput, ErrorBanner, ShellLink],
  templateUrl: './rack-map.html',
  styleUrl: './rack-map.scss',
})
export class RackMap {
  readonly rackId = input.required<number>();

  private readonly api = inject(CollectionApi);
  protected readonly rack = rxResource({
    params: () => this.rackId(),
    stream: ({ params }) => this.api.get<RackMapData>(`/racks/${params}`),
  });
  /** Other racks' empty tubs, as move targets. */
  protected readonly empty = rxResource({ stream: () => this.api.get<EmptyTubList>('/tubs/empty') });
  /** Animals that can go into a tub: those still in the collection. */
  protected readonly animals = rxResource({
    stream: () => this.api.get<Page<Animal>>('/animals', { limit: 200, sort: 'code', status: 'active' }),
  });

  protected readonly selectedId = signal<number | null>(null);
  protected readonly target = signal('');
  protected readonly saving = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly notice = signal('');

  protected readonly levels = computed(() => {
    if (!this.rack.hasValue()) return [];
    const rack = this.rack.value();
    return Array.from({ length: rack.levels }, (_, i) => ({
      level: i + 1,
      tubs: rack.tubs.filter((t) => t.level === i + 1).sort((a, b) => a.column - b.column),
    }));
  });
  protected readonly selected = computed(() => (this.rack.hasValue() ? (this.rack.value().tubs.find((t) => t.id === this.selectedId()) ?? null) : null));
  protected readonly emptyTargets = computed(() => (this.empty.hasValue() ? this.empty.value().items : []));
  protected readonly candidates = computed(() => (this.animals.hasValue() ? this.animals.value().items : []));
  protected readonly formatDay = formatDay;

  protected select(tub: Tub): void {
    this.selectedId.set(this.selectedId() === tub.id ? null : tub.id);
    this.target.set('');
    this.error.set(null);
  }

  /** Moves the selected tub's animal to the chosen empty tub. */
  protected moveOut(tub: Tub): void {
    if (!tub.occupant || !this.target()) return;
    const targetId = Number(this.target());
    const label = this.emptyTargets().find((t) => t.id === targetId)?.label ?? 'the new tub';
    this.place(tub.occupant.animalId, targetId, `Moved ${tub.occupant.code} from ${tub.label} to ${label}.`);
  }

  /** Puts the chosen animal into the selected empty tub (moving it from wherever it was). */
  protected moveIn(tub: Tub): void {
    if (tub.occupant || !this.target()) return;
    const animal = this.candidates().find((a) => a.id === Number(this.target()));
    if (!animal) return;
    this.place(animal.id, tub.id, `${animal.code} is now in ${tub.label}${animal.location ? ` (was ${animal.location})` : ''}.`);
  }

  private place(animalId: number, tubId: number, message: string): void {
    this.saving.set(true);
    this.error.set(null);
    this.api.put<PlacementHistory>(`/animals/${animalId}/tub`, { tubId }).subscribe({
      next: () => {
        this.saving.set(false);
        this.notice.set(message);
        this.selectedId.set(tubId);
        this.target.set('');
        this.rack.reload();
        this.empty.reload();
        this.animals.reload();
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(describeApiError(error));
        this.rack.reload();
        this.empty.reload();
      },
    });
  }
}
