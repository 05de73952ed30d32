import { describe, expect, it } from 'vitest';
import { formatSize, layoutSvg } from './svg.js';

describe('svg', () => {
  const layout = {
    count: 2,
    placements: [{ part: 0, x: 0, y: 0, length: 63.625, width: 23.5, rotated: false }],
    offcuts: [{ x: 63.75, y: 0, length: 32.25, width: 23.5 }],
  };

  it('labels parts with their cut-list number and size in fractional inches', () => {
    const svg = layoutSvg(layout, { unit: 'in', stockLength: 96, stockWidth: 48, partNames: ['side <panel>'] });
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg).toContain('viewBox="0 0 96 48"');
    expect(svg).toContain('>1</text>');
    expect(svg).toContain('63 5/8 × 23 1/2');
    expect(svg).toContain('32 1/4 × 23 1/2');
    expect(svg).toContain('side &lt;panel&gt;');
  });

  it('labels millimetres in millimetres', () => {
    expect(formatSize(1616.075, 'mm')).toBe('1616.1');
    expect(formatSize(0.0625, 'in')).toBe('1/16');
  });
});
