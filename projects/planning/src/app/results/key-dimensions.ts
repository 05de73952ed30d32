import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { DIMENSION_LABELS } from '../shared/dimension-labels';
import type { RackPlanResponse } from '../shared/plan-types';
import { showLength } from '../shared/plan-units';

/** The numbers a builder checks first, in fractions of an inch to 1/16 or in millimetres. */
@Component({
  selector: 'tw-key-dimensions',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <dl class="dims">
      @for (row of rows(); track row.key) {
        <div class="row" [attr.data-dimension]="row.key">
          <dt>{{ row.label }}@if (row.hint) {<span class="hint">{{ row.hint }}</span>}</dt>
          <dd>{{ row.value }}</dd>
        </div>
      }
    </dl>
    @if (result().sections.length > 1) {
      <p class="sections-title">Stacking sections, from the bottom</p>
      <ol class="sections">
        @for (s of result().sections; track s.index) {
          <li>
            {{ s.levels }} {{ s.levels === 1 ? 'level' : 'levels' }}: side panels {{ length(s.sidePanelHeight) }}, section {{ length(s.height) }}
            @if (s.dowels) { , {{ s.dowels }} dowels }
          </li>
        }
      </ol>
    }
  `,
  styles: `
    :host { display: block; }
    .dims { display: grid; grid-template-columns: repeat(auto-fill, minmax(180px, 1fr)); gap: 12px 20px; margin: 0; }
    .row { display: flex; flex-direction: column; gap: 2px; }
    dt { font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .hint { display: block; opacity: 0.85; }
    dd { margin: 0; font: var(--mat-sys-title-large); font-variant-numeric: tabular-nums; color: var(--mat-sys-on-surface); }
    .sections-title { margin: 16px 0 4px; font: var(--mat-sys-title-small); }
    .sections { margin: 0; padding-left: 20px; font: var(--mat-sys-body-medium); }
  `,
})
export class KeyDimensions {
  readonly result = input.required<RackPlanResponse>();

  protected readonly rows = computed(() => {
    const r = this.result();
    return DIMENSION_LABELS.map(([key, label, hint]) => ({ key, label, hint, value: showLength(r.dimensions[key], r.unit) }));
  });

  protected length(value: number): string {
    return showLength(value, this.result().unit);
  }
}
