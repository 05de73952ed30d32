import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { EmptyState, ListQuery, Session, adoptShellSession, injectShellNavigate, parseListPath, toListPath } from '@tubwright/kit';
import { TUB_MODEL_LIST_DEFAULTS, TubModelList } from './tub-models/tub-model-list';

/** Routes of this module, as sub-paths the shell passes in `path`. */
const LIST_ROUTES = ['', 'tub-models'];

/** `<tw-planning>`: the planning module as the console shows it. */
@Component({
  selector: 'tw-planning-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [TubModelList, EmptyState, MatButton],
  styleUrl: './planning-element.scss',
  template: `
    @if (isList()) {
      <tw-tub-model-list [query]="view().query" (queryChange)="showList($event)" />
    } @else {
      <tw-empty-state icon="explore_off" heading="Planning has no page here" [hint]="'Nothing lives at “' + view().route + '”.'">
        <button mat-flat-button type="button" (click)="navigate('')">Open tub models</button>
      </tw-empty-state>
    }
  `,
})
export class PlanningElement {
  readonly path = input<string | null>('');
  readonly session = input<Session | null>(null);

  protected readonly navigate = injectShellNavigate();
  protected readonly view = computed(() => parseListPath(this.path() ?? '', TUB_MODEL_LIST_DEFAULTS));
  protected readonly isList = computed(() => LIST_ROUTES.includes(this.view().route));

  constructor() {
    adoptShellSession(this.session);
  }

  protected showList(query: ListQuery): void {
    const onlyFilter = query.q !== this.view().query.q;
    this.navigate(toListPath(this.view().route, query, TUB_MODEL_LIST_DEFAULTS), { replace: onlyFilter });
  }
}
