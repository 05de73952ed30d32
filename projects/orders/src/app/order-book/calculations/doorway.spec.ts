import { checkDoorway, planDoorwayIn } from './doorway';

const section = (height: number) => ({ index: 1, levels: 5, firstLevel: 1, sidePanelHeight: height - 1, height, hasBottomPanel: true, dowels: 0 });

describe('checkDoorway', () => {
  it('judges by the tallest section against the 80 in default', () => {
    const check = checkDoorway({ unit: 'in', sections: [section(41.5), section(37)] }, { unit: 'in' });
    expect(check).toEqual({ sections: 2, tallestSectionIn: 41.5, doorwayIn: 80, passes: true, spareIn: 38.5 });
  });

  it("uses the plan's own limit, converted from millimetres", () => {
    // 2032 mm = 80 in exactly (1 in = 25.4 mm, NIST SP 811); the section is 2100 mm = 82.68 in
    const check = checkDoorway({ unit: 'mm', sections: [section(2100)] }, { unit: 'mm', limits: { doorwayHeight: 2032 } });
    expect(check.doorwayIn).toBeCloseTo(80, 9);
    expect(check.passes).toBe(false);
    expect(check.spareIn).toBeCloseTo(80 - 2100 / 25.4, 9);
  });

  it("prefers the customer's doorway when one is given", () => {
    const check = checkDoorway({ unit: 'in', sections: [section(70)] }, { limits: { doorwayHeight: 80 } }, 68);
    expect(check).toMatchObject({ doorwayIn: 68, passes: false, spareIn: -2 });
  });

  it('counts a section exactly as tall as the doorway as passing', () => {
    expect(checkDoorway({ unit: 'in', sections: [section(80)] }, null).passes).toBe(true);
  });
});

describe('planDoorwayIn', () => {
  it('ignores specs without a usable limit', () => {
    expect(planDoorwayIn(null)).toBeNull();
    expect(planDoorwayIn({ limits: {} })).toBeNull();
    expect(planDoorwayIn({ limits: { doorwayHeight: 'tall' } })).toBeNull();
  });
});
