import { describe, expect, it } from 'vitest';
import { RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { planRack } from '../../../calculator/src/domain/rack-plan.js';
import { buildSheetPdf, type BuildSheetPlan } from './build-sheet.js';
import { pdfText } from './pdf-text.js';

const sheetFor = (input: unknown): BuildSheetPlan => {
  const spec = RackPlanRequest.parse(input);
  return { id: 7, name: 'Bench plan', version: 3, notes: 'for the test', tubModelName: null, spec, result: planRack(spec) };
};
const tall = sheetFor({ tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 14, columns: 3 } });

describe('build sheet PDF', () => {
  it('writes uncompressed text with the built-in font when asked, part names readable as bytes', async () => {
    const pdf = await buildSheetPdf(tall, { compress: false, fontDir: null, date: new Date('2026-12-02T10:00:00Z') });
    const raw = pdf.toString('latin1');
    expect(raw.startsWith('%PDF-')).toBe(true);
    expect(raw).not.toContain('/FlateDecode');
    // Built-in fonts write each string as hex bytes of the text itself.
    expect(raw).toContain(Buffer.from('side panel', 'latin1').toString('hex'));
    expect(pdfText(pdf)).toContain('printed 2026-12-02');
  });

  it('prints upper sections with their dowels and numbers every page', async () => {
    expect(tall.result.sections.length).toBeGreaterThan(1);
    const text = pdfText(await buildSheetPdf(tall));
    for (const s of tall.result.sections.slice(1)) expect(text).toContain(`Section ${s.index} (${s.levels} levels)`);
    const pages = [...text.matchAll(/page (\d+) of (\d+)/g)];
    expect(pages.length).toBeGreaterThan(1);
    expect(pages.map((m) => Number(m[1]))).toEqual(pages.map((_, i) => i + 1));
    expect(new Set(pages.map((m) => m[2]))).toEqual(new Set([String(pages.length)]));
  });

  it('gives lengths in millimetres for a metric plan', async () => {
    const metric = sheetFor({ unit: 'mm', tub: { length: 584.2, width: 412.75, height: 165.1 }, layout: { levels: 3, columns: 2 } });
    const text = pdfText(await buildSheetPdf(metric));
    expect(text).toContain('lengths in millimetres');
    // 23 in tub length = 584.2 mm (1 in = 25.4 mm exactly, NIST SP 811).
    expect(text).toContain('584.2 mm long');
  });
});
