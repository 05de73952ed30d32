import type { ApiKeyKind, ApiScope } from './api-key';

/** Scopes a publishable key may have (shared/api/api-keys.ts PUBLISHABLE_SCOPES): it lives in a web page. */
export const PUBLISHABLE_SCOPES: readonly ApiScope[] = ['calculations', 'quote-requests'];
export const ALL_SCOPES: readonly ApiScope[] = ['calculations', 'quote-requests', 'order-status'];

export function scopesFor(kind: ApiKeyKind): readonly ApiScope[] {
  return kind === 'publishable' ? PUBLISHABLE_SCOPES : ALL_SCOPES;
}

/**
 * Website origins, one per line or separated by commas or spaces. A line with a path or a trailing
 * slash is an easy slip when copying from the address bar, so it is reduced to its origin; anything
 * that is not http(s) is reported. Same rule as the API: scheme, host and port only.
 */
export function readOrigins(text: string): { origins: string[]; errors: string[] } {
  const origins: string[] = [];
  const errors: string[] = [];
  for (const part of text.split(/[\s,]+/).filter(Boolean)) {
    let url: URL;
    try {
      url = new URL(part);
    } catch {
      errors.push(`${part} is not a web address (start with https://)`);
      continue;
    }
    if (url.protocol !== 'https:' && url.protocol !== 'http:') {
      errors.push(`${part} is not an http or https address`);
      continue;
    }
    if (!origins.includes(url.origin)) origins.push(url.origin);
  }
  return { origins, errors };
}

/** Where the widget script lives: the console's own origin, since the gateway serves both. */
export const WIDGET_SCRIPT = '/widget/tw-rack-sizer.js';

/** The two lines a shop pastes into its website. */
export function widgetSnippet(gatewayOrigin: string, key: string, options: { showPrices: boolean }): string {
  const attrs = [`key="${key}"`, ...(options.showPrices ? ['show-prices'] : [])].join(' ');
  return `<script type="module" src="${gatewayOrigin}${WIDGET_SCRIPT}"></script>\n<tw-rack-sizer ${attrs}></tw-rack-sizer>`;
}
