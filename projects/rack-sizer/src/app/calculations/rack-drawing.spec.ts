import { planFixture } from '../../testing/plan-fixture';
import { rackDrawing } from './rack-drawing';

describe('rackDrawing', () => {
  const tub = { width: 16.25, height: 6.5, levels: 9, columns: 3 };
  const drawing = rackDrawing(planFixture(), tub);

  it('is as large as the rack, in its unit', () => {
    expect([drawing.width, drawing.height]).toEqual([51.25, 71.625]);
    expect(drawing.carcass).toEqual({ x: 0, y: 0, width: 51.25, height: 64.625 });
  });

  it('draws one tub per column on every level, each on its shelf and inside the sides', () => {
    expect(drawing.tubs).toHaveLength(27);
    const panels = drawing.panels;
    // n levels, n + 1 horizontal panels (top, 8 shelves, bottom).
    expect(panels).toHaveLength(10);
    for (const t of drawing.tubs) {
      expect(t.x).toBeGreaterThanOrEqual(0.5);
      expect(t.x + t.width).toBeLessThanOrEqual(51.25 - 0.5);
      expect(t.height).toBe(6.5);
      expect(panels.some((p) => Math.abs(p.y - (t.y + t.height)) < 1e-9)).toBe(true);
    }
    // The lowest tub stands on the bottom panel, which ends where the carcass ends.
    const bottom = panels[panels.length - 1]!;
    expect(bottom.y + bottom.height).toBeCloseTo(64.625, 9);
  });

  it('puts the 2x4 frame and the casters under the carcass, down to the floor', () => {
    expect(drawing.base).toEqual({ x: 0, y: 64.625, width: 51.25, height: 3.5 });
    for (const c of drawing.casters) expect(c.y + c.height).toBeCloseTo(71.625, 9);
  });
});
