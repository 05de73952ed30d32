import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { formatMoney, notableChecks, sheetLines, showLength } from './calculations/plan-summary';
import { RackFrontView } from './rack-front-view';
import { SizerStore } from './sizer-store';

/** The rack for the visitor's tub: outside size, a front view to scale, sheets and, if allowed, a price. */
@Component({
  selector: 'tw-rack-result',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RackFrontView],
  templateUrl: './rack-result.html',
})
export class RackResult {
  readonly showPrices = input(false);
  readonly currency = input('usd');

  private readonly store = inject(SizerStore);
  protected readonly state = this.store.planState;

  protected readonly view = computed(() => {
    const { plan, values } = this.state();
    if (!plan || !values) return null;
    const d = plan.dimensions;
    const sheets = sheetLines(plan);
    return {
      plan,
      values,
      width: showLength(d.overallWidth, plan.unit),
      height: showLength(d.overallHeight, plan.unit),
      depth: showLength(d.overallDepth, plan.unit),
      opening: showLength(d.levelOpening, plan.unit),
      sheets,
      sheetCount: sheets.reduce((n, s) => n + s.count, 0),
      price: formatMoney(plan.cost.total, this.currency()),
      checks: notableChecks(plan),
      heat: plan.heat.enabled,
    };
  });

  /** One sentence for screen readers whenever the answer changes (the details stay quiet). */
  protected readonly announcement = computed(() => {
    const v = this.view();
    const state = this.state();
    if (state.loading) return 'Calculating…';
    if (!v) return '';
    const price = this.showPrices() ? ` Estimate ${v.price} before tax.` : '';
    return `Rack for ${v.values.levels * v.values.columns} tubs: ${v.width} wide, ${v.height} high, ${v.depth} deep; ${v.sheetCount} sheets.${price}`;
  });
}
