import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { RackPlanResponse } from '@tubwright/shared/api/rack-plan';
import { showLength } from './calculations/plan-summary';
import { rackDrawing } from './calculations/rack-drawing';
import type { SizerValues } from './calculations/sizer-input';

/** The rack from the front, to scale, in the plan's own unit as SVG user units. */
@Component({
  selector: 'tw-rack-front-view',
  changeDetection: ChangeDetectionStrategy.OnPush,
  templateUrl: './rack-front-view.html',
})
export class RackFrontView {
  readonly plan = input.required<RackPlanResponse>();
  readonly values = input.required<SizerValues>();

  protected readonly drawing = computed(() => {
    const v = this.values();
    return rackDrawing(this.plan(), { width: v.width, height: v.height, levels: v.levels, columns: v.columns });
  });
  /** A little room around the rack so its outline is not clipped. */
  protected readonly viewBox = computed(() => {
    const d = this.drawing();
    const margin = Math.max(d.width, d.height) * 0.02;
    return `${-margin} ${-margin} ${d.width + 2 * margin} ${d.height + 2 * margin}`;
  });
  protected readonly description = computed(() => {
    const p = this.plan();
    const v = this.values();
    return `Front view to scale: ${v.levels} levels of ${v.columns} tubs, ${showLength(p.dimensions.overallWidth, p.unit)} wide and ${showLength(p.dimensions.overallHeight, p.unit)} high on casters.`;
  });
}
