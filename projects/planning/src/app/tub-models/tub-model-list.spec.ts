import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { authInterceptor, ListQuery, provideTubwrightIcons } from '@tubwright/kit';
import { TubModelList } from './tub-model-list';
import { TubModel } from './tub-model';

const tubs: TubModel[] = [
  { id: 1, name: 'Deep 41', maker: 'Kettleford', lengthIn: 34.125, widthIn: 16.5625, heightIn: 6.5, volumeQt: 41, notes: '', photoId: 5 },
  { id: 2, name: 'Hatchling 6', maker: 'Kettleford', lengthIn: 16, widthIn: 11.25, heightIn: 4.125, volumeQt: null, notes: 'Lids sold apart', photoId: null },
];

let made = 0;
beforeEach(() => {
  made = 0;
  // jsdom has no object URLs.
  URL.createObjectURL = vi.fn(() => `blob:thumbnail-${++made}`);
  URL.revokeObjectURL = vi.fn();
});

async function render(query: ListQuery) {
  TestBed.configureTestingModule({
    providers: [provideHttpClient(withInterceptors([authInterceptor])), provideHttpClientTesting(), provideTubwrightIcons()],
  });
  const fixture = TestBed.createComponent(TubModelList);
  fixture.componentRef.setInput('query', query);
  await fixture.whenStable();
  return { fixture, backend: TestBed.inject(HttpTestingController), element: fixture.nativeElement as HTMLElement };
}

const cells = (element: HTMLElement) =>
  Array.from(element.querySelectorAll('tr.mat-mdc-row')).map((row) =>
    Array.from(row.querySelectorAll('td')).map((td) => td.textContent?.trim()),
  );

describe('TubModelList', () => {
  it('asks for the page the query describes and shows its rows in fractional inches', async () => {
    const { fixture, backend, element } = await render({ q: 'kettle', sort: '-lengthIn', offset: 25, limit: 25 });

    const request = backend.expectOne((r) => r.url === '/api/v1/tub-models');
    expect(request.request.params.toString()).toBe('limit=25&offset=25&sort=-lengthIn&q=kettle');
    request.flush({ items: tubs, total: 27, limit: 25, offset: 25 });
    await fixture.whenStable();
    // Only the tub with a photo asks for its thumbnail.
    backend.expectOne('/api/v1/tub-model-photos/5/thumbnail').flush(new Blob(['x'], { type: 'image/jpeg' }));
    await fixture.whenStable();

    expect(cells(element)).toEqual([
      ['', 'Deep 41', 'Kettleford', '34 1/8 in', '16 9/16 in', '6 1/2 in', '41 qt', ''],
      ['', 'Hatchling 6Lids sold apart', 'Kettleford', '16 in', '11 1/4 in', '4 1/8 in', '—', ''],
    ]);
    const thumbnails = element.querySelectorAll('tr.mat-mdc-row img');
    expect(thumbnails).toHaveLength(1);
    expect(thumbnails[0]?.getAttribute('alt')).toBe('Photo of Deep 41');
    expect(thumbnails[0]?.getAttribute('src')).toBe('blob:thumbnail-1');
    expect(element.querySelector('.mat-mdc-paginator-range-label')?.textContent?.trim()).toBe('26 – 27 of 27');
    backend.verify();
  });

  it('says what went wrong and offers to try again', async () => {
    const { fixture, backend, element } = await render({ q: '', sort: 'name', offset: 0, limit: 25 });
    backend
      .expectOne((r) => r.url === '/api/v1/tub-models')
      .flush({ error: { code: 'forbidden', message: 'Your role may not read tub models.' } }, { status: 403, statusText: 'Forbidden' });
    await fixture.whenStable();

    const banner = element.querySelector('[role="alert"]');
    expect(banner?.textContent).toContain('Your role may not read tub models.');
    (banner?.querySelector('button') as HTMLButtonElement).click();
    await fixture.whenStable();
    backend.expectOne((r) => r.url === '/api/v1/tub-models').flush({ items: [], total: 0, limit: 25, offset: 0 });
    await fixture.whenStable();
    expect(element.querySelector('[role="alert"]')).toBeNull();
    expect(element.textContent).toContain('No tub models yet');
  });

  it('asks for a new sort when a column header is clicked', async () => {
    const { fixture, backend, element } = await render({ q: '', sort: 'name', offset: 0, limit: 25 });
    backend.expectOne((r) => r.url === '/api/v1/tub-models').flush({ items: tubs.map((t) => ({ ...t, photoId: null })), total: 2, limit: 25, offset: 0 });
    await fixture.whenStable();

    const emitted: ListQuery[] = [];
    fixture.componentInstance.queryChange.subscribe((q) => emitted.push(q));
    const lengthHeader = Array.from(element.querySelectorAll<HTMLElement>('th')).find((th) => th.textContent?.includes('Length'));
    lengthHeader?.querySelector<HTMLElement>('.mat-sort-header-container')?.click();
    expect(emitted).toEqual([{ q: '', sort: 'lengthIn', offset: 0, limit: 25 }]);
  });
});
