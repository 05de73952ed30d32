import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { EmptyState, ListQuery, Session, adoptShellSession, injectShellNavigate, parseListPath, toListPath } from '@tubwright/kit';
import { ANIMAL_LIST_DEFAULTS, AnimalList } from './animals/animal-list';

/** Routes of this module, as sub-paths the shell passes in `path`. */
const LIST_ROUTES = ['', 'animals'];

/** `<tw-collection>`: the keeper's animals as the console shows them. */
@Component({
  selector: 'tw-collection-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [AnimalList, EmptyState, MatButton],
  styleUrl: './collection-element.scss',
  template: `
    @if (isList()) {
      <tw-animal-list [query]="view().query" (queryChange)="showList($event)" />
    } @else {
      <tw-empty-state icon="explore_off" heading="The collection has no page here" [hint]="'Nothing lives at “' + view().route + '”.'">
        <button mat-flat-button type="button" (click)="navigate('')">Open the animal list</button>
      </tw-empty-state>
    }
  `,
})
export class CollectionElement {
  readonly path = input<string | null>('');
  readonly session = input<Session | null>(null);

  protected readonly navigate = injectShellNavigate();
  protected readonly view = computed(() => parseListPath(this.path() ?? '', ANIMAL_LIST_DEFAULTS));
  protected readonly isList = computed(() => LIST_ROUTES.includes(this.view().route));

  constructor() {
    adoptShellSession(this.session);
  }

  protected showList(query: ListQuery): void {
    const onlyFilter = query.q !== this.view().query.q;
    this.navigate(toListPath(this.view().route, query, ANIMAL_LIST_DEFAULTS), { replace: onlyFilter });
  }
}
