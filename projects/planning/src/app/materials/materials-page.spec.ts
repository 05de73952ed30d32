import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { AuthSession, Session, provideTubwrightIcons } from '@tubwright/kit';
import { MaterialsPage } from './materials-page';
import { MATERIALS, ownerSession } from './materials-fixture';

async function render(role: string) {
  localStorage.clear();
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
  TestBed.inject(AuthSession).adopt(ownerSession(role) as Session);
  const fixture = TestBed.createComponent(MaterialsPage);
  await fixture.whenStable();
  const backend = TestBed.inject(HttpTestingController);
  backend.expectOne('/api/v1/materials').flush({ items: MATERIALS });
  await fixture.whenStable();
  return { fixture, backend, element: fixture.nativeElement as HTMLElement };
}

/** A cell's words as a reader hears them: each text piece trimmed, joined by one space. */
const words = (cell: Element) => {
  const walker = cell.ownerDocument.createTreeWalker(cell, NodeFilter.SHOW_TEXT);
  const pieces: string[] = [];
  while (walker.nextNode()) pieces.push(walker.currentNode.textContent!.trim());
  return pieces.filter(Boolean).join(' ');
};
const rowText = (element: HTMLElement, key: string) => Array.from(element.querySelectorAll(`tr[data-material="${key}"] th, tr[data-material="${key}"] td`)).map(words);

describe('MaterialsPage', () => {
  it('shows each material with its values and where they come from; a builder only reads', async () => {
    const { element } = await render('builder');
    expect(rowText(element, 'pvc-rigid')).toEqual([
      'Rigid PVC sheet, 1/2 in Source Supplier data sheet pvc-rigid · sheet',
      '1/2 in',
      '96 in × 48 in',
      '1410 kg/m³',
      '2900 MPa',
      '2300 MPa',
      '235.00 per sheet',
    ]);
    expect(rowText(element, 'lumber-2x4')[0]).toContain('Source not given');
    expect(rowText(element, 'lumber-2x4')[5]).toBe('—');
    expect(element.querySelector('button[aria-label^="Edit"]')).toBeNull();
    expect(element.textContent).toContain('Only the owner changes them.');
  });

  it('lets the owner edit a row in place and shows the saved values', async () => {
    const { fixture, backend, element } = await render('owner');
    const edit = element.querySelector<HTMLButtonElement>('button[aria-label="Edit 2x4 stud"]')!;
    edit.click();
    await fixture.whenStable();
    expect(edit.getAttribute('aria-expanded')).toBe('true');
    const form = element.querySelector('tw-material-form')!;
    expect(form.querySelector('form')?.getAttribute('aria-label')).toBe('Edit 2x4 stud');

    form.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    backend.expectOne('/api/v1/materials/lumber-2x4').flush({ ...MATERIALS[1]!, pricePerSheet: 5.25, source: 'Grading rules, No. 2' });
    await fixture.whenStable();

    expect(element.querySelector('tw-material-form')).toBeNull();
    expect(rowText(element, 'lumber-2x4')[0]).toContain('Source Grading rules, No. 2');
    expect(rowText(element, 'lumber-2x4')[6]).toBe('5.25 per board');
    expect(element.querySelector('[role="status"]')?.textContent).toContain('Saved 2x4 stud.');
  });

  it('closes the form on Cancel without sending anything', async () => {
    const { fixture, backend, element } = await render('owner');
    element.querySelector<HTMLButtonElement>('button[aria-label="Edit Rigid PVC sheet, 1/2 in"]')!.click();
    await fixture.whenStable();
    const cancel = Array.from(element.querySelectorAll<HTMLButtonElement>('tw-material-form button')).find((b) => b.textContent?.trim() === 'Cancel')!;
    cancel.click();
    await fixture.whenStable();
    expect(element.querySelector('tw-material-form')).toBeNull();
    backend.verify();
  });
});
