import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { AuthSession, NAVIGATE_EVENT, Role } from '@tubwright/kit';
import type { StockItem } from '../core/orders-types';
import { StockForm } from './stock-form';

const sheet: StockItem = {
  id: 9, kind: 'sheet', material: 'pvc-rigid', description: 'Offcut strips', lengthIn: 41, widthIn: 23.5,
  quantity: 2, offcut: true, location: 'offcut bin', createdAt: '2026-12-02T10:00:00.000Z',
};

function open(role: Role, inputs: { id?: number; startKind?: StockItem['kind']; startOffcut?: boolean } = {}) {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
  TestBed.inject(AuthSession).adopt({ accessToken: 'a', refreshToken: 'r', expiresIn: 900, user: { id: 1, email: `${role}@demo.tubwright.test`, name: role, role } });
  const fixture = TestBed.createComponent(StockForm);
  for (const [name, value] of Object.entries(inputs)) fixture.componentRef.setInput(name, value);
  fixture.detectChanges();
  const element = fixture.nativeElement as HTMLElement;
  const navigations: string[] = [];
  element.addEventListener(NAVIGATE_EVENT, (e) => navigations.push((e as CustomEvent<{ path: string }>).detail.path));
  const field = (label: string) => {
    const formField = Array.from(element.querySelectorAll('mat-form-field')).find((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
    if (!formField) throw new Error(`no field ${label}`);
    return formField as HTMLElement;
  };
  const type = (label: string, text: string) => {
    const input = field(label).querySelector('input')!;
    input.value = text;
    input.dispatchEvent(new Event('input'));
    fixture.detectChanges();
  };
  const problem = (label: string) => {
    fixture.detectChanges();
    return field(label).querySelector('.tw-field-error')?.textContent?.trim() ?? null;
  };
  const submit = () => {
    element.querySelector('form')!.dispatchEvent(new Event('submit'));
    fixture.detectChanges();
  };
  return { fixture, element, http: TestBed.inject(HttpTestingController), type, problem, submit, field, navigations };
}

describe('StockForm', () => {
  afterEach(() => localStorage.clear());

  it('asks a new sheet for its length and width before sending anything', () => {
    const { http, problem, submit, type } = open('builder', { startKind: 'sheet' });
    submit();
    expect(problem('Length')).toBe('Enter the length');
    expect(problem('Width')).toBe('Enter the width');
    type('Length', 'long');
    type('Pieces on hand', '2.5');
    submit();
    expect(problem('Length')).toMatch(/^Enter a length in inches/);
    expect(problem('Pieces on hand')).toBe('Enter whole pieces from 0 to 100000');
    type('Length', '21 ft');
    expect(problem('Length')).toBe('Enter at most 240 in (6096 mm)');
    http.expectNone('/api/v1/stock');
  });

  it('records an offcut with its size read from inches, feet or millimetres', () => {
    const { element, http, submit, type, navigations } = open('builder', { startKind: 'sheet', startOffcut: true });
    expect(element.querySelector('h1')?.textContent).toContain('Record an offcut');
    expect(element.querySelector<HTMLInputElement>('input[type=checkbox]')!.checked).toBe(true);
    type('Length', '5 ft');
    // 596.9 mm / 25.4 = 23.5 in exactly (NIST SP 811)
    type('Width', '596.9 mm');
    type('Pieces on hand', '1');
    type('Location', ' offcut bin ');
    submit();
    const request = http.expectOne('/api/v1/stock');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toMatchObject({ kind: 'sheet', material: 'pvc-rigid', lengthIn: 60, quantity: 1, offcut: true, location: 'offcut bin' });
    expect(request.request.body.widthIn).toBeCloseTo(23.5, 9);
    request.flush({ ...sheet, id: 12, lengthIn: 60, quantity: 1 });
    expect(navigations).toEqual(['stock?kind=sheet']);
  });

  it('sends a board without a width and hardware without sizes', () => {
    const { element, http, submit, type, fixture } = open('owner', { startKind: 'board' });
    expect(element.textContent).not.toContain('Width');
    type('Length', '96');
    type('Pieces on hand', '18');
    submit();
    http.expectOne('/api/v1/stock').flush({ ...sheet, kind: 'board', material: 'lumber-2x4', widthIn: null });

    const hardware = Array.from(element.querySelectorAll<HTMLInputElement>('input[type=radio]')).find((r) => r.value === 'hardware')!;
    hardware.click();
    fixture.detectChanges();
    submit();
    expect(element.textContent).toContain('Name the item');
    type('Item', 'Caster, 3 in');
    type('On hand (units as priced)', '24');
    submit();
    const request = http.expectOne('/api/v1/stock');
    expect(request.request.body).toMatchObject({ kind: 'hardware', material: 'Caster, 3 in', lengthIn: null, widthIn: null, quantity: 24, offcut: false });
  });

  it('puts the server’s complaint on the field it names', () => {
    const { http, problem, submit, type } = open('builder', { startKind: 'sheet' });
    type('Length', '96');
    type('Width', '48');
    submit();
    http.expectOne('/api/v1/stock').flush(
      { error: { code: 'invalid_input', message: 'must be one of pvc-rigid, plywood for a sheet', field: 'material' } },
      { status: 400, statusText: 'Bad Request' },
    );
    expect(problem('Material')).toBe('must be one of pvc-rigid, plywood for a sheet');
  });

  it('changes only the count, place and description of a recorded item', () => {
    const { element, http, submit, type, fixture, problem } = open('builder', { id: 9 });
    http.expectOne('/api/v1/stock/9').flush(sheet);
    http.expectOne((r) => r.url === '/api/v1/stock-reservations' && r.params.get('stockItemId') === '9').flush({
      items: [{ id: 3, stockItemId: 9, orderId: 5, orderNumber: 'O-2026-0005', quantity: 1, createdBy: 'builder@demo.tubwright.test', createdAt: '2026-12-02T11:00:00.000Z' }],
    });
    fixture.detectChanges();
    expect(element.textContent).toContain('41 x 23 1/2 in');
    expect(element.textContent).toContain('O-2026-0005');
    expect(element.textContent).toContain('Release what orders hold first.');
    type('Pieces on hand', '-1');
    submit();
    expect(problem('Pieces on hand')).toBe('Enter whole pieces from 0 to 100000');
    type('Pieces on hand', '3');
    submit();
    const request = http.expectOne('/api/v1/stock/9');
    expect(request.request.method).toBe('PATCH');
    expect(request.request.body).toEqual({ description: 'Offcut strips', quantity: 3, location: 'offcut bin' });
  });

  it('shows sales the item without a way to change it', () => {
    const { element, http, fixture } = open('sales', { id: 9 });
    http.expectOne('/api/v1/stock/9').flush(sheet);
    http.expectOne((r) => r.url === '/api/v1/stock-reservations').flush({ items: [] });
    fixture.detectChanges();
    expect(element.textContent).toContain('Only the owner and builders change stock.');
    expect(Array.from(element.querySelectorAll('button')).map((b) => b.textContent!.trim())).toEqual([]);
  });
});
