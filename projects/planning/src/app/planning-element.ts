import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { EmptyState, ListQuery, Session, adoptShellSession, injectShellNavigate } from '@tubwright/kit';
import { PlanEditor } from './plan-editor/plan-editor';
import { PlanningSection, parsePlanningPath, planListPath, sectionOf, tubModelListPath } from './planning-routes';
import { MaterialsPage } from './materials/materials-page';
import { PriceListPage } from './price-list/price-list-page';
import { PlanCompare } from './saved-plans/plan-compare';
import { PlanList } from './saved-plans/plan-list';
import { TubModelForm } from './tub-models/tub-model-form';
import { TubModelList } from './tub-models/tub-model-list';

const SECTIONS: Array<{ id: PlanningSection; path: string; label: string }> = [
  { id: 'plans', path: 'plans', label: 'Saved plans' },
  { id: 'tub-models', path: 'tub-models', label: 'Tub models' },
  { id: 'price-list', path: 'price-list', label: 'Price list' },
  { id: 'materials', path: 'materials', label: 'Materials' },
];

/** `<tw-planning>`: the planning module as the console shows it. */
@Component({
  selector: 'tw-planning-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [PlanList, PlanEditor, PlanCompare, TubModelList, TubModelForm, PriceListPage, MaterialsPage, EmptyState, MatButton],
  styleUrl: './planning-element.scss',
  template: `
    <nav class="tw-planning-nav" aria-label="Planning">
      @for (s of sections; track s.id) {
        <a [href]="'/planning/' + s.path" [attr.aria-current]="section() === s.id ? 'page' : null" (click)="follow($event, s.path)">{{ s.label }}</a>
      }
    </nav>
    @let v = view();
    @switch (v.page) {
      @case ('plans') {
        <tw-plan-list [query]="v.query" [archived]="v.archived" (queryChange)="showPlans($event.query, $event.archived)" (open)="navigate($event)" />
      }
      @case ('plan') {
        <tw-plan-editor [planId]="v.id" [tubModelId]="v.tubModelId" [navigate]="navigate" />
      }
      @case ('compare') {
        @defer {
          <tw-plan-compare [a]="v.a" [b]="v.b" [navigate]="navigate" />
        } @placeholder {
          <p role="status">Loading…</p>
        }
      }
      @case ('tub-models') {
        <tw-tub-model-list [query]="v.query" (queryChange)="showTubModels($event)" (open)="navigate($event)" />
      }
      @case ('tub-model') {
        @defer {
          <tw-tub-model-form [tubModelId]="v.id" [navigate]="navigate" />
        } @placeholder {
          <p role="status">Loading…</p>
        }
      }
      @case ('price-list') {
        @defer {
          <tw-price-list-page />
        } @placeholder {
          <p role="status">Loading…</p>
        }
      }
      @case ('materials') {
        @defer {
          <tw-materials-page />
        } @placeholder {
          <p role="status">Loading…</p>
        }
      }
      @default {
        <tw-empty-state icon="explore_off" heading="Planning has no page here" [hint]="'Nothing lives at “' + path() + '”.'">
          <button mat-flat-button type="button" (click)="navigate('')">Open saved plans</button>
        </tw-empty-state>
      }
    }
  `,
})
export class PlanningElement {
  readonly path = input<string | null>('');
  readonly session = input<Session | null>(null);

  protected readonly navigate = injectShellNavigate();
  protected readonly sections = SECTIONS;
  protected readonly view = computed(() => parsePlanningPath(this.path() ?? ''));
  protected readonly section = computed(() => sectionOf(this.view()));

  constructor() {
    adoptShellSession(this.session);
  }

  /** A plain click stays in the console; a modified one opens the link as the browser would. */
  protected follow(event: MouseEvent, path: string): void {
    if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey || event.altKey) return;
    event.preventDefault();
    this.navigate(path);
  }

  protected showPlans(query: ListQuery, archived: boolean): void {
    const current = this.view();
    const onlyFilter = current.page === 'plans' && query.q !== current.query.q;
    this.navigate(planListPath(query, archived), { replace: onlyFilter });
  }

  protected showTubModels(query: ListQuery): void {
    const current = this.view();
    const onlyFilter = current.page === 'tub-models' && query.q !== current.query.q;
    this.navigate(tubModelListPath(query), { replace: onlyFilter });
  }
}
