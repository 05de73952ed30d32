import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideTubwrightIcons } from '@tubwright/kit';
import type { ImportPreview } from '../core/collection-types';
import { AnimalImportPage } from './animal-import-page';
import { previewRows, templateCsv } from './animal-csv';

const BAD_CSV = 'code,species,weightG\nIM-1,Python regius,410\nIM-2,Python regius,-3\nPR-001,Python regius,\n';
const GOOD_CSV = 'code,species,weightG\nIM-1,Python regius,410\nIM-2,Python regius,300\n';
const BAD: ImportPreview = {
  ok: false,
  rowCount: 3,
  errors: [
    { row: 3, field: 'weightG', message: 'Too small: expected number to be >0' },
    { row: 4, field: 'code', message: 'PR-001 is in the collection already' },
  ],
  animals: [
    { row: 2, code: 'IM-1', name: '', species: 'Python regius' },
    { row: 4, code: 'PR-001', name: '', species: 'Python regius' },
  ],
};
const GOOD: ImportPreview = {
  ok: true,
  rowCount: 2,
  errors: [],
  animals: [
    { row: 2, code: 'IM-1', name: '', species: 'Python regius' },
    { row: 3, code: 'IM-2', name: '', species: 'Python regius' },
  ],
};

describe('previewRows', () => {
  it('lists every row in file order, the unreadable ones by their problems', () => {
    expect(previewRows(BAD).map((r) => [r.row, r.code, r.problems.map((p) => p.field)])).toEqual([
      [2, 'IM-1', []],
      [3, '', ['weightG']],
      [4, 'PR-001', ['code']],
    ]);
  });

  it('names an unreadable row by the cells of its line, quoted cells and line breaks included', () => {
    const csv = 'code,name,species,weightG\r\nIM-1,"Fig, the ""second""",Python regius,410\r\nIM-2,"two\nlines",Python regius,-3\r\n\r\nIM-3,,Python regius,x\r\n';
    const preview: ImportPreview = {
      ok: false,
      rowCount: 3,
      errors: [
        { row: 4, field: 'weightG', message: 'too small' },
        { row: 6, field: 'weightG', message: 'not a number' },
      ],
      animals: [{ row: 2, code: 'IM-1', name: 'Fig, the "second"', species: 'Python regius' }],
    };
    expect(previewRows(preview, csv).map((r) => [r.row, r.code, r.name])).toEqual([
      [2, 'IM-1', 'Fig, the "second"'],
      [4, 'IM-2', 'two\nlines'],
      [6, 'IM-3', ''],
    ]);
  });

  it('offers a template with the import\'s header row', () => {
    // The columns of services/records/src/collection/import-export/animal-import.ts.
    expect(templateCsv()).toBe('code,name,species,morph,sex,hatchDate,weightG,status,notes,origin,acquiredFrom,forSale,feedingIntervalDays\r\n');
  });
});

describe('AnimalImportPage', () => {
  let http: HttpTestingController;

  async function open() {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTubwrightIcons()] });
    http = TestBed.inject(HttpTestingController);
    const fixture = TestBed.createComponent(AnimalImportPage);
    await fixture.whenStable();
    const root = fixture.nativeElement as HTMLElement;
    const choose = async (name: string, text: string) => {
      const input = root.querySelector<HTMLInputElement>('input[type=file]')!;
      Object.defineProperty(input, 'files', { value: [new File([text], name, { type: 'text/csv' })], configurable: true });
      input.dispatchEvent(new Event('change'));
      // file.text() resolves on a later task
      await new Promise((resolve) => setTimeout(resolve));
    };
    const importButton = () => Array.from(root.querySelectorAll<HTMLButtonElement>('button')).find((b) => b.textContent?.trim().startsWith('Import'))!;
    return { fixture, root, choose, importButton };
  }

  afterEach(() => http.verify());

  it('shows each bad row and field, and keeps the import shut until the file is clean', async () => {
    const { fixture, root, choose, importButton } = await open();
    await choose('animals.csv', BAD_CSV);
    const preview = http.expectOne('/api/v1/collection/animals/import/preview');
    expect(preview.request.body).toBe(BAD_CSV);
    expect(preview.request.headers.get('Content-Type')).toBe('text/csv');
    preview.flush(BAD);
    await fixture.whenStable();

    expect(root.querySelector('[role=alert]')?.textContent).toMatch(/2 of 3 rows need fixing \(2 problems\)/);
    const rows = Array.from(root.querySelectorAll('table[aria-label="Rows of the file"] tbody tr'));
    expect(rows.map((r) => r.classList.contains('bad'))).toEqual([false, true, true]);
    expect(rows[1]!.textContent).toMatch(/IM-2[\s\S]*weightG: Too small/);
    expect(rows[2]!.textContent).toContain('code: PR-001 is in the collection already');
    expect(importButton().disabled).toBe(true);
    importButton().click();
    http.expectNone('/api/v1/collection/animals/import');
  });

  it('checks the corrected file again, imports exactly the text it checked, and links the new animals', async () => {
    const { fixture, root, choose, importButton } = await open();
    await choose('animals.csv', BAD_CSV);
    http.expectOne('/api/v1/collection/animals/import/preview').flush(BAD);
    await choose('animals-fixed.csv', GOOD_CSV);
    http.expectOne('/api/v1/collection/animals/import/preview').flush(GOOD);
    await fixture.whenStable();
    expect(root.textContent).toContain('All 2 rows are ready to import.');
    expect(importButton().disabled).toBe(false);

    importButton().click();
    const post = http.expectOne('/api/v1/collection/animals/import');
    expect(post.request.body).toBe(GOOD_CSV);
    post.flush({ imported: 2, ids: [41, 42] });
    await fixture.whenStable();
    expect(root.querySelector('#done-heading')?.textContent).toBe('Imported 2 animals');
    const links = Array.from(root.querySelectorAll<HTMLAnchorElement>('.links a'));
    expect(links.map((a) => [a.textContent, a.getAttribute('href')])).toEqual([
      ['IM-1', '/animals/41'],
      ['IM-2', '/animals/42'],
    ]);
  });

  it('says why a file cannot be read, and that nothing was imported when the import is refused', async () => {
    const { fixture, root, choose, importButton } = await open();
    await choose('animals.csv', 'code,colour\nA,red\n');
    http
      .expectOne('/api/v1/collection/animals/import/preview')
      .flush({ error: { code: 'invalid_input', message: 'Unknown column colour; the columns are code, name, species.', field: 'csv' } }, { status: 400, statusText: 'Bad Request' });
    await fixture.whenStable();
    expect(root.textContent).toContain('Unknown column colour');

    await choose('animals.csv', GOOD_CSV);
    http.expectOne('/api/v1/collection/animals/import/preview').flush(GOOD);
    await fixture.whenStable();
    importButton().click();
    // Someone took a code between the check and the import: all or nothing.
    http
      .expectOne('/api/v1/collection/animals/import')
      .flush({ error: { code: 'unprocessable', message: 'Line 2, code: IM-1 is in the collection already.', field: 'csv[2].code' } }, { status: 422, statusText: 'Unprocessable' });
    await fixture.whenStable();
    expect(root.textContent).toMatch(/IM-1 is in the collection already\..*Nothing was imported\./);
  });
});
