import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatIcon } from '@angular/material/icon';
import { ErrorBanner, PageHeader } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import type { SpeciesList } from '../core/collection-types';
import { ShellLink } from '../core/shell-link';
import { toCelsius } from './environment-range';

/** The species of the collection and the warm side, cool side and humidity each is kept at (read-only). */
@Component({
  selector: 'tw-species-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIcon, ErrorBanner, PageHeader, ShellLink],
  template: `
    <tw-page-header heading="Species" subheading="The species in the collection and the ranges they are kept at (common practice)." />

    @if (species.error()) {
      <tw-error-banner message="The species list could not be loaded." [retryable]="true" (retry)="species.reload()" />
    }
    @if (species.hasValue()) {
      @let list = species.value();
      <div class="caution" role="note">
        <mat-icon aria-hidden="true">thermostat</mat-icon>
        <p>{{ list.caution }}</p>
      </div>
      <section class="card" aria-labelledby="species-heading">
        <h2 id="species-heading">Species and husbandry ranges</h2>
        <div class="table-scroll">
          <table class="simple-table" aria-label="Species and husbandry ranges">
            <thead>
              <tr>
                <th scope="col">Species</th>
                <th scope="col" class="tw-num">Animals</th>
                <th scope="col">Warm side</th>
                <th scope="col">Cool side</th>
                <th scope="col">Humidity</th>
              </tr>
            </thead>
            <tbody>
              @for (s of list.items; track s.name) {
                <tr>
                  <th scope="row">
                    <i>{{ s.name }}</i>
                    @if (s.commonName) {
                      <span class="common">{{ s.commonName }}</span>
                    }
                  </th>
                  <td class="tw-num">
                    @if (s.animalCount) {
                      <a class="link" [twLink]="'animals?q=' + encode(s.name)">{{ s.animalCount }}</a>
                    } @else {
                      0
                    }
                  </td>
                  @if (s.ranges; as r) {
                    <td class="range">{{ r.warmF[0] }} to {{ r.warmF[1] }} °F <span class="muted">({{ celsius(r.warmF[0]) }} to {{ celsius(r.warmF[1]) }} °C)</span></td>
                    <td class="range">{{ r.coolF[0] }} to {{ r.coolF[1] }} °F <span class="muted">({{ celsius(r.coolF[0]) }} to {{ celsius(r.coolF[1]) }} °C)</span></td>
                    <td class="range">{{ r.humidityPct[0] }} to {{ r.humidityPct[1] }} %</td>
                  } @else {
                    <td colspan="3" class="muted">No ranges on record for this species: look them up for it before setting the thermostat.</td>
                  }
                </tr>
              }
            </tbody>
          </table>
        </div>
        <p class="muted">{{ list.alertRanges }} Ranges are common practice for keeping, not a guarantee for every animal: watch each one's feeding, shedding and where it chooses to sit. See the <a class="link" twLink="environment">readings</a> for each rack.</p>
      </section>
    } @else if (!species.error()) {
      <p class="muted" role="status">Loading the species…</p>
    }
  `,
  styles: `
    :host { display: block; max-width: 1040px; }
    th[scope='row'] { font: var(--mat-sys-body-medium); font-weight: 500; color: var(--mat-sys-on-surface); }
    tbody tr:last-child th { border-bottom: none; }
    .common { display: block; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .range { white-space: nowrap; font-variant-numeric: tabular-nums; }
  `,
})
export class SpeciesPage {
  private readonly api = inject(CollectionApi);
  protected readonly species = rxResource({ stream: () => this.api.get<SpeciesList>('/environment/species') });
  protected readonly encode = encodeURIComponent;
  /** °F to °C, (°F − 32) / 1.8 (NIST SP 811), shown to one decimal. */
  protected readonly celsius = (tempF: number) => toCelsius(tempF).toFixed(1);
}
