import { balancedSplit, rackElevation } from './elevation';
import { nineByThree } from './result-fixture';

describe('rackElevation', () => {
  const { request, result } = nineByThree();
  const drawing = rackElevation(request, result);
  const of = (kind: string) => drawing.shapes.filter((s) => s.kind === kind);

  it('draws every tub, shelf, panel and support block of the rack', () => {
    expect(of('tub')).toHaveLength(27);
    // n levels have n - 1 interior shelves between the side panels.
    expect(of('shelf')).toHaveLength(8);
    expect(of('side')).toHaveLength(2);
    expect(of('top')).toHaveLength(1);
    expect(of('bottom')).toHaveLength(1);
    // Support blocks at both column boundaries, on every level (every-column placement).
    expect(of('support')).toHaveLength(18);
    // Six casters: three seen from the front.
    expect(of('caster')).toHaveLength(3);
  });

  it('stacks to the overall height and fits the overall width', () => {
    const top = of('top')[0]!;
    expect(top.y + top.height).toBeCloseTo(result.dimensions.overallHeight, 9);
    for (const s of drawing.shapes) {
      expect(s.x).toBeGreaterThanOrEqual(0);
      expect(s.x + s.width).toBeLessThanOrEqual(result.dimensions.overallWidth + 1e-9);
    }
  });

  it('places tubs side by side between the supports, none overlapping', () => {
    const lowest = of('tub').filter((t) => t.level === 1).sort((a, b) => a.x - b.x);
    expect(lowest.map((t) => t.column)).toEqual([1, 2, 3]);
    const supports = of('support').filter((s) => s.y === lowest[0]!.y).sort((a, b) => a.x - b.x);
    expect(lowest[0]!.x + lowest[0]!.width).toBeLessThanOrEqual(supports[0]!.x);
    expect(supports[0]!.x + supports[0]!.width).toBeLessThanOrEqual(lowest[1]!.x);
    // Every tub sits on its floor: the first on the bottom panel, 7 in base + 1/2 in bottom up.
    expect(lowest[0]!.y).toBe(7.5);
  });

  it('labels the dimension lines with the calculator values in fractions', () => {
    expect(drawing.dimensions.map((d) => d.label)).toEqual(['51 1/4 in', '50 1/4 in inside', '71 5/8 in', '7 in', '6 5/8 in']);
  });

  it('splits columns into bays the way the calculator does', () => {
    expect(balancedSplit(5, 2)).toEqual([3, 2]);
    expect(balancedSplit(3, 1)).toEqual([3]);
  });
});
