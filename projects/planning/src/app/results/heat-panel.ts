import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import type { RackPlanResponse } from '../shared/plan-types';
import { showLength, trimDecimals } from '../shared/plan-units';

/** Heat tape, thermostats and the circuit share, always with the electrical cautions. */
@Component({
  selector: 'tw-heat-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIcon],
  template: `
    @let h = result().heat;
    @if (h.enabled) {
      <dl class="figures">
        <div><dt>Strips</dt><dd>{{ h.strips }} × {{ length(h.stripLength) }}</dd></div>
        <div><dt>Each strip</dt><dd>{{ round(h.stripPowerW, 1) }} W</dd></div>
        <div><dt>Tape in all</dt><dd>{{ round(h.totalTapeFeet, 1) }} ft at {{ h.wattsPerFoot }} W/ft</dd></div>
        <div><dt>Total</dt><dd>{{ round(h.totalPowerW, 0) }} W, {{ round(h.currentA, 2) }} A at {{ h.supplyVoltageV }} V</dd></div>
        <div>
          <dt>Thermostats</dt>
          <dd>{{ h.thermostats }} <span class="small">(up to {{ h.stripsPerThermostat }} strips, {{ h.thermostatRatingW }} W each)</span></dd>
        </div>
      </dl>
      <table class="circuits" aria-label="Share of a branch circuit">
        <thead>
          <tr><th scope="col">Circuit</th><th scope="col" class="tw-num">Continuous limit</th><th scope="col" class="tw-num">This rack uses</th></tr>
        </thead>
        <tbody>
          @for (c of h.circuits; track c.ratingA) {
            <tr [class.over]="c.share > 1">
              <th scope="row">{{ c.ratingA }} A, {{ c.voltageV }} V</th>
              <td class="tw-num">{{ c.continuousLimitW }} W</td>
              <td class="tw-num">{{ percent(c.share) }}</td>
            </tr>
          }
        </tbody>
      </table>
    } @else {
      <p>No heat tape is planned for this rack.</p>
    }
    <div class="cautions" role="note" aria-label="Electrical cautions">
      <mat-icon aria-hidden="true">warning</mat-icon>
      <ul>
        @for (c of cautions(); track $index) {
          <li>{{ c }}</li>
        }
      </ul>
    </div>
  `,
  styles: `
    :host { display: block; }
    .figures { display: grid; grid-template-columns: repeat(auto-fill, minmax(170px, 1fr)); gap: 10px 20px; margin: 0 0 12px; }
    dt { font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    dd { margin: 0; font: var(--mat-sys-title-medium); font-variant-numeric: tabular-nums; }
    .small { font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .circuits { border-collapse: collapse; width: 100%; margin-bottom: 12px; font: var(--mat-sys-body-medium); }
    .circuits th, .circuits td { padding: 6px 8px; border-bottom: 1px solid var(--mat-sys-outline-variant); text-align: left; }
    .circuits .tw-num { text-align: right; }
    .circuits thead th { font: var(--mat-sys-label-medium); color: var(--mat-sys-on-surface-variant); }
    .over td { color: var(--mat-sys-error); font-weight: 500; }
    .cautions mat-icon { flex: none; }
    .cautions { display: flex; gap: 12px; padding: 12px 16px; border-radius: 12px; background: var(--mat-sys-secondary-container); color: var(--mat-sys-on-secondary-container); }
    .cautions ul { margin: 0; padding-left: 18px; }
    .cautions li + li { margin-top: 4px; }
  `,
})
export class HeatPanel {
  readonly result = input.required<RackPlanResponse>();

  /** The API always sends cautions; these two are said whatever it sends, since wiring is not ours to judge. */
  protected readonly cautions = computed(() => {
    const given = this.result().heat.cautions;
    const always = [
      'Follow local electrical code and defer to it over anything shown here.',
      'Have the wiring done or checked by a licensed electrician.',
    ];
    const mentions = (word: string) => given.some((c) => c.toLowerCase().includes(word));
    return [...given, ...always.filter((c) => !(c.includes('licensed') ? mentions('licensed electrician') : mentions('local electrical code')))];
  });

  protected length(value: number): string {
    return showLength(value, this.result().unit);
  }

  protected round(value: number, decimals: number): string {
    return trimDecimals(value, decimals);
  }

  protected percent(share: number): string {
    return `${Math.round(share * 100)} %`;
  }
}
