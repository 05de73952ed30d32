import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, Page, PageHeader, describeApiError, injectShellNavigate } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import type { DigestResponse, DueAnimal, DueList as DueListData, Rack } from '../core/collection-types';
import { formatDay, formatGrams, todayUtc } from '../core/format';
import { ShellLink } from '../core/shell-link';

/** Who is due to eat on a day, rack by rack, with refusal and weight-loss flags; the way into feeding day. */
@Component({
  selector: 'tw-due-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [NgTemplateOutlet, MatButton, MatIcon, MatFormFieldModule, MatInput, ErrorBanner, PageHeader, ShellLink],
  template: `
    <tw-page-header heading="Feeding day" subheading="Who is due to eat, by rack. Pick a rack to record results with the keyboard.">
      <button mat-stroked-button type="button" (click)="sendDigest()" [disabled]="sending()"><mat-icon>mail</mat-icon>E-mail this list to the keepers</button>
    </tw-page-header>

    <div class="form-row top">
      <mat-form-field appearance="outline" subscriptSizing="dynamic" class="date">
        <mat-label>Feeding day</mat-label>
        <input matInput type="date" [value]="day()" (change)="pickDay($any($event.target).value)" />
      </mat-form-field>
      @if (list.hasValue()) {
        <p class="total"><b>{{ list.value().total }}</b> due on {{ formatDay(list.value().date) }}</p>
      }
      <div class="racks" role="group" aria-label="Feeding day for a rack">
        @for (rack of racks(); track rack.id) {
          <a mat-flat-button [twLink]="'feeding/' + rack.id"><mat-icon>restaurant</mat-icon>Feed {{ rack.name }}</a>
        }
      </div>
    </div>
    @if (digest(); as message) {
      <p class="notice" role="status">{{ message }}</p>
    }
    @if (list.error()) {
      <tw-error-banner [message]="errorText(list.error())" [retryable]="true" (retry)="list.reload()" />
    }

    @if (list.hasValue()) {
      @for (group of list.value().racks; track group.rackId) {
        <section class="card" [attr.aria-labelledby]="'due-rack-' + group.rackId">
          <div class="card-head">
            <h2 [id]="'due-rack-' + group.rackId">Rack {{ group.rackName }} · {{ group.animals.length }} due</h2>
            <a mat-button [twLink]="'feeding/' + group.rackId">Feeding day for {{ group.rackName }}</a>
          </div>
          <ng-container *ngTemplateOutlet="table; context: { $implicit: group.animals }" />
        </section>
      }
      @if (list.value().unplaced.length) {
        <section class="card" aria-labelledby="due-unplaced">
          <h2 id="due-unplaced">In no tub · {{ list.value().unplaced.length }} due</h2>
          <ng-container *ngTemplateOutlet="table; context: { $implicit: list.value().unplaced }" />
        </section>
      }
      @if (list.value().total === 0) {
        <p class="none">Nobody is due on this day.</p>
      }
    }

    <ng-template #table let-animals>
      <div class="table-scroll">
        <table class="simple-table">
          <thead>
            <tr>
              <th scope="col">Tub</th><th scope="col">Animal</th><th scope="col">Stage</th><th scope="col">Last fed</th>
              <th scope="col">Due</th><th scope="col" class="tw-num">Latest weight</th><th scope="col" class="tw-num">Prey about</th><th scope="col">Flags</th>
            </tr>
          </thead>
          <tbody>
            @for (a of asDue(animals); track a.animalId) {
              <tr>
                <td class="code">{{ a.tubLabel ?? '—' }}</td>
                <td><a class="link" [twLink]="'animals/' + a.animalId">{{ a.code }}</a> {{ a.name }}</td>
                <td>{{ a.stage }}, every {{ a.intervalDays }} days</td>
                <td>{{ a.lastFedAt ? formatDay(a.lastFedAt) + (a.lastResult ? ' (' + a.lastResult + ')' : '') : 'never' }}</td>
                <td>{{ a.daysOverdue > 0 ? a.daysOverdue + (a.daysOverdue === 1 ? ' day' : ' days') + ' overdue' : 'today' }}</td>
                <td class="tw-num">{{ formatGrams(a.latestWeightG) }}</td>
                <td class="tw-num">{{ formatGrams(a.suggestedPreyMassG) }}</td>
                <td>
                  @if (a.refusalFlag) {
                    <span class="status status-warn">refused {{ a.refusalStreak }} in a row</span>
                  }
                  @if (a.weightLossFlag) {
                    <span class="status status-warn">down {{ a.weightLossPct }} %</span>
                  }
                </td>
              </tr>
            }
          </tbody>
        </table>
      </div>
    </ng-template>
    <p class="muted foot">Intervals by age (common practice, from memory): hatchlings every 5 to 7 days, adults every 10 to 14; prey about 10 % of body mass. Flags: three refusals in a row, or 10 % weight lost.</p>
  `,
  styles: `
    :host { display: block; }
    .top { margin-bottom: 16px; }
    .date { flex: 0 0 190px !important; }
    .total { margin: 0; font: var(--mat-sys-title-medium); }
    .racks { display: flex; flex-wrap: wrap; gap: 8px; margin-left: auto; }
    .notice { padding: 8px 16px; border-radius: 12px; background: var(--mat-sys-tertiary-container); color: var(--mat-sys-on-tertiary-container); }
    .status + .status { margin-left: 4px; }
    .foot { margin-top: 8px; }
  `,
})
export class DueList {
  readonly date = input<string | null>(null);

  private readonly api = inject(CollectionApi);
  private readonly navigate = injectShellNavigate();
  protected readonly day = computed(() => this.date() ?? todayUtc());
  protected readonly list = rxResource({ params: () => this.date(), stream: ({ params }) => this.api.get<DueListData>('/feeding/due', { date: params }) });
  private readonly rackList = rxResource({ stream: () => this.api.get<Page<Rack>>('/racks', { limit: 200, sort: 'name' }) });
  protected readonly racks = computed(() => (this.rackList.hasValue() ? this.rackList.value().items.filter((r) => r.occupiedCount > 0) : []));
  protected readonly sending = signal(false);
  protected readonly digest = signal('');
  protected readonly formatDay = formatDay;
  protected readonly formatGrams = formatGrams;
  protected readonly errorText = (error: unknown) => describeApiError(error);
  protected readonly asDue = (animals: unknown) => animals as DueAnimal[];

  protected pickDay(value: string): void {
    this.navigate(value && value !== todayUtc() ? `feeding?date=${value}` : 'feeding', { replace: true });
  }

  protected sendDigest(): void {
    this.sending.set(true);
    this.api.post<DigestResponse>('/feeding/digest', this.date() ? { date: this.date() } : {}).subscribe({
      next: (r) => {
        this.sending.set(false);
        this.digest.set(`Sent the list of ${r.dueCount} due (${r.flaggedCount} flagged) to ${r.sentTo.join(', ')}.`);
      },
      error: (error: unknown) => {
        this.sending.set(false);
        this.digest.set(describeApiError(error));
      },
    });
  }
}
