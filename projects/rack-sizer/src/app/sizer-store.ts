import { DestroyRef, Injectable, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed, toObservable } from '@angular/core/rxjs-interop';
import type { RackPlanRequestInput, RackPlanResponse } from '@tubwright/shared/api/rack-plan';
import type { LengthUnit } from '@tubwright/shared/units';
import { Observable, debounceTime, distinctUntilChanged, of, switchMap } from 'rxjs';
import { EMPTY_TEXT, type SizerField, type SizerText, type SizerValues, rackSpec, readSizer, sizerFieldOf } from './calculations/sizer-input';
import { type QuoteReceipt, WidgetApi, WidgetError } from './widget-api';

export interface PlanState {
  /** The last plan the calculator answered, kept on screen while a newer one loads. */
  plan: RackPlanResponse | null;
  spec: RackPlanRequestInput | null;
  values: SizerValues | null;
  loading: boolean;
  error: string | null;
  /** The sizer field a calculator error concerns, if any. */
  errorField: SizerField | null;
}

export interface Contact {
  name: string;
  email: string;
  phone?: string;
  note: string;
}

export type QuoteState =
  | { status: 'editing'; error: string | null; field: string | null }
  | { status: 'sending' }
  | { status: 'sent'; receipt: QuoteReceipt };

const IDLE: PlanState = { plan: null, spec: null, values: null, loading: false, error: null, errorField: null };
/** Typing pauses this long before the calculator is asked (one request per pause, not per key). */
const TYPING_PAUSE_MS = 350;

/**
 * One widget's state: what the visitor typed, the plan for it and the quote request. Provided by
 * each `<tw-rack-sizer>` itself, so two widgets on a page share nothing.
 */
@Injectable()
export class SizerStore {
  private readonly api = inject(WidgetApi);
  private readonly destroyRef = inject(DestroyRef);

  readonly key = signal('');
  readonly unit = signal<LengthUnit>('in');
  readonly text = signal<SizerText>(EMPTY_TEXT);
  readonly touched = signal<Partial<Record<SizerField, boolean>>>({});
  readonly reading = computed(() => readSizer(this.text(), this.unit()));
  readonly planState = signal<PlanState>(IDLE);
  readonly quoteState = signal<QuoteState>({ status: 'editing', error: null, field: null });
  private idempotency: { body: string; key: string } | null = null;

  constructor() {
    const request = computed(() => {
      const values = this.reading().values;
      return { key: this.key(), values, spec: values ? rackSpec(values, this.unit()) : null };
    });
    toObservable(request)
      .pipe(
        debounceTime(TYPING_PAUSE_MS),
        // "6.5" and "6 1/2" are the same tub: ask once.
        distinctUntilChanged((a, b) => a.key === b.key && JSON.stringify(a.spec) === JSON.stringify(b.spec)),
        switchMap(({ key, values, spec }) => (spec && values ? this.fetchPlan(key, spec, values) : of(IDLE))),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe((state) => this.planState.set(state));
  }

  /** Field error to show: after the visitor left the field, or the calculator's own objection. */
  errorOf(field: SizerField): string | null {
    const own = this.touched()[field] ? this.reading().errors[field] : undefined;
    if (own) return own;
    const state = this.planState();
    return state.errorField === field && !state.loading ? state.error : null;
  }

  update(field: SizerField, value: string): void {
    this.text.update((t) => ({ ...t, [field]: value }));
  }

  touch(field: SizerField): void {
    this.touched.update((t) => ({ ...t, [field]: true }));
  }

  /** Sends the shown rack with the visitor's contact; a repeat of the same request reuses its idempotency key. */
  async requestQuote(contact: Contact): Promise<void> {
    const spec = this.planState().spec;
    if (!spec || this.quoteState().status === 'sending') return;
    const body = { ...contact, consent: true as const, spec, source: pageAddress() };
    const bodyText = JSON.stringify(body);
    if (this.idempotency?.body !== bodyText) this.idempotency = { body: bodyText, key: randomKey() };
    this.quoteState.set({ status: 'sending' });
    try {
      const receipt = await this.api.requestQuote(this.key(), body, this.idempotency.key);
      this.quoteState.set({ status: 'sent', receipt });
    } catch (err) {
      const error = err instanceof WidgetError ? err : new WidgetError(String(err), 0);
      this.quoteState.set({ status: 'editing', error: error.message, field: error.field ?? null });
    }
  }

  /** Back to the form for another request (another rack, another person). */
  newQuote(): void {
    this.quoteState.set({ status: 'editing', error: null, field: null });
  }

  private fetchPlan(key: string, spec: RackPlanRequestInput, values: SizerValues): Observable<PlanState> {
    const previous = this.planState();
    return new Observable<PlanState>((subscriber) => {
      subscriber.next({ ...previous, loading: true });
      const abort = new AbortController();
      this.api.plan(key, spec, abort.signal).then(
        (plan) => {
          subscriber.next({ plan, spec, values, loading: false, error: null, errorField: null });
          subscriber.complete();
        },
        (err: unknown) => {
          if (abort.signal.aborted) return;
          const error = err instanceof WidgetError ? err : new WidgetError(String(err), 0);
          subscriber.next({ ...IDLE, error: error.message, errorField: sizerFieldOf(error.field) });
          subscriber.complete();
        },
      );
      return () => abort.abort();
    });
  }
}

function pageAddress(): string {
  const loc = globalThis.location;
  return loc ? `${loc.origin}${loc.pathname}`.slice(0, 300) : '';
}

/** crypto.randomUUID exists only on secure pages; a shop's test page may be plain http. */
function randomKey(): string {
  const c = globalThis.crypto;
  if (c?.randomUUID) return c.randomUUID();
  const bytes = c?.getRandomValues ? c.getRandomValues(new Uint8Array(16)) : Uint8Array.from({ length: 16 }, () => Math.floor(Math.random() * 256));
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}
