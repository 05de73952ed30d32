import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { EmptyState, Session, adoptShellSession, injectShellNavigate } from '@tubwright/kit';
import { AnimalDetail } from './animals/animal-detail';
import { AnimalForm } from './animals/animal-form';
import { AnimalList, AnimalListState } from './animals/animal-list';
import { BreedingPage } from './breeding/breeding-page';
import { PairingDetail } from './breeding/pairing-detail';
import { CollectionNav } from './core/collection-nav';
import { animalListPath, parseCollectionPath, sectionOf } from './core/collection-routes';
import { EnvironmentView } from './environment/environment-view';
import { SpeciesPage } from './environment/species-page';
import { DueList } from './feeding/due-list';
import { FeedingDay } from './feeding/feeding-day';
import { AnimalImportPage } from './import/animal-import-page';
import { RackList } from './racks/rack-list';
import { RackMap } from './racks/rack-map';
import { TubLabels } from './racks/tub-labels';
import { TraitList } from './traits/trait-list';

/** `<tw-collection>`: animals, racks, feeding day, breeding, traits, environment and species, as the console shows them. */
@Component({
  selector: 'tw-collection-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [
    CollectionNav, AnimalList, AnimalDetail, AnimalForm, AnimalImportPage, RackList, RackMap, TubLabels, DueList, FeedingDay, BreedingPage, PairingDetail, TraitList, EnvironmentView,
    SpeciesPage, EmptyState, MatButton,
  ],
  styleUrl: './collection-element.scss',
  template: `
    @let v = view();
    <tw-collection-nav [active]="section()" />
    @switch (v.page) {
      @case ('animals') {
        <tw-animal-list [query]="v.query" [filters]="v.filters" (stateChange)="showList($event)" />
      }
      @case ('animal') {
        @defer {
          <tw-animal-detail [animalId]="v.id" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('animal-new') {
        @defer {
          <tw-animal-form />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('animal-edit') {
        @defer {
          <tw-animal-form [animalId]="v.id" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('import') {
        @defer {
          <tw-animal-import />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('racks') {
        <tw-rack-list />
      }
      @case ('rack') {
        @defer {
          <tw-rack-map [rackId]="v.id" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('labels') {
        @defer {
          <tw-tub-labels [rackId]="v.id" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('due') {
        @defer {
          <tw-due-list [date]="v.date" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('feeding') {
        @defer {
          <tw-feeding-day [rackId]="v.rackId" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('breeding') {
        @defer {
          <tw-breeding-page />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('pairing') {
        @defer {
          <tw-pairing-detail [pairingId]="v.id" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('environment') {
        @defer {
          <tw-environment-view [rackId]="v.rackId" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('traits') {
        @defer {
          <tw-trait-list />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @case ('species') {
        @defer {
          <tw-species-page />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      }
      @default {
        <tw-empty-state icon="explore_off" heading="The collection has no page here" [hint]="'Nothing lives at “' + path() + '”.'">
          <button mat-flat-button type="button" (click)="navigate('')">Open the animal list</button>
        </tw-empty-state>
      }
    }
  `,
})
export class CollectionElement {
  readonly path = input<string | null>('');
  readonly session = input<Session | null>(null);

  protected readonly navigate = injectShellNavigate();
  protected readonly view = computed(() => parseCollectionPath(this.path()));
  protected readonly section = computed(() => sectionOf(this.view()));

  constructor() {
    adoptShellSession(this.session);
  }

  protected showList(state: AnimalListState): void {
    const current = this.view();
    const onlyFilter = current.page === 'animals' && state.query.q !== current.query.q;
    this.navigate(animalListPath(state.query, state.filters), { replace: onlyFilter });
  }
}
