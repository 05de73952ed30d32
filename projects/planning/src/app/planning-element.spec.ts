import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { DeferBlockState, TestBed, type ComponentFixture } from '@angular/core/testing';
import { AuthSession, NavigateDetail, provideTubwrightIcons } from '@tubwright/kit';
import { PlanningElement } from './planning-element';

/** Renders the page behind the element's @defer block at once (the browser does it when idle). */
async function renderDeferred(fixture: ComponentFixture<unknown>): Promise<void> {
  for (const block of await fixture.getDeferBlocks()) await block.render(DeferBlockState.Complete);
  await fixture.whenStable();
}

describe('PlanningElement', () => {
  beforeEach(async () => {
    localStorage.clear();
    TestBed.configureTestingModule({ imports: [PlanningElement], providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
    // Pages behind @defer are resolved before the element is made.
    await TestBed.compileComponents();
  });

  it('lists tub models for the path it is given and takes over the shell session', async () => {
    const fixture = TestBed.createComponent(PlanningElement);
    fixture.componentRef.setInput('path', 'tub-models?q=deep&offset=25');
    fixture.componentRef.setInput('session', {
      accessToken: 'from-shell',
      refreshToken: 'r',
      expiresIn: 900,
      user: { id: 2, email: 'builder@example.test', name: 'B', role: 'builder' },
    });
    await fixture.whenStable();

    const request = TestBed.inject(HttpTestingController).expectOne((r) => r.url === '/api/v1/tub-models');
    expect(request.request.params.get('q')).toBe('deep');
    expect(request.request.params.get('offset')).toBe('25');
    expect(TestBed.inject(AuthSession).accessToken()).toBe('from-shell');
  });

  it('opens the saved plans at its root and marks the section in its navigation', async () => {
    const fixture = TestBed.createComponent(PlanningElement);
    fixture.componentRef.setInput('path', '');
    await fixture.whenStable();

    const request = TestBed.inject(HttpTestingController).expectOne((r) => r.url === '/api/v1/plans');
    expect(request.request.params.get('status')).toBe('active');
    expect(request.request.params.get('sort')).toBe('-updatedAt');
    const current = (fixture.nativeElement as HTMLElement).querySelector('nav a[aria-current="page"]');
    expect(current?.textContent?.trim()).toBe('Saved plans');
  });

  it('opens a comparison under the saved plans and the materials as a section of their own', async () => {
    const fixture = TestBed.createComponent(PlanningElement);
    const backend = TestBed.inject(HttpTestingController);
    const current = () => (fixture.nativeElement as HTMLElement).querySelector('nav a[aria-current="page"]')?.textContent?.trim();
    fixture.componentRef.setInput('path', 'compare/4/7');
    await fixture.whenStable();
    await renderDeferred(fixture);
    backend.expectOne('/api/v1/plans/4/compare/7');
    expect(current()).toBe('Saved plans');

    fixture.componentRef.setInput('path', 'materials');
    await fixture.whenStable();
    await renderDeferred(fixture);
    backend.expectOne('/api/v1/materials');
    expect(current()).toBe('Materials');
  });

  it('asks the shell to navigate with a bubbling tw-navigate event', async () => {
    const fixture = TestBed.createComponent(PlanningElement);
    fixture.componentRef.setInput('path', 'no/such/page');
    await fixture.whenStable();

    const received: NavigateDetail[] = [];
    const listener = (event: Event) => received.push((event as CustomEvent<NavigateDetail>).detail);
    document.body.addEventListener('tw-navigate', listener);
    document.body.appendChild(fixture.nativeElement);
    (fixture.nativeElement as HTMLElement).querySelector('button')?.click();
    document.body.removeEventListener('tw-navigate', listener);

    expect(received).toEqual([{ path: '', replace: false }]);
  });
});
