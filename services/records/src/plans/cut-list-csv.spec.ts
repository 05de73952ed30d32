import { parse as parseCsv } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { csvField, csvRow } from './cut-list-csv.js';

describe('CSV fields (RFC 4180)', () => {
  it('quotes commas, quotes and line breaks, doubling quotes', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a, b')).toBe('"a, b"');
    expect(csvField('12" shelf')).toBe('"12"" shelf"');
    expect(csvField('two\r\nlines')).toBe('"two\r\nlines"');
    expect(csvField(0.125)).toBe('0.125');
  });

  it('round-trips through an independent CSV parser', () => {
    const fields = ['support block, front (wide)', 'say "hi"', 'line\nbreak', ' padded ', '1 1/2'];
    expect(parseCsv(csvRow(fields), { relax_column_count: false })).toEqual([fields]);
  });

  it('keeps spreadsheet formulas from running', () => {
    expect(csvField('=SUM(A1)')).toBe("'=SUM(A1)");
    expect(csvField(-1)).toBe('-1');
  });
});
