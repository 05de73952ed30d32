import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, TestRequest, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { authInterceptor, provideTubwrightIcons } from '@tubwright/kit';
import { nineByThree } from '../results/result-fixture';
import { PlanEditor } from './plan-editor';

const DEBOUNCE_MS = 300;
const pause = () => new Promise((resolve) => setTimeout(resolve, DEBOUNCE_MS + 50));

async function render() {
  localStorage.clear();
  TestBed.configureTestingModule({
    providers: [provideHttpClient(withInterceptors([authInterceptor])), provideHttpClientTesting(), provideTubwrightIcons()],
  });
  const fixture = TestBed.createComponent(PlanEditor);
  fixture.componentRef.setInput('navigate', () => undefined);
  await fixture.whenStable();
  const backend = TestBed.inject(HttpTestingController);
  backend.expectOne((r) => r.url === '/api/v1/tub-models').flush({ items: [], total: 0, limit: 200, offset: 0 });
  backend.expectOne('/api/v1/price-list').flush({
    items: [{ key: 'thermostat', label: 'Thermostat, each', unit: 'each', price: 84, category: 'heat', notes: '', usedByCalculator: true, updatedAt: '2026-12-02T00:00:00.000Z' }],
  });
  const element = fixture.nativeElement as HTMLElement;
  const field = (label: string) =>
    Array.from(element.querySelectorAll('mat-form-field')).find((f) => f.querySelector('mat-label')?.textContent?.trim() === label)!;
  const type = async (label: string, value: string) => {
    const input = field(label).querySelector('input')!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
    await fixture.whenStable();
  };
  const calcRequests = () => backend.match((r) => r.url === '/api/v1/calc/rack-plan');
  return { fixture, backend, element, field, type, calcRequests };
}

// Real timers: the editor's own debounce runs as in the browser, so these tests take a few seconds.
describe('PlanEditor', { timeout: 30_000 }, () => {
  it('calculates once the typing pauses, with the shop prices, and draws the result', async () => {
    const { fixture, element, type, calcRequests } = await render();
    await type('Tub length', '23');
    await type('Tub width', '16 1/4');
    await type('Tub height', '6 1/2');
    expect(calcRequests()).toHaveLength(0);
    await pause();

    const [request] = calcRequests() as [TestRequest];
    expect(request.request.body.tub).toEqual({ length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 });
    expect(request.request.body.layout).toEqual({ levels: 9, columns: 3, dividers: 0 });
    expect(request.request.body.prices).toEqual({ thermostat: 84 });
    request.flush(nineByThree().result);
    await fixture.whenStable();

    const opening = element.querySelector('[data-dimension="levelOpening"] dd')?.textContent?.trim();
    const width = element.querySelector('[data-dimension="overallWidth"] dd')?.textContent?.trim();
    expect([opening, width]).toEqual(['6 5/8 in', '51 1/4 in']);
    expect(element.querySelector('svg.elevation')).not.toBeNull();
    expect(element.querySelectorAll('img.cutting-diagram').length).toBeGreaterThan(0);
  });

  it('cancels the request in flight when the user changes a value', async () => {
    const { type, calcRequests } = await render();
    await type('Tub length', '23');
    await type('Tub width', '16.25');
    await type('Tub height', '6.5');
    await pause();
    const [first] = calcRequests() as [TestRequest];
    await type('Levels', '10');
    await pause();
    const [second] = calcRequests() as [TestRequest];
    expect(first.cancelled).toBe(true);
    expect(second.request.body.layout.levels).toBe(10);
  });

  it('sends nothing while a field is invalid, and says why under the field', async () => {
    const { type, field, calcRequests } = await render();
    await type('Tub length', '23');
    await type('Tub width', '16.25');
    await type('Tub height', '6.5');
    await type('Levels', '0');
    await pause();
    expect(calcRequests()).toHaveLength(0);
    expect(field('Levels').querySelector('mat-error')?.textContent?.trim()).toBe('Levels must be from 1 to 30');
  });

  it('puts an API error on the field it names', async () => {
    const { fixture, type, field, calcRequests, element } = await render();
    await type('Tub length', '23');
    await type('Tub width', '16.25');
    await type('Tub height', '60');
    await pause();
    const [request] = calcRequests() as [TestRequest];
    request.flush(
      { error: { code: 'unprocessable', message: 'This rack cannot be built: a level opening of 60 1/8 in is taller than the sheet.', field: 'tub.height' } },
      { status: 422, statusText: 'Unprocessable Entity' },
    );
    await fixture.whenStable();
    expect(field('Tub height').querySelector('mat-error')?.textContent).toContain('taller than the sheet');
    expect(element.querySelector('[role="alert"]')?.textContent).toContain('cannot work with this');
  });
});
