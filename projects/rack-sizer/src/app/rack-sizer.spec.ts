import { TestBed } from '@angular/core/testing';
import { planFixture } from '../testing/plan-fixture';
import { RackSizer, textOn } from './rack-sizer';
import { WidgetApi, WidgetError } from './widget-api';

/** The calculator's debounce plus a little: the widget asks once typing pauses. */
const settle = () => new Promise((resolve) => setTimeout(resolve, 450));

function fakeApi(shopShowsPrices = true) {
  return {
    settings: vi.fn(async (_key: string) => ({ showPrices: shopShowsPrices })),
    plan: vi.fn(async (_key: string, _spec: unknown, _signal?: AbortSignal) => planFixture()),
    requestQuote: vi.fn(async (_key: string, _body: unknown, _idempotencyKey: string) => ({
      reference: 'Q-2026-0042',
      status: 'received' as const,
      estimate: { totalCents: 215837, currency: 'usd' },
      dimensions: { overallWidth: 51.25, overallHeight: 71.625, overallDepth: 23.5, unit: 'in' as const },
    })),
  };
}

async function render(attrs: Record<string, string | boolean> = {}, api = fakeApi()) {
  TestBed.configureTestingModule({ providers: [{ provide: WidgetApi, useValue: api }] });
  const fixture = TestBed.createComponent(RackSizer);
  for (const [name, value] of Object.entries({ key: 'tw_pk_test', ...attrs })) fixture.componentRef.setInput(name, value);
  await fixture.whenStable();
  const root = fixture.nativeElement.shadowRoot as ShadowRoot;
  const field = (id: string) => root.querySelector<HTMLInputElement>(`#${id}`)!;
  const type = async (id: string, value: string) => {
    const input = field(id);
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
    await fixture.whenStable();
  };
  const fill = async (values: Record<string, string>) => {
    for (const [id, value] of Object.entries(values)) await type(id, value);
    await settle();
    await fixture.whenStable();
  };
  const button = (name: string) => Array.from(root.querySelectorAll('button')).find((b) => b.textContent!.trim() === name);
  return { fixture, root, api, field, type, fill, button, text: () => root.textContent!.replace(/\s+/g, ' ') };
}

const TUB = { length: '23', width: '16 1/4', height: '6 1/2', levels: '9', columns: '3' };

describe('RackSizer', () => {
  it('renders in its own shadow root with a label for every field', async () => {
    const { root } = await render();
    expect(root).toBeTruthy();
    for (const id of ['length', 'width', 'height', 'levels', 'columns']) {
      expect(root.querySelector(`label[for="${id}"]`), id).not.toBeNull();
    }
    expect(root.querySelector('details summary')?.textContent).toContain('How to measure');
  });

  it('asks the calculator once typing pauses and shows the outside size, sheets and warnings', async () => {
    const w = await render();
    await w.fill(TUB);
    expect(w.api.plan).toHaveBeenCalledTimes(1);
    expect(w.api.plan).toHaveBeenCalledWith(
      'tw_pk_test',
      { unit: 'in', tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 9, columns: 3 }, cutting: { include: true, timeLimitMs: 300 } },
      expect.any(AbortSignal),
    );
    expect(w.root.querySelector('[data-testid="outside-width"]')?.textContent).toBe('51 1/4 in');
    expect(w.text()).toContain('4 sheets of rigid PVC, 1/2 in');
    expect(w.text()).toContain('anchor it to the wall');
    expect(w.text()).toContain('licensed electrician');
    expect(w.root.querySelectorAll('svg rect.tub')).toHaveLength(27);
    // Screen readers hear one sentence; prices stay hidden without show-prices.
    expect(w.root.querySelector('[aria-live="polite"].visually-hidden')?.textContent).toContain('51 1/4 in wide');
    expect(w.text()).not.toContain('Estimate');
  });

  it('shows the estimate only with show-prices', async () => {
    const w = await render({ 'showPrices': true });
    await w.fill(TUB);
    expect(w.text()).toContain('Estimate $2,027 before tax');
  });

  it("hides the estimate when the shop has turned prices off, whatever the page's attribute says", async () => {
    const w = await render({ showPrices: true }, fakeApi(false));
    await w.fill(TUB);
    expect(w.api.settings).toHaveBeenCalled();
    expect(w.text()).toContain('51 1/4 in');
    expect(w.text()).not.toContain('Estimate');
  });

  it('shows a field error after the visitor leaves the field, and asks nothing', async () => {
    const w = await render();
    await w.fill({ ...TUB, height: 'tall' });
    expect(w.field('height').getAttribute('aria-invalid')).toBe('true');
    expect(w.root.querySelector('#height-error')?.textContent).toBe('Use inches, e.g. 16 1/4 or 16.25');
    expect(w.api.plan).not.toHaveBeenCalled();
  });

  it("puts the calculator's objection on the field it concerns", async () => {
    const api = fakeApi();
    api.plan.mockRejectedValueOnce(new WidgetError('A level opening of 60 1/8 in is taller than the sheet.', 422, 'tub.height'));
    const w = await render({}, api);
    await w.fill({ ...TUB, height: '60' });
    expect(w.root.querySelector('#height-error')?.textContent).toContain('taller than the sheet');
  });

  it('says so when the shop cannot be reached, in an alert', async () => {
    const api = fakeApi();
    api.plan.mockRejectedValueOnce(new WidgetError('The sizer cannot reach the shop right now.', 0));
    const w = await render({}, api);
    await w.fill(TUB);
    expect(w.root.querySelector('[role="alert"]')?.textContent).toContain('cannot reach the shop');
  });

  it('requires name, e-mail and consent before sending a quote request', async () => {
    const w = await render({ showPrices: true });
    await w.fill(TUB);
    w.button('Request a quote')!.click();
    await w.fixture.whenStable();
    w.button('Send request')!.click();
    await w.fixture.whenStable();
    expect(w.api.requestQuote).not.toHaveBeenCalled();
    expect(w.root.querySelector('#quote-name-error')?.textContent).toBe('Enter your name');
    expect(w.root.querySelector('#quote-consent-error')?.textContent).toContain('Tick the box');
    expect(w.field('quote-consent').getAttribute('aria-invalid')).toBe('true');
  });

  it('sends the shown rack with the contact, and confirms with the reference', async () => {
    const w = await render({ showPrices: true });
    await w.fill(TUB);
    w.button('Request a quote')!.click();
    await w.fixture.whenStable();
    await w.type('quote-name', 'Wren Talbot');
    await w.type('quote-email', 'wren@example.test');
    await w.type('quote-note', 'Hatchlings');
    w.field('quote-consent').click();
    await w.fixture.whenStable();
    w.button('Send request')!.click();
    await new Promise((r) => setTimeout(r, 0));
    await w.fixture.whenStable();
    const [key, body, idempotencyKey] = w.api.requestQuote.mock.calls[0]! as [string, Record<string, unknown>, string];
    expect(key).toBe('tw_pk_test');
    expect(body).toMatchObject({ name: 'Wren Talbot', email: 'wren@example.test', note: 'Hatchlings', consent: true });
    expect(body['spec']).toEqual(w.api.plan.mock.calls[0]![1]);
    expect(idempotencyKey).toMatch(/^[0-9a-f-]{32,36}$/);
    expect(w.text()).toContain('Your request Q-2026-0042 is with the shop');
    expect(w.text()).toContain('Estimate with tax: $2,158');
  });

  it('takes millimetres with unit="mm"', async () => {
    const w = await render({ unit: 'mm' });
    expect(w.root.querySelector('label[for="length"]')?.textContent).toContain('(mm)');
    await w.fill({ length: '584.2', width: '412.75', height: '165.1', levels: '9', columns: '3' });
    expect(w.api.plan.mock.calls[0]![1]).toMatchObject({ unit: 'mm', tub: { length: 584.2, width: 412.75, height: 165.1 } });
  });

  it('uses a valid accent colour with readable text on it, and ignores anything else', async () => {
    const w = await render({ accent: '#2e5e45' });
    const sizer = w.root.querySelector<HTMLElement>('.sizer')!;
    expect(sizer.style.getPropertyValue('--accent')).toBe('#2e5e45');
    expect(sizer.style.getPropertyValue('--on-accent')).toBe('#ffffff');
    w.fixture.componentRef.setInput('accent', 'red; display: none');
    await w.fixture.whenStable();
    expect(sizer.style.getPropertyValue('--accent')).toBe('');
    expect(textOn('#ffe066')).toBe('#1b1b1b');
  });
});
