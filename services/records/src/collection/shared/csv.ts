import { parse } from 'csv-parse/sync';
import type { Request } from 'express';
import { ApiError, ValidationError } from '../../../../common/src/errors.js';

export interface CsvRow {
  /** Line of the file, the header being line 1. */
  line: number;
  values: Record<string, string>;
}

/** RFC 4180 text with a header row; quoted fields may hold commas, quotes and line breaks. */
export function parseCsv(text: string, expected: readonly string[], required: readonly string[]): CsvRow[] {
  let records: { record: Record<string, string>; info: { lines: number } }[];
  let header: string[] = [];
  try {
    const columns = (names: string[]) => (header = names);
    records = parse(text, { columns, skip_empty_lines: true, trim: true, bom: true, info: true }) as never;
  } catch (err) {
    const e = err as { message: string; lines?: number };
    throw new ValidationError(`The CSV cannot be read${e.lines ? ` at line ${e.lines}` : ''}: ${e.message}`, 'csv');
  }
  const unknown = header.filter((h) => !expected.includes(h));
  if (unknown.length) throw new ValidationError(`Unknown column ${unknown[0]}; the columns are ${expected.join(', ')}.`, 'csv');
  const missing = required.filter((h) => !header.includes(h));
  if (missing.length) throw new ValidationError(`Column ${missing[0]} is missing; the columns are ${expected.join(', ')}.`, 'csv');
  if (records.length === 0) throw new ValidationError('The CSV has a header but no rows.', 'csv');
  return records.map((r) => ({ line: r.info.lines, values: r.record }));
}

/** The request's CSV text; 415 when it was sent as something else. */
export function csvBody(req: Request): string {
  if (!req.is('text/csv') || typeof req.body !== 'string') {
    throw new ApiError(415, 'unsupported_media_type', 'Send the file as the request body with Content-Type: text/csv.');
  }
  return req.body;
}

// A cell that starts like a formula is prefixed so a spreadsheet shows it instead of running it.
const FORMULA_START = /^[=+\-@\t\r]/;

function cell(value: unknown): string {
  if (value === null || value === undefined) return '';
  let text = typeof value === 'number' || typeof value === 'boolean' ? String(value) : String(value);
  if (typeof value === 'string' && FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** RFC 4180 output: CRLF line ends, a header row, fields quoted when they need it. */
export function toCsv(columns: readonly string[], rows: readonly Record<string, unknown>[]): string {
  return [columns.join(','), ...rows.map((r) => columns.map((c) => cell(r[c])).join(','))].join('\r\n') + '\r\n';
}
