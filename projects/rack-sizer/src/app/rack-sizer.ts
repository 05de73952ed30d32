import { ChangeDetectionStrategy, Component, ViewEncapsulation, booleanAttribute, computed, effect, inject, input, signal } from '@angular/core';
import type { LengthUnit } from '@tubwright/shared/units';
import { QuoteForm } from './quote-form';
import { RackResult } from './rack-result';
import { SizerFields } from './sizer-fields';
import { SizerStore } from './sizer-store';
import { WidgetApi } from './widget-api';

/** Only a real CSS colour reaches the style, so an attribute cannot inject other declarations. */
function cssColour(value: string): string | null {
  const v = value.trim();
  if (!v || /[;{}]/.test(v)) return null;
  return globalThis.CSS?.supports?.('color', v) === false ? null : v;
}

/** Dark text on a light accent (a hex colour with relative luminance above 0.4, WCAG 2 formula), else white. */
export function textOn(colour: string | null): string | null {
  const hex = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(colour ?? '')?.[1];
  if (!hex) return null;
  const full = hex.length === 3 ? [...hex].map((c) => c + c).join('') : hex;
  const [r, g, b] = [0, 2, 4].map((i) => {
    const c = parseInt(full.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b! > 0.4 ? '#1b1b1b' : '#ffffff';
}

/**
 * `<tw-rack-sizer key="tw_pk_…" unit="in|mm" accent="#2e5e45" show-prices>`: the widget a shop puts
 * on its own site. Shadow DOM keeps the host page's styles out and the widget's in; every widget
 * has its own SizerStore, so two on one page share nothing.
 */
@Component({
  selector: 'tw-rack-sizer-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.ShadowDom,
  providers: [SizerStore],
  imports: [SizerFields, RackResult, QuoteForm],
  templateUrl: './rack-sizer.html',
  styleUrl: './rack-sizer.scss',
})
export class RackSizer {
  /** The shop's publishable key (tw_pk_…), locked to the shop's website origins. */
  readonly key = input('');
  readonly unit = input<LengthUnit, unknown>('in', { transform: (v) => (v === 'mm' ? 'mm' : 'in') });
  readonly accent = input('');
  readonly showPrices = input(false, { transform: booleanAttribute });
  /** ISO 4217 code of the shop's price list, for the estimate (default usd). */
  readonly currency = input('usd');

  /** False once the shop has said not to show prices; until it answers, the page's attribute stands. */
  private readonly shopShowsPrices = signal(true);
  protected readonly pricesShown = computed(() => this.showPrices() && this.shopShowsPrices());

  protected readonly accentColour = computed(() => cssColour(this.accent()));
  protected readonly onAccent = computed(() => textOn(this.accentColour()));

  constructor() {
    const store = inject(SizerStore);
    const api = inject(WidgetApi);
    effect(() => {
      store.key.set(this.key().trim());
      store.unit.set(this.unit());
    });
    effect(() => {
      const key = this.key().trim();
      if (!key || !this.showPrices()) return;
      // A failure here shows up on the first calculation anyway; the estimate stays as the page asked.
      api.settings(key).then((s) => this.shopShowsPrices.set(s.showPrices !== false), () => undefined);
    });
  }
}
