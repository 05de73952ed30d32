import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, afterNextRender, computed, inject, input, signal } from '@angular/core';
import { ChartPoint, linePath, linearScale, niceTicks, spread } from './chart-scale';

export interface ChartSeries {
  label: string;
  points: readonly ChartPoint[];
  /** CSS colour; the theme's primary when left out. */
  color?: string;
}

export interface ChartBand {
  from: number;
  to: number;
  label: string;
  color?: string;
}

/** Drawing width follows the element's own width (text stays 11 px on a phone); this until measured. */
const DEFAULT_WIDTH = 800;
const HEIGHT = 240;
const PAD = { left: 56, right: 16, top: 12, bottom: 28 };

/**
 * A small time-series chart in plain SVG: x in epoch milliseconds, y in the caller's unit, an
 * optional shaded range (a husbandry band). Values are in the tables beside it, so the chart
 * itself is one labelled image for screen readers.
 */
@Component({
  selector: 'tw-line-chart',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @if (hasData()) {
      <svg [attr.viewBox]="'0 0 ' + width() + ' ' + height" role="img" [attr.aria-label]="label()" preserveAspectRatio="xMidYMid meet">
        @for (band of bandRects(); track band.label) {
          <rect class="band" [attr.x]="pad.left" [attr.y]="band.y" [attr.width]="width() - pad.left - pad.right" [attr.height]="band.height" [attr.fill]="band.color" />
        }
        @for (tick of yTicks(); track tick.value) {
          <line class="grid" [attr.x1]="pad.left" [attr.x2]="width() - pad.right" [attr.y1]="tick.y" [attr.y2]="tick.y" />
          <text class="axis" [attr.x]="pad.left - 6" [attr.y]="tick.y + 4" text-anchor="end">{{ tick.text }}</text>
        }
        @for (tick of xTicks(); track $index) {
          <text class="axis" [attr.x]="tick.x" [attr.y]="height - 8" [attr.text-anchor]="tick.anchor">{{ tick.text }}</text>
        }
        @for (line of lines(); track line.label) {
          <path class="line" [attr.d]="line.d" [attr.stroke]="line.color" />
          @for (dot of line.dots; track $index) {
            <circle [attr.cx]="dot.x" [attr.cy]="dot.y" r="3" [attr.fill]="line.color"><title>{{ dot.title }}</title></circle>
          }
        }
      </svg>
      @if (series().length > 1 || bandRects().length) {
        <ul class="legend">
          @for (line of lines(); track line.label) {
            <li><span class="swatch" [style.background]="line.color"></span>{{ line.label }}</li>
          }
          @for (band of bandRects(); track band.label) {
            <li><span class="swatch band-swatch" [style.background]="band.color"></span>{{ band.label }}</li>
          }
        </ul>
      }
    } @else {
      <p class="none">{{ emptyText() }}</p>
    }
  `,
  styles: `
    :host { display: block; }
    svg { width: 100%; height: auto; display: block; }
    .grid { stroke: var(--mat-sys-outline-variant); stroke-width: 1; }
    .axis { font: 11px/1 var(--mat-sys-body-small-font, sans-serif); fill: var(--mat-sys-on-surface-variant); }
    .band { opacity: 0.16; }
    .line { fill: none; stroke-width: 2.5; stroke-linejoin: round; stroke-linecap: round; }
    .legend { display: flex; flex-wrap: wrap; gap: 4px 16px; list-style: none; margin: 4px 0 0; padding: 0 0 0 56px; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .swatch { display: inline-block; width: 12px; height: 4px; border-radius: 2px; margin-right: 6px; vertical-align: middle; }
    .band-swatch { height: 12px; opacity: 0.3; }
    .none { margin: 0; padding: 24px 0; color: var(--mat-sys-on-surface-variant); }
  `,
})
export class LineChart {
  readonly series = input.required<readonly ChartSeries[]>();
  readonly bands = input<readonly ChartBand[]>([]);
  readonly label = input.required<string>();
  readonly formatY = input<(value: number) => string>((v) => String(v));
  readonly formatX = input<(value: number) => string>((v) => new Date(v).toISOString().slice(0, 10));
  readonly emptyText = input('Nothing to chart yet.');

  protected readonly width = signal(DEFAULT_WIDTH);
  protected readonly height = HEIGHT;
  protected readonly pad = PAD;

  constructor() {
    const host: HTMLElement = inject(ElementRef).nativeElement;
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      if (typeof ResizeObserver === 'undefined') return;
      const observer = new ResizeObserver(([entry]) => {
        const measured = Math.round(entry?.contentRect.width ?? 0);
        if (measured > 0) this.width.set(Math.max(280, measured));
      });
      observer.observe(host);
      destroyRef.onDestroy(() => observer.disconnect());
    });
  }

  private readonly all = computed(() => this.series().flatMap((s) => s.points));
  protected readonly hasData = computed(() => this.all().length > 0);

  private readonly scales = computed(() => {
    const points = this.all();
    const xs = points.map((p) => p.x);
    const ys = [...points.map((p) => p.y), ...this.bands().flatMap((b) => [b.from, b.to])];
    const ticks = niceTicks(Math.min(...ys), Math.max(...ys));
    const xDomain: [number, number] = [Math.min(...xs), Math.max(...xs)];
    return {
      ticks,
      xDomain,
      sx: linearScale(xDomain, [PAD.left + 8, this.width() - PAD.right - 8]),
      sy: linearScale([ticks[0]!, ticks.at(-1)!], [HEIGHT - PAD.bottom, PAD.top]),
    };
  });

  protected readonly yTicks = computed(() => {
    const { ticks, sy } = this.scales();
    return ticks.map((value) => ({ value, y: sy(value), text: this.formatY()(value) }));
  });

  protected readonly xTicks = computed(() => {
    const { xDomain, sx } = this.scales();
    const values = spread(xDomain[0], xDomain[1], 4);
    const ticks = values.map((value, i) => ({
      x: sx(value),
      text: this.formatX()(value),
      anchor: values.length === 1 ? 'middle' : i === 0 ? 'start' : i === values.length - 1 ? 'end' : 'middle',
    }));
    // A short span puts two ticks on one day: label each day once.
    return ticks.filter((t, i) => ticks.findIndex((o) => o.text === t.text) === i);
  });

  protected readonly bandRects = computed(() => {
    const { sy } = this.scales();
    return this.bands().map((b) => ({ label: b.label, y: sy(b.to), height: Math.max(1, sy(b.from) - sy(b.to)), color: b.color ?? 'var(--mat-sys-tertiary)' }));
  });

  protected readonly lines = computed(() => {
    const { sx, sy } = this.scales();
    const palette = ['var(--mat-sys-primary)', 'var(--mat-sys-tertiary)', 'var(--mat-sys-secondary)'];
    return this.series().map((s, i) => ({
      label: s.label,
      color: s.color ?? palette[i % palette.length]!,
      d: linePath(s.points, sx, sy),
      dots: s.points.length <= 60 ? s.points.map((p) => ({ x: sx(p.x), y: sy(p.y), title: `${this.formatX()(p.x)}: ${this.formatY()(p.y)}` })) : [],
    }));
  });
}
