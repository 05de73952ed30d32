import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import { COMPARISON } from './compare-fixture';
import { PlanCompare } from './plan-compare';

async function render(a = 4, b = 7) {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
  const navigated: string[] = [];
  const fixture = TestBed.createComponent(PlanCompare);
  fixture.componentRef.setInput('a', a);
  fixture.componentRef.setInput('b', b);
  fixture.componentRef.setInput('navigate', (path: string) => navigated.push(path));
  await fixture.whenStable();
  return { fixture, navigated, backend: TestBed.inject(HttpTestingController), element: fixture.nativeElement as HTMLElement };
}

/** An element's words as a reader hears them: each text piece trimmed, joined by one space. */
const words = (cell: Element) => {
  const walker = cell.ownerDocument.createTreeWalker(cell, NodeFilter.SHOW_TEXT);
  const pieces: string[] = [];
  while (walker.nextNode()) pieces.push(walker.currentNode.textContent!.trim());
  return pieces.filter(Boolean).join(' ');
};
const cellsOf = (element: HTMLElement, key: string) =>
  Array.from(element.querySelectorAll(`tr[data-row="${key}"] th, tr[data-row="${key}"] td`)).map(words);

describe('PlanCompare', () => {
  it('shows the two plans in columns, with what differs marked', async () => {
    const { fixture, backend, element } = await render();
    backend.expectOne('/api/v1/plans/4/compare/7').flush(COMPARISON);
    await fixture.whenStable();

    const heads = Array.from(element.querySelectorAll('thead th.plan-head')).map(words);
    expect(heads).toEqual(['A Longhold 28, 9 high x 3 wide version 2', 'B Longhold 28, 10 high version 1']);
    expect(cellsOf(element, 'overallHeight')).toEqual(['Overall height on its casters', '71 5/8 in', '78 1/4 in', '+6 5/8 in']);
    expect(cellsOf(element, 'interiorShelfLength')).toEqual(['Interior shelf between the side panels', '50 1/4 in', '50 1/4 in', 'same']);
    expect(cellsOf(element, 'total')).toEqual(['Total with margin', '2,543.32', '2,842.97', '+299.65']);
    expect(cellsOf(element, 'pvc-rigid@0.5')).toEqual(['Rigid PVC 1/2 in thick', '5', '6', '+1']);

    // Highlighted rows are the ones that differ, and the count in the heading agrees.
    const marked = Array.from(element.querySelectorAll('tr.differs')).map((tr) => tr.getAttribute('data-row'));
    expect(marked).toContain('overallHeight');
    expect(marked).not.toContain('interiorShelfLength');
    expect(marked).not.toContain('overallWidth');
    expect(element.querySelector('.sub')?.textContent).toContain(`${marked.length} lines differ`);
    expect(element.querySelector('.sub')?.textContent).toContain('Lengths in inches.');
    backend.verify();
  });

  it('links each column to its plan and swaps A and B through the shell', async () => {
    const { fixture, backend, element, navigated } = await render();
    backend.expectOne('/api/v1/plans/4/compare/7').flush(COMPARISON);
    await fixture.whenStable();

    const links = Array.from(element.querySelectorAll<HTMLAnchorElement>('thead th.plan-head a'));
    expect(links.map((a) => a.getAttribute('href'))).toEqual(['/planning/plans/4', '/planning/plans/7']);
    links[1]!.click();
    const swap = Array.from(element.querySelectorAll('button')).find((b) => b.textContent?.includes('Swap'))!;
    swap.click();
    expect(navigated).toEqual(['plans/7', 'compare/7/4']);
  });

  it('says when plan B was converted from another unit', async () => {
    const { fixture, backend, element } = await render();
    backend.expectOne('/api/v1/plans/4/compare/7').flush({ ...COMPARISON, b: { ...COMPARISON.b, unit: 'mm' } });
    await fixture.whenStable();
    expect(element.querySelector('.sub')?.textContent).toContain("plan A's unit; plan B's are converted");
  });

  it('says what went wrong and tries again on request', async () => {
    const { fixture, backend, element } = await render(4, 999);
    backend.expectOne('/api/v1/plans/4/compare/999').flush({ error: { code: 'not_found', message: 'No plan with id 999.' } }, { status: 404, statusText: 'Not Found' });
    await fixture.whenStable();
    const banner = element.querySelector('[role="alert"]');
    expect(banner?.textContent).toContain('No plan with id 999.');
    expect(element.querySelector('table')).toBeNull();
    (banner?.querySelector('button') as HTMLButtonElement).click();
    await fixture.whenStable();
    backend.expectOne('/api/v1/plans/4/compare/999').flush(COMPARISON);
    await fixture.whenStable();
    expect(element.querySelector('[role="alert"]')).toBeNull();
    expect(element.querySelector('table')).not.toBeNull();
  });
});
