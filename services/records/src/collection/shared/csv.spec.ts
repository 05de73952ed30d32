import { describe, expect, it } from 'vitest';
import { parseCsv, toCsv } from './csv.js';

describe('CSV in and out (RFC 4180)', () => {
  it('reads quoted fields with commas, quotes and line breaks, and keeps file line numbers', () => {
    const rows = parseCsv('code,notes\r\nA-1,"calm, eats well"\r\nA-2,"says ""hi""\nwith a break"\r\nA-3,\r\n', ['code', 'notes'], ['code']);
    expect(rows.map((r) => r.values.notes)).toEqual(['calm, eats well', 'says "hi"\nwith a break', '']);
    expect(rows.map((r) => r.line)).toEqual([2, 4, 5]);
  });

  it('names an unknown or missing column and an unreadable file', () => {
    expect(() => parseCsv('code,colour\nA,red\n', ['code'], ['code'])).toThrow(/Unknown column colour/);
    expect(() => parseCsv('notes\nx\n', ['code', 'notes'], ['code'])).toThrow(/Column code is missing/);
    expect(() => parseCsv('code,notes\nA,"open\n', ['code', 'notes'], ['code'])).toThrow(/cannot be read/);
    expect(() => parseCsv('code\n', ['code'], ['code'])).toThrow(/no rows/);
  });

  it('writes CRLF lines, quotes when needed and defuses formulas', () => {
    expect(toCsv(['a', 'b', 'c'], [{ a: 'x,y', b: 'say "no"', c: 3 }, { a: '=SUM(A1)', b: null, c: -2 }])).toBe('a,b,c\r\n"x,y","say ""no""",3\r\n\'=SUM(A1),,-2\r\n');
  });
});
