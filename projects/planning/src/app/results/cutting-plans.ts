import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { fromInches } from '@tubwright/shared/units';
import { materialName } from '../shared/material-names';
import type { CuttingPlan, RackPlanResponse } from '../shared/plan-types';
import { showLength } from '../shared/plan-units';

export interface MaterialCutting {
  title: string;
  kind: 'sheet' | 'board';
  used: string;
  verdict: string;
  optimal: boolean;
  yieldPercent: string;
  diagrams: Array<{ src: string; caption: string; alt: string }>;
}

/** How far a plan is from the lower bound, in words: "optimal" or "2 above the best possible". */
export function boundVerdict(stockUsed: number, lowerBound: number): string {
  const above = stockUsed - lowerBound;
  return above <= 0 ? 'optimal' : `${above} above the best possible`;
}

/** The cutting plan per material: one diagram per distinct layout, drawn by the API. */
export function materialCuttings(cutting: CuttingPlan, parts: RackPlanResponse['parts']): MaterialCutting[] {
  let svgIndex = 0;
  return cutting.materials.map((m) => {
    const thicknessIn = Number(m.material.split('@')[1]);
    const thickness = Number.isFinite(thicknessIn) ? ` ${showLength(fromInches(thicknessIn, cutting.unit), cutting.unit)}` : '';
    const noun = m.kind === 'sheet' ? 'sheet' : 'board';
    let first = 1;
    const diagrams = m.layouts.map((layout) => {
      const svg = cutting.svg[svgIndex++] ?? '';
      const last = first + layout.count - 1;
      const which = layout.count === 1 ? `${capital(noun)} ${first}` : `${capital(noun)}s ${first}–${last} (cut alike)`;
      first = last + 1;
      const size = stockSize(svg, cutting.unit, m.kind);
      const numbers = [...new Set(layout.placements.map((p) => p.part + 1))].sort((a, b) => a - b);
      const names = numbers.map((n) => `${n} ${parts[n - 1]?.name ?? ''}`.trim());
      return {
        src: svg ? `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}` : '',
        caption: size ? `${which}, ${size}` : which,
        alt: `${which}: parts ${names.join(', ')}`,
      };
    });
    return {
      title: `${materialName(m.material)}${thickness}`,
      kind: m.kind,
      used: `${m.stockUsed} ${noun}${m.stockUsed === 1 ? '' : 's'}`,
      verdict: boundVerdict(m.stockUsed, m.lowerBound),
      optimal: m.optimal,
      yieldPercent: `${Math.round(m.yield * 100)} %`,
      diagrams,
    };
  });
}

/** Stock size from the drawing's viewBox (the response names stock by index only). */
function stockSize(svg: string, unit: 'in' | 'mm', kind: 'sheet' | 'board'): string {
  const box = /viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg);
  if (!box) return '';
  const [length, width] = [Number(box[1]), Number(box[2])];
  // Boards are drawn with a nominal face height: only their length is a stock size.
  return kind === 'sheet' ? `${showLength(length, unit)} × ${showLength(width, unit)}` : showLength(length, unit);
}

const capital = (word: string) => word.charAt(0).toUpperCase() + word.slice(1);

/** Sheets and boards with their layouts, the sheets used against the lower bound, and the yield. */
@Component({
  selector: 'tw-cutting-plans',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @if (materials(); as list) {
      <p class="intro">Numbers on the parts are the numbers in the parts list. Hatched areas are offcuts worth keeping.</p>
      @for (m of list; track m.title) {
        <section class="material" [attr.aria-label]="m.title">
          <header>
            <h3>{{ m.title }}</h3>
            <p class="figures">
              <span class="used">{{ m.used }}</span>
              <span class="verdict" [class.optimal]="m.optimal">{{ m.verdict }}</span>
              <span>yield {{ m.yieldPercent }}</span>
            </p>
          </header>
          <div class="diagrams" [class.boards]="m.kind === 'board'">
            @for (d of m.diagrams; track $index) {
              <figure>
                <img class="cutting-diagram" [src]="d.src" [alt]="d.alt" loading="lazy" />
                <figcaption>{{ d.caption }}</figcaption>
              </figure>
            }
          </div>
        </section>
      }
      @if (timedOut()) {
        <p class="note">The search stopped at its time limit; the layouts are the best found, and the lower bound says how far from perfect they may be.</p>
      }
    } @else {
      <p class="note">No cutting plan with this result.</p>
    }
  `,
  styles: `
    :host { display: block; }
    .intro, .note { margin: 0 0 12px; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .material + .material { margin-top: 20px; }
    header { display: flex; flex-wrap: wrap; align-items: baseline; justify-content: space-between; gap: 4px 16px; }
    h3 { margin: 0; font: var(--mat-sys-title-small); }
    .figures { display: flex; flex-wrap: wrap; gap: 4px 12px; margin: 0; font: var(--mat-sys-body-medium); }
    .used { font-weight: 500; }
    .verdict { color: var(--mat-sys-on-surface-variant); }
    .verdict.optimal { color: var(--mat-sys-tertiary); font-weight: 500; }
    .diagrams { display: grid; grid-template-columns: repeat(auto-fill, minmax(260px, 1fr)); gap: 12px; margin-top: 8px; }
    .diagrams.boards { grid-template-columns: 1fr; }
    figure { margin: 0; }
    img { display: block; width: 100%; height: auto; border-radius: 4px; background: #fff; }
    figcaption { margin-top: 4px; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
  `,
})
export class CuttingPlans {
  readonly result = input.required<RackPlanResponse>();

  protected readonly materials = computed(() => {
    const r = this.result();
    return r.cutting ? materialCuttings(r.cutting, r.parts) : null;
  });
  protected readonly timedOut = computed(() => this.result().cutting?.timedOut ?? false);
}
