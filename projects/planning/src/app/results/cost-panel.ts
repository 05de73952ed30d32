import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { materialName } from '../shared/material-names';
import { formatMoney } from '../shared/money';
import type { RackPlanResponse } from '../shared/plan-types';
import { showLength, trimDecimals } from '../shared/plan-units';

/** The price from the shop's price list: every line, the subtotals, margin and total. */
@Component({
  selector: 'tw-cost-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @let c = result().cost;
    <p class="total">
      <span class="label">Total with margin</span>
      <span class="amount">{{ money(c.total) }}</span>
    </p>
    <p class="sheets">Sheets to buy: {{ sheets() }}</p>
    <div class="scroller">
      <table aria-label="Cost lines">
        <thead>
          <tr>
            <th scope="col">Item</th>
            <th scope="col" class="tw-num">Quantity</th>
            <th scope="col" class="tw-num">Unit price</th>
            <th scope="col" class="tw-num">Amount</th>
          </tr>
        </thead>
        <tbody>
          @for (line of c.lines; track $index) {
            <tr>
              <td>{{ line.description }}</td>
              <td class="tw-num">{{ quantity(line.quantity) }} {{ line.unit }}</td>
              <td class="tw-num">{{ money(line.unitPrice) }}</td>
              <td class="tw-num">{{ money(line.amount) }}</td>
            </tr>
          }
        </tbody>
        <tbody class="sums">
          <tr><th scope="row" colspan="3">Materials</th><td class="tw-num">{{ money(c.subtotals.materials) }}</td></tr>
          <tr><th scope="row" colspan="3">Hardware</th><td class="tw-num">{{ money(c.subtotals.hardware) }}</td></tr>
          <tr><th scope="row" colspan="3">Heat</th><td class="tw-num">{{ money(c.subtotals.heat) }}</td></tr>
          <tr><th scope="row" colspan="3">Labor ({{ hours(c.laborMinutes) }})</th><td class="tw-num">{{ money(c.subtotals.labor) }}</td></tr>
          <tr class="strong"><th scope="row" colspan="3">Subtotal</th><td class="tw-num">{{ money(c.subtotal) }}</td></tr>
          <tr><th scope="row" colspan="3">Margin {{ c.marginPercent }} %</th><td class="tw-num">{{ money(c.margin) }}</td></tr>
          <tr class="strong"><th scope="row" colspan="3">Total</th><td class="tw-num">{{ money(c.total) }}</td></tr>
        </tbody>
      </table>
    </div>
    @for (note of c.notes; track $index) {
      <p class="note">{{ note }}</p>
    }
  `,
  styles: `
    :host { display: block; }
    .total { display: flex; align-items: baseline; justify-content: space-between; margin: 0 0 4px; }
    .label { font: var(--mat-sys-title-small); }
    .amount { font: var(--mat-sys-headline-small); font-variant-numeric: tabular-nums; }
    .sheets, .note { margin: 0 0 12px; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .scroller { overflow-x: auto; }
    table { width: 100%; border-collapse: collapse; font: var(--mat-sys-body-medium); }
    th, td { padding: 5px 8px; border-bottom: 1px solid var(--mat-sys-outline-variant); text-align: left; }
    .tw-num { text-align: right; }
    thead th { font: var(--mat-sys-label-medium); color: var(--mat-sys-on-surface-variant); }
    .sums th { font-weight: 400; }
    .strong th, .strong td { font-weight: 600; }
    .note { margin-top: 8px; }
  `,
})
export class CostPanel {
  readonly result = input.required<RackPlanResponse>();

  protected readonly sheets = computed(() => {
    const r = this.result();
    return r.cost.sheets
      .map((s) => `${s.count} × ${materialName(s.material)} ${showLength(s.thickness, r.unit)}${s.method === 'area-estimate' ? ' (estimated from area)' : ''}`)
      .join(', ');
  });

  protected money(amount: number): string {
    return formatMoney(amount);
  }

  protected quantity(value: number): string {
    return trimDecimals(value, 2);
  }

  protected hours(minutes: number): string {
    return `${trimDecimals(minutes / 60, 1)} h`;
  }
}
