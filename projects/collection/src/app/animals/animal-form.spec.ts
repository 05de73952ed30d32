import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import type { AnimalProfile, SpeciesList } from '../core/collection-types';
import { AnimalForm } from './animal-form';
import type { Animal } from './animal';

const SPECIES: SpeciesList = { items: [{ name: 'Python regius', commonName: 'ball python', animalCount: 3, ranges: null }], total: 1, alertRanges: '', caution: '' };
const ANIMAL: Animal = { id: 7, code: 'PR-700', name: 'Moss', species: 'Python regius', morph: '', sex: 'female', hatchDate: '2025-06-01', weightG: 410, status: 'active', location: '', notes: 'calm' };
const PROFILE: AnimalProfile = {
  animal: ANIMAL, origin: 'acquired', acquiredFrom: 'a show', sireId: null, damId: null, clutchId: null, feedingIntervalDays: 10, forSale: false, currentTub: null, genes: [],
};
const tomorrow = () => new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);

describe('AnimalForm', () => {
  let http: HttpTestingController;

  async function open(animalId: number | null = null) {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
    http = TestBed.inject(HttpTestingController);
    const fixture = TestBed.createComponent(AnimalForm);
    fixture.componentRef.setInput('animalId', animalId);
    const navigations: string[] = [];
    fixture.nativeElement.addEventListener('tw-navigate', (e: CustomEvent<{ path: string }>) => navigations.push(e.detail.path));
    TestBed.tick();
    http.expectOne('/api/v1/environment/species').flush(SPECIES);
    if (animalId) http.expectOne(`/api/v1/animals/${animalId}/profile`).flush(PROFILE);
    await fixture.whenStable();
    const root = fixture.nativeElement as HTMLElement;
    const field = (label: string) => {
      const formField = Array.from(root.querySelectorAll('mat-form-field')).find((f) => f.querySelector('mat-label')?.textContent?.trim() === label)!;
      return formField.querySelector<HTMLInputElement | HTMLSelectElement>('input, select, textarea')!;
    };
    const type = async (label: string, value: string) => {
      const input = field(label);
      input.value = value;
      input.dispatchEvent(new Event(input instanceof HTMLSelectElement ? 'change' : 'input'));
      input.dispatchEvent(new Event('blur'));
      await fixture.whenStable();
    };
    const errorUnder = (label: string) => field(label).closest('mat-form-field')!.querySelector('mat-error')?.textContent?.trim() ?? '';
    const submit = async () => {
      root.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
      await fixture.whenStable();
    };
    return { fixture, root, field, type, errorUnder, submit, navigations };
  }

  afterEach(() => http.verify());

  it('names the missing code and refuses a future hatch date without calling the API', async () => {
    const { type, errorUnder, submit, root } = await open();
    await type('Hatch date', tomorrow());
    await submit();
    expect(errorUnder('Code')).toMatch(/A code is required/);
    expect(errorUnder('Hatch date')).toBe('A hatch date cannot be in the future');
    expect(root.textContent).toContain('Check the fields marked in red.');
    http.expectNone('/api/v1/animals');
  });

  it('refuses a feeding interval outside 1 to 90 days and a sold animal offered for sale', async () => {
    const { type, errorUnder, submit, root, fixture } = await open();
    await type('Code', 'PR-900');
    await type('Feeding interval', '0');
    await type('Status', 'sold');
    root.querySelector<HTMLInputElement>('mat-checkbox input')!.click();
    await fixture.whenStable();
    await submit();
    expect(errorUnder('Feeding interval')).toBe('Whole days from 1 to 90, or blank for the default');
    expect(root.querySelector('.field-error')?.textContent).toContain('A sold animal cannot be offered for sale');
    http.expectNone('/api/v1/animals');
  });

  it('adds an animal, then saves its origin and parents in the same save, and opens its page', async () => {
    const { type, submit, navigations, root, fixture } = await open();
    await type('Code', 'PR-901');
    await type('Name', 'Fern');
    await type('Sex', 'female');
    await type('Hatch date', '2026-07-01');
    root.querySelector<HTMLInputElement>('mat-radio-button[value="bred"] input')!.click();
    // Not whenStable(): the open request for the parents keeps the fixture busy until flushed.
    TestBed.tick();
    const parents = http.expectOne((r) => r.url === '/api/v1/animals' && r.method === 'GET');
    parents.flush({ items: [{ ...ANIMAL, id: 1, code: 'PR-001', sex: 'male' }, { ...ANIMAL, id: 2, code: 'PR-002', sex: 'female' }], total: 2, limit: 200, offset: 0 });
    await fixture.whenStable();
    const sire = Array.from(root.querySelectorAll('option')).find((o) => o.textContent?.startsWith('PR-001'))!;
    expect(Array.from(root.querySelectorAll('option')).some((o) => o.textContent?.startsWith('PR-002') && o.closest('select') === sire.closest('select'))).toBe(false); // females are not offered as sire
    const sireSelect = sire.closest('select')!;
    sireSelect.value = sire.value;
    sireSelect.dispatchEvent(new Event('change'));
    await submit();

    const post = http.expectOne((r) => r.url === '/api/v1/animals' && r.method === 'POST');
    expect(post.request.body).toEqual({ code: 'PR-901', name: 'Fern', species: 'Python regius', morph: '', sex: 'female', hatchDate: '2026-07-01', status: 'active', notes: '' });
    post.flush({ ...ANIMAL, id: 12, code: 'PR-901' });
    const profile = http.expectOne('/api/v1/animals/12/profile');
    expect(profile.request.method).toBe('PATCH');
    expect(profile.request.body).toEqual({ origin: 'bred', acquiredFrom: '', sireId: 1, damId: null, feedingIntervalDays: null, forSale: false });
    profile.flush({ ...PROFILE, animal: { ...ANIMAL, id: 12 } });
    await Promise.resolve();
    expect(navigations).toEqual(['animals/12']);
  });

  it('shows the API\'s field error under the field (a code in use)', async () => {
    const { type, submit, errorUnder, navigations, fixture } = await open();
    await type('Code', 'PR-001');
    await submit();
    http
      .expectOne((r) => r.url === '/api/v1/animals' && r.method === 'POST')
      .flush({ error: { code: 'conflict', message: 'Code PR-001 is in use; pick another.', field: 'code' } }, { status: 409, statusText: 'Conflict' });
    await fixture.whenStable();
    expect(errorUnder('Code')).toBe('Code PR-001 is in use; pick another.');
    expect(navigations).toEqual([]);
  });

  it('edits an animal: fills the form from its profile and saves both parts', async () => {
    const { field, type, submit, navigations } = await open(7);
    expect(field('Code').value).toBe('PR-700');
    expect(field('Acquired from').value).toBe('a show');
    expect(field('Feeding interval').value).toBe('10');
    await type('Name', 'Moss II');
    await submit();
    const patch = http.expectOne('/api/v1/animals/7');
    expect(patch.request.method).toBe('PATCH');
    expect(patch.request.body).toMatchObject({ code: 'PR-700', name: 'Moss II', hatchDate: '2025-06-01', notes: 'calm' });
    patch.flush({ ...ANIMAL, name: 'Moss II' });
    const profile = http.expectOne('/api/v1/animals/7/profile');
    expect(profile.request.body).toEqual({ origin: 'acquired', acquiredFrom: 'a show', sireId: null, damId: null, feedingIntervalDays: 10, forSale: false });
    profile.flush(PROFILE);
    await Promise.resolve();
    expect(navigations).toEqual(['animals/7']);
  });
});
