import { linePath, linearScale, niceTicks, spread } from './chart-scale';

describe('niceTicks', () => {
  it('covers the data with round steps', () => {
    expect(niceTicks(1130, 1420)).toEqual([1100, 1200, 1300, 1400, 1500]);
    expect(niceTicks(76.5, 93.5)).toEqual([75, 80, 85, 90, 95]);
    expect(niceTicks(0.2, 0.9)).toEqual([0.2, 0.4, 0.6, 0.8, 1]);
  });

  it('opens a single value into a range around it', () => {
    const ticks = niceTicks(500, 500);
    expect(ticks[0]).toBeLessThan(500);
    expect(ticks.at(-1)).toBeGreaterThan(500);
  });

  it('returns nothing for values that are not numbers', () => {
    expect(niceTicks(Number.NaN, 3)).toEqual([]);
  });
});

describe('linearScale and linePath', () => {
  it('maps the domain onto the range, flipping for SVG y', () => {
    const sy = linearScale([0, 100], [200, 0]);
    expect(sy(0)).toBe(200);
    expect(sy(25)).toBe(150);
    expect(linearScale([5, 5], [0, 10])(5)).toBe(5);
  });

  it('draws a path through every point', () => {
    const sx = linearScale([0, 2], [0, 100]);
    const sy = linearScale([0, 10], [50, 0]);
    expect(linePath([{ x: 0, y: 0 }, { x: 1, y: 5 }, { x: 2, y: 10 }], sx, sy)).toBe('M0 50 L50 25 L100 0');
  });

  it('spreads axis positions evenly', () => {
    expect(spread(0, 10, 3)).toEqual([0, 5, 10]);
    expect(spread(4, 4, 3)).toEqual([4]);
  });
});
