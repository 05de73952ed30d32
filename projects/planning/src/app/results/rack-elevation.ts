import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { RackPlanRequest, RackPlanResponse } from '../shared/plan-types';
import { showLength } from '../shared/plan-units';
import { DimensionLine, rackElevation } from './elevation';

/** The rack seen from the front, to scale, with its main dimension lines. */
@Component({
  selector: 'tw-rack-elevation',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @if (drawing(); as e) {
      <svg
        class="elevation"
        role="img"
        [attr.viewBox]="viewBox()"
        [attr.aria-label]="summary()"
        preserveAspectRatio="xMidYMid meet"
      >
        <title>{{ summary() }}</title>
        <g [attr.transform]="'translate(0 ' + e.height + ') scale(1 -1)'">
          <line class="floor" [attr.x1]="-e.margin / 2" y1="0" [attr.x2]="e.width + e.margin / 2" y2="0" vector-effect="non-scaling-stroke" />
          @for (s of e.shapes; track $index) {
            @if (s.kind === 'caster') {
              <g class="caster">
                <rect [attr.x]="s.x" [attr.y]="s.height * 0.8" [attr.width]="s.width" [attr.height]="s.height * 0.2" vector-effect="non-scaling-stroke" />
                <circle [attr.cx]="s.x + s.width / 2" [attr.cy]="s.height * 0.4" [attr.r]="s.height * 0.4" vector-effect="non-scaling-stroke" />
              </g>
            } @else {
              <rect [attr.class]="s.kind" [attr.x]="s.x" [attr.y]="s.y" [attr.width]="s.width" [attr.height]="s.height" vector-effect="non-scaling-stroke" />
            }
          }
        </g>
        @for (line of e.dimensions; track $index) {
          <g class="dim">
            @if (line.axis === 'x') {
              <line [attr.x1]="line.from" [attr.x2]="line.to" [attr.y1]="e.height - line.at" [attr.y2]="e.height - line.at" vector-effect="non-scaling-stroke" />
              <line [attr.x1]="line.from" [attr.x2]="line.from" [attr.y1]="e.height - line.at - tick(e)" [attr.y2]="e.height - line.at + tick(e)" vector-effect="non-scaling-stroke" />
              <line [attr.x1]="line.to" [attr.x2]="line.to" [attr.y1]="e.height - line.at - tick(e)" [attr.y2]="e.height - line.at + tick(e)" vector-effect="non-scaling-stroke" />
              <text [attr.x]="(line.from + line.to) / 2" [attr.y]="e.height - line.at - e.textSize * 0.45" text-anchor="middle" [attr.font-size]="e.textSize">{{ line.label }}</text>
            } @else {
              <line [attr.x1]="line.at" [attr.x2]="line.at" [attr.y1]="e.height - line.from" [attr.y2]="e.height - line.to" vector-effect="non-scaling-stroke" />
              <line [attr.x1]="line.at - tick(e)" [attr.x2]="line.at + tick(e)" [attr.y1]="e.height - line.from" [attr.y2]="e.height - line.from" vector-effect="non-scaling-stroke" />
              <line [attr.x1]="line.at - tick(e)" [attr.x2]="line.at + tick(e)" [attr.y1]="e.height - line.to" [attr.y2]="e.height - line.to" vector-effect="non-scaling-stroke" />
              <text
                [attr.transform]="verticalLabel(line, e.height, e.textSize)"
                text-anchor="middle"
                [attr.font-size]="e.textSize"
              >{{ line.label }}</text>
            }
          </g>
        }
      </svg>
      <ul class="legend" aria-label="Key">
        <li><span class="swatch panel"></span>panels</li>
        <li><span class="swatch tub"></span>tubs</li>
        @if (hasSupports()) {
          <li><span class="swatch support"></span>support blocks</li>
        }
        @if (hasDividers()) {
          <li><span class="swatch divider"></span>dividers</li>
        }
        <li><span class="swatch base"></span>2x4 base on casters</li>
      </ul>
    }
  `,
  styles: `
    :host { display: block; }
    .elevation { display: block; width: 100%; height: min(70vh, 620px); }
    rect { stroke: var(--mat-sys-on-surface); stroke-width: 1px; }
    .bottom, .side, .shelf, .top { fill: var(--mat-sys-surface-container-highest); }
    .tub { fill: color-mix(in srgb, var(--mat-sys-tertiary) 18%, transparent); stroke: var(--mat-sys-tertiary); }
    .support { fill: var(--mat-sys-secondary-container); stroke: var(--mat-sys-secondary); }
    .divider { fill: var(--mat-sys-surface-container-highest); }
    .base { fill: color-mix(in srgb, var(--mat-sys-primary) 25%, var(--mat-sys-surface)); }
    .caster rect, .caster circle { fill: var(--mat-sys-on-surface-variant); stroke: var(--mat-sys-on-surface); stroke-width: 1px; }
    .floor { stroke: var(--mat-sys-outline); stroke-width: 1px; stroke-dasharray: 4 3; }
    .dim line { stroke: var(--mat-sys-primary); stroke-width: 1px; }
    .dim text { fill: var(--mat-sys-on-surface); font-family: inherit; }
    .legend { display: flex; flex-wrap: wrap; gap: 4px 16px; margin: 8px 0 0; padding: 0; list-style: none; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .legend li { display: flex; align-items: center; gap: 6px; }
    .swatch { width: 14px; height: 10px; border: 1px solid var(--mat-sys-on-surface); }
    .swatch.panel { background: var(--mat-sys-surface-container-highest); }
    .swatch.tub { background: color-mix(in srgb, var(--mat-sys-tertiary) 18%, transparent); border-color: var(--mat-sys-tertiary); }
    .swatch.support { background: var(--mat-sys-secondary-container); border-color: var(--mat-sys-secondary); }
    .swatch.divider { background: var(--mat-sys-surface-container-highest); }
    .swatch.base { background: color-mix(in srgb, var(--mat-sys-primary) 25%, var(--mat-sys-surface)); }
  `,
})
export class RackElevation {
  readonly request = input.required<RackPlanRequest>();
  readonly result = input.required<RackPlanResponse>();

  protected readonly drawing = computed(() => rackElevation(this.request(), this.result()));
  protected readonly viewBox = computed(() => {
    const e = this.drawing();
    return `${-e.margin} ${-e.margin} ${e.width + 2 * e.margin} ${e.height + 2 * e.margin}`;
  });
  protected readonly hasSupports = computed(() => this.drawing().shapes.some((s) => s.kind === 'support'));
  protected readonly hasDividers = computed(() => this.drawing().shapes.some((s) => s.kind === 'divider'));
  protected readonly summary = computed(() => {
    const r = this.result();
    const levels = this.request().layout.levels;
    const columns = this.request().layout.columns;
    const sections = r.sections.length;
    return (
      `Front view of the rack, to scale: ${levels} levels of ${columns} tubs` +
      (sections > 1 ? ` in ${sections} stacking sections` : '') +
      `, ${showLength(r.dimensions.overallWidth, r.unit)} wide and ${showLength(r.dimensions.overallHeight, r.unit)} tall` +
      ` with the base; each level opens ${showLength(r.dimensions.levelOpening, r.unit)}.`
    );
  });

  protected tick(e: { textSize: number }): number {
    return e.textSize * 0.4;
  }

  protected verticalLabel(line: DimensionLine, height: number, textSize: number): string {
    const y = height - (line.from + line.to) / 2;
    // Labels left of the rack read from below, right of it from above: both sit outside the line.
    const x = line.at < 0 ? line.at - textSize * 0.45 : line.at + textSize * 0.45;
    const angle = line.at < 0 ? -90 : 90;
    return `translate(${x} ${y}) rotate(${angle})`;
  }
}
