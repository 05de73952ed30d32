import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import { ApiKeyForm } from './api-key-form';

async function render() {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
  const fixture = TestBed.createComponent(ApiKeyForm);
  const created: unknown[] = [];
  fixture.componentInstance.created.subscribe((k) => created.push(k));
  await fixture.whenStable();
  const el: HTMLElement = fixture.nativeElement;
  const set = async (selector: string, value: string) => {
    const input = el.querySelector<HTMLInputElement | HTMLTextAreaElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  };
  const submit = async () => {
    el.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  };
  return { fixture, el, set, submit, created, http: TestBed.inject(HttpTestingController) };
}

describe('ApiKeyForm', () => {
  it('asks a website key for its origins, and sends nothing without them', async () => {
    const f = await render();
    await f.set('input[formcontrolname="name"]', 'Shop website');
    await f.submit();
    f.http.expectNone('/api/v1/api-keys');
    expect(f.el.textContent).toContain('List at least one website address');
  });

  it('keeps order status off a website key and sends the origins as origins', async () => {
    const f = await render();
    const orderStatus = f.el.querySelectorAll<HTMLInputElement>('input[type="checkbox"]')[2]!;
    expect(orderStatus.disabled).toBe(true);
    await f.set('input[formcontrolname="name"]', ' Shop website ');
    await f.set('textarea[formcontrolname="origins"]', 'https://racks.example/sizer\nhttps://www.racks.example');
    await f.submit();
    const req = f.http.expectOne('/api/v1/api-keys');
    expect(req.request.method).toBe('POST');
    expect(req.request.body).toEqual({
      name: 'Shop website',
      kind: 'publishable',
      origins: ['https://racks.example', 'https://www.racks.example'],
      scopes: ['calculations', 'quote-requests'],
    });
    req.flush({ id: 1, key: 'tw_pk_x' }, { status: 201, statusText: 'Created' });
    await f.fixture.whenStable();
    expect(f.created).toEqual([{ id: 1, key: 'tw_pk_x' }]);
  });

  it('lets a partner key read order status, without origins', async () => {
    const f = await render();
    f.el.querySelectorAll<HTMLInputElement>('input[type="radio"]')[1]!.click();
    await f.fixture.whenStable();
    expect(f.el.querySelector('textarea')).toBeNull();
    const orderStatus = f.el.querySelectorAll<HTMLInputElement>('input[type="checkbox"]')[2]!;
    expect(orderStatus.disabled).toBe(false);
    orderStatus.click();
    await f.set('input[formcontrolname="name"]', 'Supply store');
    await f.submit();
    const req = f.http.expectOne('/api/v1/api-keys');
    expect(req.request.body).toEqual({ name: 'Supply store', kind: 'secret', origins: [], scopes: ['calculations', 'quote-requests', 'order-status'] });
  });

  it("puts the server's objection on the field it names", async () => {
    const f = await render();
    await f.set('input[formcontrolname="name"]', 'Shop website');
    await f.set('textarea[formcontrolname="origins"]', 'https://racks.example');
    await f.submit();
    f.http
      .expectOne('/api/v1/api-keys')
      .flush({ error: { code: 'validation_error', message: 'must be a web origin', field: 'origins.0' } }, { status: 400, statusText: 'Bad Request' });
    await f.fixture.whenStable();
    expect(f.el.querySelector('mat-error')?.textContent).toContain('must be a web origin');
  });
});
