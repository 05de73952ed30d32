import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import type { RackCheck, RackPlanResponse } from '../shared/plan-types';
import { massUnitOf, showLength, showMass, trimDecimals } from '../shared/plan-units';

const SEVERITY: Record<RackCheck['severity'], { icon: string; label: string; rank: number }> = {
  danger: { icon: 'dangerous', label: 'Do not build as is', rank: 0 },
  warning: { icon: 'warning', label: 'Act on this', rank: 1 },
  info: { icon: 'check_circle', label: 'Fine', rank: 2 },
};

/** Checks in plain words, worst first, each with the rule and source behind it; then the load figures. */
@Component({
  selector: 'tw-checks-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIcon],
  template: `
    <ul class="checks">
      @for (c of checks(); track $index) {
        <li [class]="c.severity">
          <mat-icon aria-hidden="true">{{ severity[c.severity].icon }}</mat-icon>
          <div>
            <p class="message"><span class="visually-hidden">{{ severity[c.severity].label }}: </span>{{ c.message }}</p>
            <p class="basis">Basis: {{ c.basis }}</p>
          </div>
        </li>
      }
    </ul>

    @let l = result().loads;
    <details>
      <summary>Loads and shelf sag</summary>
      <dl class="figures">
        <div><dt>Empty rack</dt><dd>{{ mass(l.emptyMassLb, l.emptyMassKg) }}</dd></div>
        <div><dt>Loaded tubs</dt><dd>{{ mass(l.tubsMassLb, l.tubsMassKg) }}</dd></div>
        <div><dt>Per caster</dt><dd>{{ mass(l.loadPerCasterLb, l.loadPerCasterKg) }} of {{ mass(l.casterRatingLb, l.casterRatingKg) }}</dd></div>
        <div><dt>Height to depth</dt><dd>{{ ratio(l.heightToDepth) }}</dd></div>
        <div><dt>Sag without support blocks</dt><dd>{{ length(l.sagUnsupported) }} over {{ length(l.longestSpanUnsupported) }}</dd></div>
        <div>
          <dt>Sag with support blocks</dt>
          <dd>{{ l.sagSupported === null ? 'no place for a block' : length(l.sagSupported) + ' over ' + length(l.longestSpanSupported) }}</dd>
        </div>
      </dl>
      <table class="levels" aria-label="Lid gap per level after sag">
        <thead>
          <tr>
            <th scope="col">Level</th>
            <th scope="col" class="tw-num">Floor sag</th>
            <th scope="col" class="tw-num">Ceiling sag</th>
            <th scope="col" class="tw-num">Lid gap</th>
          </tr>
        </thead>
        <tbody>
          @for (g of levelGaps(); track g.level) {
            <tr>
              <th scope="row">{{ g.level }}</th>
              <td class="tw-num">{{ g.floorSag }}</td>
              <td class="tw-num">{{ g.ceilingSag }}</td>
              <td class="tw-num">{{ g.lidGap }}</td>
            </tr>
          }
        </tbody>
      </table>
      <p class="basis">Sag is shown to 1/16 in; the lid gap uses the exact sag. Shelves use the {{ l.shelfModulusHeated ? 'heated' : 'room-temperature' }} modulus of {{ l.shelfModulusMPa }} MPa.</p>
    </details>
  `,
  styles: `
    :host { display: block; }
    .checks { margin: 0; padding: 0; list-style: none; display: grid; gap: 10px; }
    .checks mat-icon { flex: none; }
    .checks li { display: flex; gap: 12px; align-items: flex-start; padding: 10px 12px; border-radius: 12px; background: var(--mat-sys-surface-container); }
    .checks li.warning { background: var(--mat-sys-secondary-container); }
    .checks li.danger { background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }
    .info mat-icon { color: var(--mat-sys-tertiary); }
    .warning mat-icon { color: var(--mat-sys-secondary); }
    .danger mat-icon { color: var(--mat-sys-error); }
    .message { margin: 0; font: var(--mat-sys-body-medium); }
    .basis { margin: 4px 0 0; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    details { margin-top: 16px; }
    summary { cursor: pointer; font: var(--mat-sys-title-small); padding: 4px 0; }
    .figures { display: grid; grid-template-columns: repeat(auto-fill, minmax(200px, 1fr)); gap: 8px 20px; margin: 8px 0 12px; }
    dt { font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    dd { margin: 0; font-variant-numeric: tabular-nums; }
    .levels { border-collapse: collapse; font: var(--mat-sys-body-small); }
    .levels th, .levels td { padding: 3px 10px; border-bottom: 1px solid var(--mat-sys-outline-variant); text-align: left; }
    .levels .tw-num { text-align: right; }
    .visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
  `,
})
export class ChecksPanel {
  readonly result = input.required<RackPlanResponse>();

  protected readonly severity = SEVERITY;
  protected readonly checks = computed(() => [...this.result().checks].sort((a, b) => SEVERITY[a.severity].rank - SEVERITY[b.severity].rank));
  protected readonly levelGaps = computed(() =>
    [...this.result().loads.levels].reverse().map((g) => ({
      level: g.level,
      floorSag: this.length(g.floorSag),
      ceilingSag: this.length(g.ceilingSag),
      lidGap: this.length(g.lidGap),
    })),
  );

  protected length(value: number | null): string {
    return showLength(value, this.result().unit);
  }

  protected mass(lb: number, kg: number): string {
    const unit = massUnitOf(this.result().unit);
    return showMass(unit === 'lb' ? lb : kg, unit);
  }

  protected ratio(value: number): string {
    return `${trimDecimals(value, 2)} : 1`;
  }
}
