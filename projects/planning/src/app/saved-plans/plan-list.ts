import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { AuthSession, DataTable, ErrorBanner, ListQuery, PageHeader, describeApiError, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { comparePath } from '../planning-routes';
import { formatMoney } from '../shared/money';
import { PlanApi } from '../shared/plan-api';
import type { PlanListItem } from '../shared/plan-types';
import { showLength } from '../shared/plan-units';

/** Saved plans with search, sort and paging; archive and bring back; open one in the editor. */
@Component({
  selector: 'tw-plan-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatButton, DataTable, PageHeader, ErrorBanner],
  templateUrl: './plan-list.html',
  styleUrl: './plan-list.scss',
})
export class PlanList {
  readonly query = input.required<ListQuery>();
  readonly archived = input(false);
  readonly queryChange = output<{ query: ListQuery; archived: boolean }>();
  readonly open = output<string>();

  private readonly api = inject(PlanApi);
  private readonly auth = inject(AuthSession);
  protected readonly canWrite = computed(() => ['owner', 'builder'].includes(this.auth.role() ?? ''));
  /** A fresh query object when the filter or the archived switch changes, so the list reloads on either. */
  private readonly requestQuery = computed<ListQuery>(() => {
    this.archived();
    return { ...this.query() };
  });
  protected readonly list = pagedList(this.requestQuery, (q) => this.api.list(q, this.archived() ? 'archived' : 'active'));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['name', 'tubModelName', 'rack', 'sheets', 'total', 'checks', 'updatedAt', 'actions'];
  protected readonly busyId = signal<number | null>(null);
  protected readonly failure = signal<string | null>(null);

  /** Plans ticked for comparing, in the order ticked (the first is A); kept while the list is searched or paged. */
  protected readonly picked = signal<Array<{ id: number; name: string }>>([]);

  protected isPicked(plan: PlanListItem): boolean {
    return this.picked().some((p) => p.id === plan.id);
  }

  protected pick(plan: PlanListItem, on: boolean): void {
    this.picked.update((list) => {
      const rest = list.filter((p) => p.id !== plan.id);
      return on && rest.length < 2 ? [...rest, { id: plan.id, name: plan.name }] : rest;
    });
  }

  protected unpick(id: number): void {
    this.picked.update((list) => list.filter((p) => p.id !== id));
  }

  protected compare(): void {
    const [a, b] = this.picked();
    if (a && b) this.open.emit(comparePath(a.id, b.id));
  }

  protected sortBy(sort: Sort): void {
    this.queryChange.emit({ query: { ...this.query(), sort: toSortParam(sort.active, sort.direction), offset: 0 }, archived: this.archived() });
  }

  protected showArchived(archived: boolean): void {
    this.queryChange.emit({ query: { ...this.query(), offset: 0 }, archived });
  }

  protected size(plan: PlanListItem): string {
    const s = plan.summary;
    return `${showLength(s.overallWidth, plan.unit)} wide × ${showLength(s.overallHeight, plan.unit)} tall`;
  }

  protected money(amount: number): string {
    return formatMoney(amount);
  }

  protected date(iso: string): string {
    return new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });
  }

  protected openPlan(event: MouseEvent, plan: PlanListItem): void {
    if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey) return;
    event.preventDefault();
    this.open.emit(`plans/${plan.id}`);
  }

  protected setStatus(plan: PlanListItem, status: 'active' | 'archived'): void {
    this.busyId.set(plan.id);
    this.failure.set(null);
    this.api.update(plan.id, { status }).subscribe({
      next: () => {
        this.busyId.set(null);
        this.list.reload();
      },
      error: (error: unknown) => {
        this.busyId.set(null);
        this.failure.set(describeApiError(error));
      },
    });
  }
}
