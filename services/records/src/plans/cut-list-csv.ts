import type { RackPlanResponse } from '../../../../shared/api/rack-plan.js';

/** One field per RFC 4180: quoted when it holds a comma, a quote or a line break; quotes doubled. */
export function csvField(value: string | number): string {
  let text = String(value);
  // A spreadsheet would run a text cell starting with = + - @ as a formula.
  if (typeof value === 'string' && /^[=+\-@\t\r]/.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) || text !== text.trim() ? `"${text.replace(/"/g, '""')}"` : text;
}

export const csvRow = (fields: (string | number)[]) => fields.map(csvField).join(',');

/**
 * The cut list of a result: one row per part, numbered as on the build sheet, lengths in the plan
 * unit and again as fractional inches to 1/16. CRLF line ends (RFC 4180).
 */
export function cutListCsv(result: RackPlanResponse): string {
  const u = result.unit;
  const header = ['Part no.', 'Name', 'Material', `Thickness (${u})`, `Length (${u})`, `Width (${u})`, 'Quantity', 'Section', 'Thickness (in, fraction)', 'Length (in, fraction)', 'Width (in, fraction)', 'Note'];
  const rows = result.parts.map((p, i) => {
    const display = result.display.parts[i];
    return csvRow([i + 1, p.name, p.material, p.thickness, p.length, p.width, p.quantity, p.section ?? 'base', display?.thickness ?? '', display?.length ?? '', display?.width ?? '', p.note ?? '']);
  });
  return [csvRow(header), ...rows].join('\r\n') + '\r\n';
}
