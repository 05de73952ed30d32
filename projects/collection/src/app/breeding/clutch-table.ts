import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import type { Clutch } from '../core/collection-types';
import { formatDay } from '../core/format';
import { ShellLink } from '../core/shell-link';

/** Clutches with their incubation, expected hatch and a way to record the hatch; the breeding page also names each pairing. */
@Component({
  selector: 'tw-clutch-table',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, ShellLink],
  template: `
    <div class="table-scroll">
      <table class="simple-table" [attr.aria-label]="label()">
        <thead>
          <tr>
            @if (pairingName()) {
              <th scope="col">Pairing</th>
            }
            <th scope="col">Laid</th><th scope="col" class="tw-num">Fertile</th><th scope="col" class="tw-num">Slugs</th><th scope="col">Incubation</th><th scope="col">Expected hatch</th><th scope="col">Hatched</th>
          </tr>
        </thead>
        <tbody>
          @for (c of clutches(); track c.id) {
            <tr>
              @if (pairingName(); as name) {
                <td><a class="link" [twLink]="'breeding/pairings/' + c.pairingId">{{ name(c.pairingId) }}</a></td>
              }
              <td>{{ formatDay(c.laidOn) }}</td>
              <td class="tw-num">{{ c.fertileEggs }}</td>
              <td class="tw-num">{{ c.slugs }}</td>
              <td>{{ c.incubationTempF !== null ? c.incubationTempF + ' °F' : '—' }}{{ c.humidityPct !== null ? ', ' + c.humidityPct + ' %' : '' }}</td>
              <td>
                {{ formatDay(c.expectedHatchFrom) }} – {{ formatDay(c.expectedHatchTo) }}
                @if (c.incubationWarning) {
                  <br /><span class="status status-warn">{{ c.incubationWarning }}</span>
                }
              </td>
              <td>
                @if (c.hatchedOn) {
                  {{ formatDay(c.hatchedOn) }} ({{ c.hatchlingCount }})
                } @else {
                  <button mat-stroked-button type="button" (click)="hatch.emit(c)" [attr.aria-label]="hatchLabel(c)">Record hatch</button>
                }
              </td>
            </tr>
          }
        </tbody>
      </table>
    </div>
  `,
})
export class ClutchTable {
  readonly clutches = input.required<readonly Clutch[]>();
  readonly label = input.required<string>();
  /** Names a clutch's pairing; without it the pairing column is left out (the table sits on its pairing's page). */
  readonly pairingName = input<((pairingId: number) => string) | null>(null);
  readonly hatch = output<Clutch>();

  protected readonly formatDay = formatDay;

  protected hatchLabel(c: Clutch): string {
    const name = this.pairingName();
    return name ? `Record the hatch of ${name(c.pairingId)}, laid ${formatDay(c.laidOn)}` : `Record the hatch of the clutch laid ${formatDay(c.laidOn)}`;
  }
}
