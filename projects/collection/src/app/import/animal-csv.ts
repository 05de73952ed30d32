import type { ImportPreview } from '../core/collection-types';

/*
 * The columns POST /collection/animals/import reads (the export writes the same ones), in the
 * records service's order; the API document lists them with the import routes.
 */
export const ANIMAL_CSV_COLUMNS: readonly { name: string; required: boolean; takes: string }[] = [
  { name: 'code', required: true, takes: 'the shop\'s own ID, unique in the collection' },
  { name: 'name', required: false, takes: 'any name' },
  { name: 'species', required: true, takes: 'scientific name, e.g. Python regius' },
  { name: 'morph', required: false, takes: 'genes as written' },
  { name: 'sex', required: false, takes: 'male, female or unknown (blank: unknown)' },
  { name: 'hatchDate', required: false, takes: 'a date like 2025-06-14, not in the future' },
  { name: 'weightG', required: false, takes: 'latest weight in whole grams' },
  { name: 'status', required: false, takes: 'active, on-hold, sold or deceased (blank: active)' },
  { name: 'notes', required: false, takes: 'free text' },
  { name: 'origin', required: false, takes: 'bred, acquired or unknown (blank: unknown)' },
  { name: 'acquiredFrom', required: false, takes: 'who it came from' },
  { name: 'forSale', required: false, takes: 'yes or no (blank: no)' },
  { name: 'feedingIntervalDays', required: false, takes: 'whole days, 1 to 90 (blank: by age)' },
];

/** A template to fill in: the header row only, CRLF as RFC 4180 writes it. */
export function templateCsv(): string {
  return `${ANIMAL_CSV_COLUMNS.map((c) => c.name).join(',')}\r\n`;
}

export interface PreviewRow {
  /** Line of the file, the header being line 1. */
  row: number;
  code: string;
  name: string;
  species: string;
  problems: { field: string; message: string }[];
}

/**
 * The file's records by the line each ends on (the line the service reports), as header name →
 * cell. RFC 4180: quoted cells may hold commas, doubled quotes and line breaks. Only to show the
 * keeper which animal a row the service could not read is; the service's reading is the record.
 */
export function csvRecordsByLine(text: string): Map<number, Record<string, string>> {
  const records: { line: number; cells: string[] }[] = [];
  let cells: string[] = [];
  let cell = '';
  let quoted = false;
  let line = 1;
  const src = text.replace(/^\uFEFF/, '');
  const endRecord = () => {
    cells.push(cell.trim());
    if (cells.some((c) => c !== '')) records.push({ line, cells });
    cells = [];
    cell = '';
  };
  for (let i = 0; i < src.length; i++) {
    const ch = src[i]!;
    if (quoted) {
      if (ch === '"' && src[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else {
        if (ch === '\n') line++;
        cell += ch;
      }
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      cells.push(cell.trim());
      cell = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && src[i + 1] === '\n') i++;
      endRecord();
      line++;
    } else cell += ch;
  }
  if (cell !== '' || cells.length) endRecord();
  const [header, ...rows] = records;
  const byLine = new Map<number, Record<string, string>>();
  for (const r of rows) byLine.set(r.line, Object.fromEntries((header?.cells ?? []).map((name, i) => [name, r.cells[i] ?? ''])));
  return byLine;
}

/**
 * One line per row of the file, in file order: the rows the service could read (with any clash it
 * found) and the rows it could not (known by their problems, and by their cells in `csv` if given).
 */
export function previewRows(preview: ImportPreview, csv = ''): PreviewRow[] {
  const rows = new Map<number, PreviewRow>();
  const cellsByLine = csv ? csvRecordsByLine(csv) : new Map<number, Record<string, string>>();
  for (const a of preview.animals) rows.set(a.row, { row: a.row, code: a.code, name: a.name, species: a.species, problems: [] });
  for (const e of preview.errors) {
    const cells = cellsByLine.get(e.row) ?? {};
    const row = rows.get(e.row) ?? { row: e.row, code: cells['code'] ?? '', name: cells['name'] ?? '', species: cells['species'] ?? '', problems: [] };
    row.problems.push({ field: e.field, message: e.message });
    rows.set(e.row, row);
  }
  return [...rows.values()].sort((a, b) => a.row - b.row);
}
