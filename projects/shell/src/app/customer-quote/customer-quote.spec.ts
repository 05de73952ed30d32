import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import { CustomerQuotePage } from './customer-quote';

const TOKEN = 'Q-2026-0042.abcdefghijklmnopqrstuvwxyz012345';
const URL = `/api/v1/quote-links/${TOKEN}`;
const accepted = (over: object = {}) => ({
  number: 'Q-2026-0042', shop: 'Test shop', customerName: 'Ivo Marsh', status: 'accepted', validUntil: '2026-12-30', currency: 'usd',
  lines: [{ description: 'Rack, 6 x 2', quantity: 1, unitPriceCents: 80000, amountCents: 80000 }],
  itemsCents: 80000, discountCents: 0, taxCents: 0, totalCents: 80000, depositCents: 40000,
  orderNumber: 'O-2026-0007', orderStatus: 'awaiting_deposit', paidCents: 0, depositDueNowCents: 40000, ...over,
});

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function render(payment?: string) {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
  const fixture = TestBed.createComponent(CustomerQuotePage);
  fixture.componentRef.setInput('token', TOKEN);
  if (payment) fixture.componentRef.setInput('payment', payment);
  const left: string[] = [];
  const seams = fixture.componentInstance as unknown as { leaveFor: (url: string) => void; pollMs: number };
  seams.leaveFor = (url) => left.push(url);
  seams.pollMs = 10;
  fixture.detectChanges();
  const http = TestBed.inject(HttpTestingController);
  const el: HTMLElement = fixture.nativeElement;
  const settle = async () => {
    await fixture.whenStable();
    fixture.detectChanges();
  };
  return { fixture, http, el, left, settle };
}

describe('CustomerQuotePage after acceptance', () => {
  it('offers the deposit and sends the customer to the payment page the shop opened', async () => {
    const f = await render();
    f.http.expectOne(URL).flush(accepted());
    await f.settle();
    expect(f.el.textContent).toContain('The build starts once the deposit of $400.00 is paid');
    const pay = Array.from(f.el.querySelectorAll('button')).find((b) => b.textContent?.includes('Pay the deposit'))!;
    pay.click();
    await f.settle();
    const req = f.http.expectOne(`${URL}/pay`);
    expect(req.request.method).toBe('POST');
    req.flush({ checkoutUrl: 'http://127.0.0.1:4310/checkout/cs_test_1' });
    await f.settle();
    expect(f.left).toEqual(['http://127.0.0.1:4310/checkout/cs_test_1']);
  });

  it('does not take the return from the payment page as payment: it waits for the shop to confirm', async () => {
    const f = await render('received');
    f.http.expectOne(URL).flush(accepted());
    await f.settle();
    expect(f.el.textContent).toContain('confirming your payment');
    expect(f.el.textContent).not.toContain('Deposit received');
    await wait(40);
    f.http.expectOne(URL).flush(accepted({ orderStatus: 'deposit_paid', paidCents: 40000, depositDueNowCents: 0 }));
    await f.settle();
    expect(f.el.textContent).toContain('Deposit received, thank you');
    await wait(60);
    f.http.expectNone(URL);
  });

  it('says plainly when the customer came back without paying', async () => {
    const f = await render('cancelled');
    f.http.expectOne(URL).flush(accepted());
    await f.settle();
    expect(f.el.textContent).toContain('nothing was charged');
    expect(f.el.textContent).toContain('Pay the deposit');
  });
});
