import { DatePipe, JsonPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { ApiClient, DataTable, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';

interface AuditEntry {
  id: number;
  at: string;
  actor: string;
  action: string;
  entity: string;
  entityId: string | null;
  detail: Record<string, unknown>;
}

/** The owner's view of the audit log: who changed what, and when. */
@Component({
  selector: 'tw-activity-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, DataTable, PageHeader, DatePipe, JsonPipe],
  template: `
    <div class="page">
      <tw-page-header heading="Activity" subheading="Every change to users, keys, prices, plans, animals, orders and payments, with who made it." />
      <tw-data-table
        [query]="query()"
        [total]="list.total()"
        [loading]="list.loading()"
        [error]="list.error()"
        filterLabel="Filter by person, action or record"
        itemsLabel="changes"
        (queryChange)="query.set($event)"
        (retry)="list.reload()"
      >
        <table
          mat-table
          [dataSource]="list.items()"
          matSort
          [matSortActive]="sort().active"
          [matSortDirection]="sort().direction"
          (matSortChange)="sortBy($event)"
          aria-label="Changes"
        >
          <ng-container matColumnDef="at">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>When</th>
            <td mat-cell *matCellDef="let e" class="nowrap">{{ e.at | date: 'medium' }}</td>
          </ng-container>
          <ng-container matColumnDef="actor">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>Who</th>
            <td mat-cell *matCellDef="let e">{{ who(e.actor) }}</td>
          </ng-container>
          <ng-container matColumnDef="action">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>Did</th>
            <td mat-cell *matCellDef="let e">{{ e.action }}</td>
          </ng-container>
          <ng-container matColumnDef="entity">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>Record</th>
            <td mat-cell *matCellDef="let e">{{ e.entity }}@if (e.entityId) { <span class="id">#{{ e.entityId }}</span> }</td>
          </ng-container>
          <ng-container matColumnDef="detail">
            <th mat-header-cell *matHeaderCellDef>Detail</th>
            <td mat-cell *matCellDef="let e"><code class="detail">{{ e.detail | json }}</code></td>
          </ng-container>
          <tr mat-header-row *matHeaderRowDef="columns"></tr>
          <tr mat-row *matRowDef="let row; columns: columns"></tr>
        </table>
      </tw-data-table>
    </div>
  `,
  styles: `
    .page { padding: 24px; }
    .nowrap { white-space: nowrap; }
    .id { color: var(--mat-sys-on-surface-variant); margin-left: 4px; }
    .detail { display: block; max-width: 420px; max-height: 3.6em; overflow: hidden; text-overflow: ellipsis; font-size: 12px; white-space: pre-wrap; word-break: break-word; }
  `,
})
export class ActivityList {
  private readonly api = inject(ApiClient);
  protected readonly query = signal<ListQuery>({ q: '', sort: '-at', offset: 0, limit: 25 });
  protected readonly list = pagedList(this.query, (q) => this.api.list<AuditEntry>('/audit-log', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['at', 'actor', 'action', 'entity', 'detail'];

  /** `user:ann@shop.test` reads as the address; keys and the system keep their label. */
  protected who(actor: string): string {
    return actor.startsWith('user:') ? actor.slice(5) : actor.replace(/^api-key:/, 'key ').replace(/^gateway:/, 'system: ');
  }

  protected sortBy(sort: Sort): void {
    this.query.update((q) => ({ ...q, sort: toSortParam(sort.active, sort.direction), offset: 0 }));
  }
}
