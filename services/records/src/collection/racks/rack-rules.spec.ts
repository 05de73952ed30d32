import { describe, expect, it } from 'vitest';
import { columnLetter, tubLabel, tubSlots } from './rack-rules.js';

describe('tub labels', () => {
  it('letters columns like a spreadsheet', () => {
    expect([1, 2, 26, 27, 28].map(columnLetter)).toEqual(['A', 'B', 'Z', 'AA', 'AB']);
  });

  it('labels a slot by rack, level from the top and column', () => {
    expect(tubLabel('R2', 3, 2)).toBe('R2-3B');
  });

  it('lists levels x columns slots, top level first, each label once', () => {
    const slots = tubSlots('R1', 6, 2);
    expect(slots).toHaveLength(12);
    expect(slots[0]).toEqual({ level: 1, column: 1, label: 'R1-1A' });
    expect(slots[11]).toEqual({ level: 6, column: 2, label: 'R1-6B' });
    expect(new Set(slots.map((s) => s.label)).size).toBe(12);
  });
});
