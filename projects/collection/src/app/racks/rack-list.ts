import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { ErrorBanner, Page, PageHeader, describeApiError, injectShellNavigate } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import type { EmptyTubList, Rack } from '../core/collection-types';
import { ShellLink } from '../core/shell-link';
import { RackForm } from './rack-form';

/** Installed racks with how full they are, the empty tubs, and a form to add a rack. */
@Component({
  selector: 'tw-rack-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, ErrorBanner, PageHeader, ShellLink, RackForm],
  template: `
    <tw-page-header heading="Racks" subheading="Every installed rack, its tubs and who lives in them.">
      <button mat-stroked-button type="button" (click)="adding.set(!adding())" [attr.aria-expanded]="adding()">
        <mat-icon>add</mat-icon>Add a rack
      </button>
    </tw-page-header>

    @if (adding()) {
      <section class="card" aria-labelledby="add-rack-heading">
        <h2 id="add-rack-heading">Add a rack</h2>
        @defer {
          <tw-rack-form (created)="navigate('racks/' + $event.id)" />
        } @placeholder {
          <p class="muted" role="status">Loading…</p>
        }
      </section>
    }

    @if (racks.error()) {
      <tw-error-banner [message]="errorText(racks.error())" [retryable]="true" (retry)="racks.reload()" />
    }
    @if (racks.hasValue()) {
      @if (racks.value().items.length) {
        <ul class="racks">
          @for (rack of racks.value().items; track rack.id) {
            <li class="card rack">
              <a class="title" [twLink]="'racks/' + rack.id">
                <span class="name">{{ rack.name }}</span>
                <span class="muted">{{ rack.levels }} levels × {{ rack.columns }} tubs</span>
              </a>
              <p class="where">{{ rack.location || 'Location not written' }}</p>
              <div class="fill" role="img" [attr.aria-label]="rack.occupiedCount + ' of ' + rack.tubCount + ' tubs taken'">
                <span [style.width.%]="rack.tubCount ? (100 * rack.occupiedCount) / rack.tubCount : 0"></span>
              </div>
              <p class="muted">{{ rack.occupiedCount }} of {{ rack.tubCount }} tubs taken · {{ rack.tubCount - rack.occupiedCount }} empty</p>
              <div class="actions">
                <a mat-button [twLink]="'racks/' + rack.id">Map</a>
                <a mat-button [twLink]="'feeding/' + rack.id">Feeding day</a>
                <a mat-button [twLink]="'racks/' + rack.id + '/labels'">Labels</a>
              </div>
            </li>
          }
        </ul>
      } @else {
        <p class="none">No racks yet. Add one to give each animal a tub.</p>
      }
    }

    <section class="card" aria-labelledby="empty-heading">
      <h2 id="empty-heading">Empty tubs</h2>
      @if (empty.hasValue()) {
        @if (emptyByRack().length) {
          @for (group of emptyByRack(); track group.rack) {
            <p class="empty-row">
              <span class="code">{{ group.rack }}</span>
              @for (tub of group.tubs; track tub.id) {
                <a class="tub-chip" [twLink]="'racks/' + tub.rackId">{{ tub.label }}</a>
              }
            </p>
          }
        } @else {
          <p class="none">Every tub is taken.</p>
        }
      }
    </section>
  `,
  styles: `
    :host { display: block; }
    .racks { display: grid; grid-template-columns: repeat(auto-fill, minmax(260px, 1fr)); gap: 16px; list-style: none; margin: 0 0 16px; padding: 0; }
    .rack { margin: 0; display: flex; flex-direction: column; gap: 6px; }
    .title { display: flex; align-items: baseline; justify-content: space-between; gap: 8px; text-decoration: none; color: inherit; }
    .title:hover .name, .title:focus-visible .name { text-decoration: underline; }
    .name { font: var(--mat-sys-title-large); color: var(--mat-sys-primary); }
    .where { margin: 0; }
    .fill { height: 8px; border-radius: 4px; background: var(--mat-sys-surface-container-high); overflow: hidden; }
    .fill span { display: block; height: 100%; background: var(--mat-sys-tertiary); }
    .actions { display: flex; flex-wrap: wrap; gap: 4px; margin: 4px -8px 0; }
    .empty-row { display: flex; flex-wrap: wrap; align-items: center; gap: 6px; margin: 0 0 8px; }
    .tub-chip { padding: 2px 8px; border-radius: 6px; border: 1px dashed var(--mat-sys-outline); color: var(--mat-sys-on-surface); text-decoration: none; font-variant-numeric: tabular-nums; }
    .tub-chip:hover, .tub-chip:focus-visible { background: var(--mat-sys-surface-container); }
  `,
})
export class RackList {
  private readonly api = inject(CollectionApi);
  protected readonly navigate = injectShellNavigate();

  protected readonly racks = rxResource({ stream: () => this.api.get<Page<Rack>>('/racks', { limit: 200, sort: 'name' }) });
  protected readonly empty = rxResource({ stream: () => this.api.get<EmptyTubList>('/tubs/empty') });
  protected readonly emptyByRack = computed(() => {
    const groups = new Map<string, EmptyTubList['items']>();
    for (const tub of this.empty.hasValue() ? this.empty.value().items : []) groups.set(tub.rackName, [...(groups.get(tub.rackName) ?? []), tub]);
    return [...groups].map(([rack, tubs]) => ({ rack, tubs }));
  });

  protected readonly adding = signal(false);
  protected readonly errorText = (error: unknown) => describeApiError(error);
}
