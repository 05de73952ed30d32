import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import type { PlanListItem } from '../shared/plan-types';
import { PlanList } from './plan-list';

const summary = { levels: 9, columns: 3, tubs: 27, sections: 1, overallHeight: 71.625, overallWidth: 51.25, overallDepth: 24, sheets: 7, total: 2543.32, warnings: 0, dangers: 0 };
const plan = (id: number, name: string): PlanListItem => ({
  id,
  name,
  notes: '',
  tubModelId: null,
  tubModelName: null,
  unit: 'in',
  status: 'active',
  version: 1,
  summary,
  createdBy: 1,
  createdByName: 'Owner',
  createdAt: '2026-12-01T09:00:00.000Z',
  updatedAt: '2026-12-01T09:00:00.000Z',
});
const PLANS = [plan(4, 'Tall nine'), plan(7, 'Tall ten'), plan(9, 'Short four')];

async function render() {
  localStorage.clear();
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
  const fixture = TestBed.createComponent(PlanList);
  fixture.componentRef.setInput('query', { q: '', sort: '-updatedAt', offset: 0, limit: 25 });
  await fixture.whenStable();
  TestBed.inject(HttpTestingController).expectOne((r) => r.url === '/api/v1/plans').flush({ items: PLANS, total: 3, limit: 25, offset: 0 });
  await fixture.whenStable();
  const opened: string[] = [];
  fixture.componentInstance.open.subscribe((path) => opened.push(path));
  const element = fixture.nativeElement as HTMLElement;
  const box = (name: string) => element.querySelector<HTMLInputElement>(`input[aria-label="Compare ${name}"]`)!;
  const compareButton = () => Array.from(element.querySelectorAll<HTMLButtonElement>('.compare-bar button')).find((b) => b.textContent?.trim() === 'Compare')!;
  return { fixture, element, opened, box, compareButton };
}

describe('PlanList comparing', () => {
  it('compares the two ticked plans, the first ticked as A', async () => {
    const { fixture, element, opened, box, compareButton } = await render();
    expect(compareButton().disabled).toBe(true);

    box('Tall ten').click();
    await fixture.whenStable();
    expect(element.querySelector('.compare-text')?.textContent).toContain('Tall ten ticked: tick one more');
    expect(compareButton().disabled).toBe(true);

    box('Tall nine').click();
    await fixture.whenStable();
    // Two are enough: the third cannot be ticked until one is unticked.
    expect(box('Short four').disabled).toBe(true);
    expect(element.querySelector('.compare-text')?.textContent?.replace(/\s+/g, ' ')).toContain('Tall ten (A) and Tall nine (B)');
    compareButton().click();
    expect(opened).toEqual(['compare/7/4']);
  });

  it('unticks a plan from the bar or its box', async () => {
    const { fixture, box, element, compareButton } = await render();
    box('Tall nine').click();
    box('Short four').click();
    await fixture.whenStable();
    element.querySelector<HTMLButtonElement>('button[aria-label="Untick Tall nine"]')!.click();
    await fixture.whenStable();
    expect(box('Tall nine').checked).toBe(false);
    expect(box('Tall ten').disabled).toBe(false);
    expect(compareButton().disabled).toBe(true);
    box('Short four').click();
    await fixture.whenStable();
    expect(element.querySelector('.compare-text')?.textContent).toContain('Tick two plans');
  });
});
