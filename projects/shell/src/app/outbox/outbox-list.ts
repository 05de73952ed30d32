import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { ApiClient, DataTable, ListQuery, PageHeader, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { MailSummary, recipients } from './mail';

/** Messages the shop has sent, as the local mail catcher received them. */
@Component({
  selector: 'tw-outbox-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, DataTable, PageHeader, RouterLink, DatePipe],
  template: `
    <div class="page">
      <tw-page-header heading="Outbox" subheading="E-mail the shop has sent, caught locally so nothing leaves this machine." />
      <tw-data-table
        [query]="query()"
        [total]="list.total()"
        [loading]="list.loading()"
        [error]="list.error()"
        filterLabel="Filter by subject or address"
        itemsLabel="messages"
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
          aria-label="Sent messages"
        >
          <ng-container matColumnDef="receivedAt">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>Sent</th>
            <td mat-cell *matCellDef="let m" class="nowrap">{{ m.receivedAt | date: 'medium' }}</td>
          </ng-container>
          <ng-container matColumnDef="to">
            <th mat-header-cell *matHeaderCellDef>To</th>
            <td mat-cell *matCellDef="let m">{{ recipients(m.to) }}</td>
          </ng-container>
          <ng-container matColumnDef="subject">
            <th mat-header-cell *matHeaderCellDef mat-sort-header>Subject</th>
            <td mat-cell *matCellDef="let m">
              <a [routerLink]="['/outbox', m.id]">{{ m.subject || '(no subject)' }}</a>
            </td>
          </ng-container>
          <ng-container matColumnDef="from">
            <th mat-header-cell *matHeaderCellDef>From</th>
            <td mat-cell *matCellDef="let m">{{ m.from }}</td>
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
    a { color: var(--mat-sys-primary); font-weight: 500; }
  `,
})
export class OutboxList {
  private readonly api = inject(ApiClient);
  protected readonly query = signal<ListQuery>({ q: '', sort: '-receivedAt', offset: 0, limit: 25 });
  protected readonly list = pagedList(this.query, (q) => this.api.list<MailSummary>('/mail/messages', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['receivedAt', 'to', 'subject', 'from'];
  protected readonly recipients = recipients;

  protected sortBy(sort: Sort): void {
    this.query.update((q) => ({ ...q, sort: toSortParam(sort.active, sort.direction), offset: 0 }));
  }
}
