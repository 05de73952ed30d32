import { HttpErrorResponse } from '@angular/common/http';
import { Observable, Subject, Subscriber } from 'rxjs';
import { CalcState, calcStream } from './calc-stream';

interface Call {
  request: { levels: number };
  subscriber: Subscriber<string>;
  answered: boolean;
  cancelled: boolean;
}

function setup() {
  const requests = new Subject<{ levels: number } | null>();
  const retries = new Subject<void>();
  const calls: Call[] = [];
  // Each call stays open until the test answers it, like an HTTP request in flight.
  const calculate = (request: { levels: number }) =>
    new Observable<string>((subscriber) => {
      const call: Call = { request, subscriber, answered: false, cancelled: false };
      calls.push(call);
      return () => {
        if (!call.answered) call.cancelled = true;
      };
    });
  const states: Array<CalcState<{ levels: number }, string>> = [];
  const subscription = calcStream(requests, calculate, { debounceMs: 300, retries }).subscribe((s) => states.push(s));
  const answer = (call: Call, result: string) => {
    call.answered = true;
    call.subscriber.next(result);
    call.subscriber.complete();
  };
  return { requests, retries, calls, states, answer, last: () => states[states.length - 1]!, subscription };
}

describe('calcStream', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('waits until the typing pauses, then sends only the newest request', () => {
    const { requests, calls, last } = setup();
    requests.next({ levels: 1 });
    vi.advanceTimersByTime(200);
    requests.next({ levels: 12 });
    vi.advanceTimersByTime(299);
    expect(calls).toHaveLength(0);
    vi.advanceTimersByTime(1);
    expect(calls.map((c) => c.request)).toEqual([{ levels: 12 }]);
    expect(last().pending).toBe(true);
  });

  it('cancels the request in flight when a newer one starts, and never shows its answer', () => {
    const { requests, calls, answer, last } = setup();
    requests.next({ levels: 9 });
    vi.advanceTimersByTime(300);
    requests.next({ levels: 10 });
    vi.advanceTimersByTime(300);
    expect(calls).toHaveLength(2);
    expect(calls[0]!.cancelled).toBe(true);
    answer(calls[1]!, 'ten levels');
    expect(last()).toEqual({ result: 'ten levels', resultFor: { levels: 10 }, pending: false, error: null, blocked: false });
  });

  it('does not send a request equal to the one before', () => {
    const { requests, calls, answer } = setup();
    requests.next({ levels: 9 });
    vi.advanceTimersByTime(300);
    answer(calls[0]!, 'nine');
    requests.next({ levels: 9 });
    vi.advanceTimersByTime(300);
    expect(calls).toHaveLength(1);
  });

  it('keeps the last result while the form is invalid, and sends nothing', () => {
    const { requests, calls, answer, last } = setup();
    requests.next({ levels: 9 });
    vi.advanceTimersByTime(300);
    answer(calls[0]!, 'nine');
    requests.next(null);
    vi.advanceTimersByTime(300);
    expect(calls).toHaveLength(1);
    expect(last()).toMatchObject({ result: 'nine', blocked: true, pending: false });
  });

  it('reports a failure with the field the API names, keeping the last result', () => {
    const { requests, calls, answer, last } = setup();
    requests.next({ levels: 9 });
    vi.advanceTimersByTime(300);
    answer(calls[0]!, 'nine');
    requests.next({ levels: 31 });
    vi.advanceTimersByTime(300);
    calls[1]!.answered = true;
    calls[1]!.subscriber.error(
      new HttpErrorResponse({ status: 400, error: { error: { code: 'invalid_input', message: 'layout.levels: Too big', field: 'layout.levels' } } }),
    );
    expect(last().result).toBe('nine');
    expect(last().error).toMatchObject({ status: 400, field: 'layout.levels' });
  });

  it('sends the newest request again on retry, even though it is unchanged', () => {
    const { requests, retries, calls, answer, last } = setup();
    requests.next({ levels: 9 });
    vi.advanceTimersByTime(300);
    calls[0]!.answered = true;
    calls[0]!.subscriber.error(new HttpErrorResponse({ status: 503, error: 'down' }));
    expect(last().error?.status).toBe(503);
    retries.next();
    expect(calls.map((c) => c.request)).toEqual([{ levels: 9 }, { levels: 9 }]);
    answer(calls[1]!, 'nine');
    expect(last()).toMatchObject({ result: 'nine', error: null });
  });
});
