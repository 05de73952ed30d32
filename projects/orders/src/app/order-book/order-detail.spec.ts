import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { AuthSession, Role } from '@tubwright/kit';
import type { Order, Payment } from '../core/orders-types';
import { OrderDetail } from './order-detail';

const order: Order = {
  id: 5,
  number: 'O-2026-0005',
  quoteId: 9,
  customerId: 3,
  customerName: 'Greta Lindqvist',
  status: 'ready',
  currency: 'usd',
  totalCents: 230241,
  depositDueCents: 115121,
  paidCents: 115121,
  balanceCents: 115120,
  deliveryMethod: 'pickup',
  deliveryDate: null,
  deliveryAddress: '',
  doorwayHeightIn: null,
  refundedCents: 0,
  notes: '',
  createdAt: '2026-12-02T10:00:00.000Z',
  updatedAt: '2026-12-02T12:00:00.000Z',
  stages: [{ id: 1, stage: 'ready', startedAt: '2026-12-02T12:00:00.000Z', finishedAt: null, by: 'builder@demo.tubwright.test', note: '' }],
  nextStages: ['delivered', 'picked_up', 'cancelled'],
  racks: [],
};

function open(role: Role) {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
  TestBed.inject(AuthSession).adopt({ accessToken: 'a', refreshToken: 'r', expiresIn: 900, user: { id: 1, email: `${role}@demo.tubwright.test`, name: role, role } });
  const fixture = TestBed.createComponent(OrderDetail);
  fixture.componentRef.setInput('id', 5);
  fixture.detectChanges();
  const http = TestBed.inject(HttpTestingController);
  http.expectOne('/api/v1/orders/5').flush(order);
  fixture.detectChanges();
  const buttons = () => Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('button')).map((b) => b.textContent!.trim());
  return { fixture, http, buttons };
}

describe('OrderDetail', () => {
  afterEach(() => localStorage.clear());

  it('lets a builder only through the production stages, and shows no money', async () => {
    const { fixture, http, buttons } = open('builder');
    await fixture.whenStable();
    expect(buttons()).not.toContain('Mark delivered');
    expect(buttons().some((b) => b.startsWith('Cancel order'))).toBe(false);
    expect((fixture.nativeElement as HTMLElement).textContent).toContain('Nothing further to do for your role');
    http.expectNone((r) => r.url.includes('/payments') || r.url.includes('/invoices'));
  });

  it('offers sales the hand-over, cancelling, the balance and the invoice', async () => {
    const { fixture, http, buttons } = open('sales');
    http.expectOne('/api/v1/orders/5/payments').flush({ items: [] });
    http.expectOne((r) => r.url === '/api/v1/invoices' && r.params.get('orderId') === '5').flush({ items: [], total: 0, limit: 10, offset: 0 });
    fixture.detectChanges();
    await fixture.whenStable();
    expect(buttons()).toEqual(expect.arrayContaining(['Mark delivered', 'Mark picked up', 'Cancel order…']));
    expect(buttons().some((b) => b.includes('Take the balance ($1,151.20)'))).toBe(true);
    expect(buttons().some((b) => b.includes('Issue and e-mail the invoice'))).toBe(true);
  });

  it('sends the chosen stage with the note and shows the new stage', async () => {
    const { fixture, http } = open('sales');
    http.expectOne('/api/v1/orders/5/payments').flush({ items: [] });
    http.expectOne((r) => r.url === '/api/v1/invoices').flush({ items: [], total: 0, limit: 10, offset: 0 });
    fixture.detectChanges();
    const element = fixture.nativeElement as HTMLElement;
    const note = element.querySelector<HTMLInputElement>('input')!;
    note.value = 'Collected by her brother';
    note.dispatchEvent(new Event('input'));
    Array.from(element.querySelectorAll('button')).find((b) => b.textContent!.includes('Mark picked up'))!.click();
    const request = http.expectOne('/api/v1/orders/5/stage');
    expect(request.request.body).toEqual({ stage: 'picked_up', note: 'Collected by her brother' });
    request.flush({ ...order, status: 'picked_up', nextStages: ['closed'], updatedAt: '2026-12-02T13:00:00.000Z' });
    fixture.detectChanges();
    expect(element.textContent).toContain('Order O-2026-0005 is now picked up.');
  });

  it('sends a payment link and shows it, with a way to copy and open it, while the customer has not paid', async () => {
    const { fixture, http, buttons } = open('sales');
    http.expectOne('/api/v1/orders/5/payments').flush({ items: [] });
    http.expectOne('/api/v1/orders/5/refunds').flush({ items: [] });
    http.expectOne((r) => r.url === '/api/v1/invoices').flush({ items: [], total: 0, limit: 10, offset: 0 });
    fixture.detectChanges();
    expect(buttons()).toContain('linkSend payment link');
    const element = fixture.nativeElement as HTMLElement;
    Array.from(element.querySelectorAll('button')).find((b) => b.textContent!.includes('Send payment link'))!.click();
    const asked = http.expectOne((r) => r.url === '/api/v1/orders/5/payments' && r.method === 'POST');
    expect(asked.request.body).toEqual({ kind: 'balance', via: 'checkout' });
    const url = 'http://127.0.0.1:4310/checkout/cs_test_a1';
    const pending: Payment = {
      id: 8, orderId: 5, kind: 'balance', amountCents: 115120, currency: 'usd', status: 'pending', via: 'checkout', providerId: 'cs_test_a1',
      checkoutUrl: url, refundedCents: 0, failureMessage: null, paidAt: null, createdAt: '2026-12-02T13:00:00.000Z',
    };
    asked.flush(pending);
    fixture.detectChanges();
    http.expectOne((r) => r.url === '/api/v1/orders/5/payments' && r.method === 'GET').flush({ items: [pending] });
    fixture.detectChanges();
    await fixture.whenStable();
    expect(element.textContent).toContain('A payment page for the $1,151.20 balance is ready: send the link to Greta Lindqvist.');
    expect(element.querySelector<HTMLInputElement>('tw-payment-link input')!.value).toBe(url);
    expect(element.querySelector<HTMLAnchorElement>('tw-payment-link a')!.href).toBe(url);
    expect(buttons()).toContain('content_copyCopy link');
    expect(buttons().some((b) => b.includes('Send payment link'))).toBe(false);
  });

  it('withdraws an unpaid payment link at the provider', async () => {
    const { fixture, http, buttons } = open('sales');
    const pending: Payment = {
      id: 8, orderId: 5, kind: 'balance', amountCents: 115120, currency: 'usd', status: 'pending', via: 'checkout', providerId: 'cs_test_a1',
      checkoutUrl: 'http://127.0.0.1:4310/checkout/cs_test_a1', refundedCents: 0, failureMessage: null, paidAt: null, createdAt: '2026-12-02T13:00:00.000Z',
    };
    http.expectOne('/api/v1/orders/5/payments').flush({ items: [pending] });
    http.expectOne('/api/v1/orders/5/refunds').flush({ items: [] });
    http.expectOne((r) => r.url === '/api/v1/invoices').flush({ items: [], total: 0, limit: 10, offset: 0 });
    fixture.detectChanges();
    expect(buttons()).toContain('Withdraw the link');
    const element = fixture.nativeElement as HTMLElement;
    Array.from(element.querySelectorAll('button')).find((b) => b.textContent!.trim() === 'Withdraw the link')!.click();
    const asked = http.expectOne((r) => r.url === '/api/v1/payments/8/cancel' && r.method === 'POST');
    asked.flush({ ...pending, status: 'canceled' });
    fixture.detectChanges();
    await fixture.whenStable();
    expect(element.textContent).toContain('The payment was withdrawn; nothing was charged.');
  });

  it('offers the refund when an order with money paid is cancelled', async () => {
    const { fixture, http } = open('sales');
    http.expectOne('/api/v1/orders/5/payments').flush({ items: [] });
    // 100.00 of the deposit is already on its way back
    http.expectOne('/api/v1/orders/5/refunds').flush({
      items: [{ id: 1, orderId: 5, paymentId: 2, amountCents: 10000, currency: 'usd', status: 'pending', providerId: 're_1', reason: 'Late', refundedAt: null, createdBy: 'sales@demo.tubwright.test', createdAt: '2026-12-02T12:30:00.000Z' }],
    });
    http.expectOne((r) => r.url === '/api/v1/invoices').flush({ items: [], total: 0, limit: 10, offset: 0 });
    fixture.detectChanges();
    const element = fixture.nativeElement as HTMLElement;
    expect(element.textContent).toContain('Refunds');
    expect(element.textContent).toContain('Late');
    Array.from(element.querySelectorAll('button')).find((b) => b.textContent!.trim() === 'Cancel order…')!.click();
    fixture.detectChanges();
    await fixture.whenStable();
    const dialog = element.querySelector('tw-refund-dialog')!;
    expect(dialog.textContent).toContain('Cancel order O-2026-0005?');
    // 1,151.21 paid less 100.00 under way
    expect(dialog.querySelector<HTMLInputElement>('input')!.value).toBe('1051.21');
  });
});
