import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { Order, Refund } from '../core/orders-types';
import { RefundDialog, RefundResult } from './refund-dialog';

const order = {
  id: 5, number: 'O-2026-0005', currency: 'usd', status: 'deposit_paid', paidCents: 60000, refundedCents: 0,
} as Order;

const refund = (amountCents: number): Refund => ({
  id: 1, orderId: 5, paymentId: 2, amountCents, currency: 'usd', status: 'pending', providerId: null, reason: 'Changed their mind',
  refundedAt: null, createdBy: 'sales@demo.tubwright.test', createdAt: '2026-12-02T12:00:00.000Z',
});

function open(inputs: { refundableCents?: number; cancelling?: boolean; stageNote?: string } = {}) {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
  const fixture = TestBed.createComponent(RefundDialog);
  fixture.componentRef.setInput('order', order);
  fixture.componentRef.setInput('refundableCents', inputs.refundableCents ?? 45000);
  if (inputs.cancelling !== undefined) fixture.componentRef.setInput('cancelling', inputs.cancelling);
  if (inputs.stageNote !== undefined) fixture.componentRef.setInput('stageNote', inputs.stageNote);
  const results: RefundResult[] = [];
  fixture.componentInstance.done.subscribe((r) => results.push(r));
  fixture.detectChanges();
  const element = fixture.nativeElement as HTMLElement;
  const input = (label: string) =>
    Array.from(element.querySelectorAll('mat-form-field'))
      .find((f) => f.querySelector('mat-label')!.textContent!.startsWith(label))!
      .querySelector('input')!;
  const type = (label: string, text: string) => {
    const field = input(label);
    field.value = text;
    field.dispatchEvent(new Event('input'));
    fixture.detectChanges();
  };
  const problems = () => {
    fixture.detectChanges();
    return Array.from(element.querySelectorAll('.tw-field-error')).map((e) => e.textContent!.trim());
  };
  const press = (text: string) => {
    Array.from(element.querySelectorAll('button')).find((b) => b.textContent!.trim().startsWith(text))!.click();
    fixture.detectChanges();
  };
  return { fixture, element, http: TestBed.inject(HttpTestingController), input, type, problems, press, results };
}

describe('RefundDialog', () => {
  it('offers everything refundable and wants a reason before asking for anything', () => {
    const { http, input, problems, press, type } = open();
    expect(input('Amount').value).toBe('450.00');
    press('Refund $450.00');
    expect(problems()).toEqual(['Give a reason for the refund']);
    type('Reason', 'Changed their mind');
    type('Amount', '450.01');
    press('Refund');
    expect(problems()).toEqual(['At most $450.00 can be refunded']);
    type('Amount', 'half');
    expect(problems()).toEqual(['Enter an amount like 250.00']);
    type('Amount', '0');
    expect(problems()).toEqual(['Enter an amount above 0']);
    http.expectNone('/api/v1/orders/5/refunds');
  });

  it('asks for the typed amount with the reason, once per press', () => {
    const { http, type, press, results } = open();
    type('Amount', '150');
    type('Reason', '  Changed their mind ');
    press('Refund $150.00');
    const request = http.expectOne('/api/v1/orders/5/refunds');
    expect(request.request.body).toEqual({ amountCents: 15000, reason: 'Changed their mind' });
    expect(request.request.headers.get('Idempotency-Key')).toBeTruthy();
    request.flush({ items: [refund(15000)] });
    expect(results).toEqual([{ refunds: [refund(15000)], order: null }]);
  });

  it('puts a refused amount on the amount field', () => {
    const { http, type, press, problems, element } = open();
    type('Reason', 'Changed their mind');
    press('Refund');
    http.expectOne('/api/v1/orders/5/refunds').flush(
      { error: { code: 'conflict', message: 'At most 30000 cents can be refunded on order O-2026-0005.', field: 'amountCents' } },
      { status: 409, statusText: 'Conflict' },
    );
    expect(problems()).toEqual(['At most 30000 cents can be refunded on order O-2026-0005.']);
    expect(element.querySelector('tw-error-banner')).toBeNull();
  });

  it('when cancelling, refunds first and then cancels with the reason as the note', () => {
    const { http, type, press, results } = open({ cancelling: true });
    type('Reason', 'Customer moved away');
    press('Refund $450.00 and cancel');
    const refunding = http.expectOne('/api/v1/orders/5/refunds');
    expect(refunding.request.body).toEqual({ amountCents: 45000, reason: 'Customer moved away' });
    http.expectNone('/api/v1/orders/5/stage');
    refunding.flush({ items: [refund(45000)] });
    const cancelling = http.expectOne('/api/v1/orders/5/stage');
    expect(cancelling.request.body).toEqual({ stage: 'cancelled', note: 'Customer moved away' });
    cancelling.flush({ ...order, status: 'cancelled' });
    expect(results[0]!.order?.status).toBe('cancelled');
    expect(results[0]!.refunds).toHaveLength(1);
  });

  it('can cancel without a refund, which needs no reason', () => {
    const { http, press, results } = open({ cancelling: true, stageNote: 'Refunded in cash' });
    press('Cancel without a refund');
    http.expectNone('/api/v1/orders/5/refunds');
    const cancelling = http.expectOne('/api/v1/orders/5/stage');
    expect(cancelling.request.body).toEqual({ stage: 'cancelled', note: 'Refunded in cash' });
    cancelling.flush({ ...order, status: 'cancelled' });
    expect(results[0]!.refunds).toEqual([]);
  });
});
