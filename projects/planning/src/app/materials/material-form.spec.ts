import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import type { ShopMaterial } from '../shared/plan-types';
import { MaterialForm } from './material-form';
import { MATERIALS } from './materials-fixture';

async function render(material: ShopMaterial = MATERIALS[0]!) {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
  const fixture = TestBed.createComponent(MaterialForm);
  fixture.componentRef.setInput('material', material);
  const saved: ShopMaterial[] = [];
  fixture.componentInstance.saved.subscribe((m) => saved.push(m));
  await fixture.whenStable();
  const element = fixture.nativeElement as HTMLElement;
  /** The input inside the form field whose label reads `label`. */
  const field = (label: string) => {
    const formField = Array.from(element.querySelectorAll('mat-form-field')).find((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
    return formField!.querySelector<HTMLInputElement | HTMLTextAreaElement>('input, textarea')!;
  };
  const errorOf = (label: string) => {
    const formField = Array.from(element.querySelectorAll('mat-form-field')).find((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
    return formField!.querySelector('mat-error')?.textContent?.trim() ?? '';
  };
  const type = async (label: string, text: string) => {
    const input = field(label);
    input.value = text;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
    await fixture.whenStable();
  };
  const submit = async () => {
    element.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  };
  return { fixture, element, field, errorOf, type, submit, saved, backend: TestBed.inject(HttpTestingController) };
}

describe('MaterialForm', () => {
  it('starts from the material, lengths in fractional inches', async () => {
    const { field } = await render();
    expect(field('Name').value).toBe('Rigid PVC sheet, 1/2 in');
    expect(field('Thickness').value).toBe('1/2');
    expect(field('Sheet length').value).toBe('96');
    expect(field('Density').value).toBe('1410');
    expect(field('Modulus over heat').value).toBe('2300');
    expect(field('Source of density and modulus').value).toBe('Supplier data sheet');
  });

  it('refuses zero, negative, unreadable and too large values on their fields, and sends nothing', async () => {
    const { type, errorOf, submit, backend, field } = await render();
    await type('Density', '0');
    expect(errorOf('Density')).toBe('Density must be greater than zero');
    await type('Modulus', '-2900');
    expect(errorOf('Modulus')).toBe('Modulus must be greater than zero');
    await type('Thickness', 'half');
    expect(errorOf('Thickness')).toBe('Type inches like 3/4 or 0.75');
    await type('Sheet width', '300');
    expect(errorOf('Sheet width')).toBe('Width is at most 240 in');
    await type('Price per sheet', '-1');
    expect(errorOf('Price per sheet')).toBe('Price must be 0 or more');
    await type('Name', ' ');
    await submit();
    expect(errorOf('Name')).toBe('A name is required');
    expect(field('Density').getAttribute('aria-invalid')).toBe('true');
    backend.expectNone(() => true);
  });

  it('sends the whole material with typed fractions read as inches and a blank heated modulus as unknown', async () => {
    const { type, submit, backend, saved } = await render();
    await type('Thickness', '3/4');
    await type('Density', '1400.5');
    await type('Modulus over heat', '');
    await type('Price per sheet', '0');
    await submit();

    const request = backend.expectOne('/api/v1/materials/pvc-rigid');
    expect(request.request.method).toBe('PUT');
    expect(request.request.body).toEqual({
      label: 'Rigid PVC sheet, 1/2 in',
      kind: 'sheet',
      thicknessIn: 0.75,
      densityKgM3: 1400.5,
      modulusMPa: 2900,
      heatedModulusMPa: null,
      source: 'Supplier data sheet',
      pricePerSheet: 0,
      sheetLengthIn: 96,
      sheetWidthIn: 48,
    });
    const answer = { ...MATERIALS[0]!, thicknessIn: 0.75, densityKgM3: 1400.5, heatedModulusMPa: null, pricePerSheet: 0 };
    request.flush(answer);
    await Promise.resolve();
    expect(saved).toEqual([answer]);
  });

  it('puts an error the API names on its field, in the form’s words', async () => {
    const { submit, backend, errorOf, element, fixture } = await render();
    await submit();
    backend
      .expectOne('/api/v1/materials/pvc-rigid')
      .flush({ error: { code: 'validation', message: 'densityKgM3: densityKgM3 is too large', field: 'densityKgM3' } }, { status: 400, statusText: 'Bad Request' });
    await fixture.whenStable();
    expect(errorOf('Density')).toBe('Density is too large');
    expect(element.querySelector('[role="alert"]')?.textContent).toContain('see the marked field');
  });

  it('names a board’s sizes as a board’s', async () => {
    const { field } = await render(MATERIALS[1]);
    expect(field('Board length').value).toBe('96');
    expect(field('Face width').value).toBe('3 1/2');
    expect(field('Modulus over heat').value).toBe('');
  });
});
