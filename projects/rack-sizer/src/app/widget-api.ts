import { Injectable, InjectionToken, inject } from '@angular/core';
import type { QuoteRequestBody, QuoteRequestReceipt } from '@tubwright/shared/api/quote-requests';
import type { RackPlanRequestInput, RackPlanResponse } from '@tubwright/shared/api/rack-plan';
import type { z } from 'zod';

export type QuoteReceipt = z.output<typeof QuoteRequestReceipt>;
export type QuoteRequest = z.input<typeof QuoteRequestBody>;

/**
 * Where the shop's gateway is: the origin the widget script itself was loaded from, so the widget
 * works on any page that includes it (main.ts provides it from `import.meta.url`).
 */
export const WIDGET_API_ORIGIN = new InjectionToken<string>('WIDGET_API_ORIGIN', {
  providedIn: 'root',
  factory: () => globalThis.location?.origin ?? '',
});

/** A failure put in words a website visitor can act on; `field` names the request field at fault. */
export class WidgetError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly field?: string,
  ) {
    super(message);
    this.name = 'WidgetError';
  }
}

const MESSAGES: Record<number, string> = {
  0: 'The sizer cannot reach the shop right now. Check your connection and try again. (If you run this website: is its address listed on the shop\'s key?)',
  401: 'The shop\'s key for this sizer is not valid any more. Please tell the shop.',
  403: 'This website may not use the shop\'s sizer key. Please tell the shop.',
  429: 'Too many tries in a short time. Wait a minute and try again.',
};

/**
 * The public API as the widget uses it: plain fetch (no HttpClient: the script stays small), the
 * shop's publishable key in `X-API-Key`, no cookies.
 */
@Injectable({ providedIn: 'root' })
export class WidgetApi {
  private readonly origin = inject(WIDGET_API_ORIGIN);

  plan(key: string, spec: RackPlanRequestInput, signal?: AbortSignal): Promise<RackPlanResponse> {
    return this.post<RackPlanResponse>('/api/v1/calc/rack-plan', key, spec, {}, signal);
  }

  /** The shop's own word on showing prices; a page's `show-prices` attribute cannot overrule it. */
  async settings(key: string): Promise<{ showPrices: boolean }> {
    const res = await fetch(`${this.origin}/api/v1/quote-requests/settings`, { headers: { 'x-api-key': key }, credentials: 'omit' });
    if (!res.ok) throw new WidgetError(MESSAGES[res.status] ?? `The shop's server answered ${res.status}.`, res.status);
    return (await res.json()) as { showPrices: boolean };
  }

  /** The same idempotency key for a repeated send of the same request makes one lead, not two. */
  requestQuote(key: string, body: QuoteRequest, idempotencyKey: string): Promise<QuoteReceipt> {
    return this.post<QuoteReceipt>('/api/v1/quote-requests', key, body, { 'idempotency-key': idempotencyKey });
  }

  private async post<T>(path: string, key: string, body: unknown, headers: Record<string, string>, signal?: AbortSignal): Promise<T> {
    if (!key) throw new WidgetError('This sizer has no shop key yet. (If you run this website: add key="…" to the tw-rack-sizer tag.)', 0);
    let res: Response;
    try {
      res = await fetch(this.origin + path, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-api-key': key, ...headers },
        body: JSON.stringify(body),
        credentials: 'omit',
        signal,
      });
    } catch (err) {
      // Aborted requests are superseded by newer ones; the caller ignores them.
      if (err instanceof DOMException && err.name === 'AbortError') throw err;
      // A refused CORS preflight looks like a network failure from inside the page.
      throw new WidgetError(MESSAGES[0]!, 0);
    }
    const data = (await res.json().catch(() => null)) as unknown;
    if (res.ok) return data as T;
    const shaped = (data as { error?: { message?: unknown; field?: unknown } } | null)?.error;
    const field = typeof shaped?.field === 'string' ? shaped.field : undefined;
    const serverMessage = typeof shaped?.message === 'string' ? shaped.message : '';
    // Input problems (400, 422) are the visitor's to fix and the server's words say how; key problems are the shop's.
    const message = (res.status === 400 || res.status === 422) && serverMessage ? serverMessage : (MESSAGES[res.status] ?? `The shop's server answered ${res.status}. Try again in a moment.`);
    throw new WidgetError(message, res.status, field);
  }
}
