import { formatInches, formatMillimetres } from '../../../../../shared/units.js';
import type { Placement, Rect } from './types.js';

export interface SvgLayout {
  placements: Placement[];
  offcuts: Rect[];
  count: number;
}

export interface SvgOptions {
  unit: 'in' | 'mm';
  stockLength: number;
  /** 0 for a board; the drawing then uses a nominal height. */
  stockWidth: number;
  /** Part names by part index, for the tooltips. */
  partNames: readonly string[];
  title?: string;
}

/** A length in the user's unit: fractions of an inch to 1/16, or millimetres. */
export function formatSize(value: number, unit: 'in' | 'mm'): string {
  return unit === 'in' ? formatInches(value) : formatMillimetres(value);
}

const escapeXml = (s: string) =>
  s.replace(/[<>&"']/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!);

/**
 * One layout as an SVG document in stock coordinates (x right along the length, y down along the
 * width). Parts carry their cut-list number (part index + 1) and their size; offcuts are hatched.
 */
export function layoutSvg(layout: SvgLayout, o: SvgOptions): string {
  const height = o.stockWidth > 0 ? o.stockWidth : o.stockLength / 20;
  const font = Math.max(Math.min(o.stockLength, height) / 14, o.stockLength / 120);
  const n = (v: number) => Math.round(v * 1000) / 1000;
  const label = (l: number, w: number) =>
    o.stockWidth > 0 ? `${formatSize(l, o.unit)} × ${formatSize(w, o.unit)}` : formatSize(l, o.unit);
  const parts = layout.placements.map((p) => {
    const w = o.stockWidth > 0 ? p.width : height;
    const cx = n(p.x + p.length / 2);
    const cy = n(p.y + w / 2);
    const size = n(Math.min(font, w / 2.6, p.length / 5));
    const name = escapeXml(o.partNames[p.part] ?? `part ${p.part + 1}`);
    return (
      `<g class="part"><title>${p.part + 1}: ${name}${p.rotated ? ' (turned)' : ''}</title>` +
      `<rect x="${n(p.x)}" y="${n(p.y)}" width="${n(p.length)}" height="${n(w)}" fill="#d9e8f5" stroke="#1f4e79" stroke-width="${n(font / 12)}"/>` +
      `<text x="${cx}" y="${n(cy - size * 0.15)}" font-size="${size}" text-anchor="middle" font-weight="bold">${p.part + 1}</text>` +
      `<text x="${cx}" y="${n(cy + size * 0.95)}" font-size="${n(size * 0.7)}" text-anchor="middle">${escapeXml(label(p.length, p.width))}</text></g>`
    );
  });
  const offcuts = layout.offcuts.map((r) => {
    const w = o.stockWidth > 0 ? r.width : height;
    const size = n(Math.min(font * 0.7, w / 3, r.length / 6));
    return (
      `<g class="offcut"><rect x="${n(r.x)}" y="${n(r.y)}" width="${n(r.length)}" height="${n(w)}" fill="url(#hatch)" stroke="#888" stroke-width="${n(font / 16)}"/>` +
      `<text x="${n(r.x + r.length / 2)}" y="${n(r.y + w / 2 + size / 3)}" font-size="${size}" text-anchor="middle" fill="#555">${escapeXml(label(r.length, r.width))}</text></g>`
    );
  });
  const title = escapeXml(o.title ?? `${label(o.stockLength, o.stockWidth)} × ${layout.count}`);
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${n(o.stockLength)} ${n(height)}" font-family="sans-serif">` +
    `<title>${title}</title>` +
    `<defs><pattern id="hatch" width="${n(font / 2)}" height="${n(font / 2)}" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">` +
    `<line x1="0" y1="0" x2="0" y2="${n(font / 2)}" stroke="#bbb" stroke-width="${n(font / 10)}"/></pattern></defs>` +
    `<rect x="0" y="0" width="${n(o.stockLength)}" height="${n(height)}" fill="#f4f1ea" stroke="#333" stroke-width="${n(font / 10)}"/>` +
    parts.join('') +
    offcuts.join('') +
    `</svg>`
  );
}
