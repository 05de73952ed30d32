import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { EmptyState, ListQuery, Session, adoptShellSession, injectShellNavigate, parseListPath, toListPath } from '@tubwright/kit';
import { CUSTOMER_LIST_DEFAULTS, CustomerList } from './customers/customer-list';

/** Routes of this module, as sub-paths the shell passes in `path`. */
const LIST_ROUTES = ['', 'customers'];

/** `<tw-orders>`: customers, and later quotes, orders and deliveries. */
@Component({
  selector: 'tw-orders-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [CustomerList, EmptyState, MatButton],
  styleUrl: './orders-element.scss',
  template: `
    @if (isList()) {
      <tw-customer-list [query]="view().query" (queryChange)="showList($event)" />
    } @else {
      <tw-empty-state icon="explore_off" heading="Orders has no page here" [hint]="'Nothing lives at “' + view().route + '”.'">
        <button mat-flat-button type="button" (click)="navigate('')">Open customers</button>
      </tw-empty-state>
    }
  `,
})
export class OrdersElement {
  readonly path = input<string | null>('');
  readonly session = input<Session | null>(null);

  protected readonly navigate = injectShellNavigate();
  protected readonly view = computed(() => parseListPath(this.path() ?? '', CUSTOMER_LIST_DEFAULTS));
  protected readonly isList = computed(() => LIST_ROUTES.includes(this.view().route));

  constructor() {
    adoptShellSession(this.session);
  }

  protected showList(query: ListQuery): void {
    const onlyFilter = query.q !== this.view().query.q;
    this.navigate(toListPath(this.view().route, query, CUSTOMER_LIST_DEFAULTS), { replace: onlyFilter });
  }
}
