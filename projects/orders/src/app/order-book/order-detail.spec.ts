import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { AuthSession, Role } from '@tubwright/kit';
import type { Order } from '../core/orders-types';
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
});
