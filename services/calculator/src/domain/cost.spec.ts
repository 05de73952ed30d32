import { describe, expect, it } from 'vitest';
import { PRICE_KEY_LIST, RACK_PLAN_EXAMPLE, RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { DEFAULT_PRICES, estimateSheetsByArea, lumberSticks } from './cost.js';
import { normaliseRequest } from './rack-spec.js';
import { planRack } from './rack-plan.js';
import type { PartIn } from './parts.js';

const sheet = { lengthIn: 96, widthIn: 48 };
const part = (lengthIn: number, widthIn: number, quantity: number): PartIn => ({ key: 'p', name: 'p', material: 'pvc-rigid', lengthIn, widthIn, thicknessIn: 0.5, quantity, section: 1 });

describe('estimateSheetsByArea', () => {
  it('gives a part of a whole sheet its own sheet', () => {
    expect(estimateSheetsByArea({ material: 'pvc-rigid', thicknessIn: 0.5, sheet, kerfIn: 0.125, parts: [part(96, 48, 3)] }).count).toBe(3);
  });
  it('never lets two parts over half a sheet share one', () => {
    expect(estimateSheetsByArea({ material: 'pvc-rigid', thicknessIn: 0.5, sheet, kerfIn: 0, parts: [part(50, 47, 2)] }).count).toBe(2);
  });
  it('fills by area at the yield for small parts', () => {
    // 40 parts of 12 x 12 (+1/8 kerf) = 5880.6 in^2 over 0.85 x 4608 = 3916.8 -> 2 sheets
    expect(estimateSheetsByArea({ material: 'pvc-rigid', thicknessIn: 0.5, sheet, kerfIn: 0.125, parts: [part(12, 12, 40)] }).count).toBe(2);
  });
});

describe('lumberSticks', () => {
  it('packs base pieces into the shortest stock that takes them', () => {
    const s = normaliseRequest(RackPlanRequest.parse({ tub: { length: 20, width: 10, height: 5 }, layout: { levels: 1, columns: 1 } }));
    const lumber = (lengthIn: number, quantity: number): PartIn => ({ ...part(lengthIn, 3.5, quantity), material: 'lumber-2x4' });
    // two 100 in rails need 10 ft sticks; 3 x 30 in fit in one 8 ft stick with kerf (90.375)
    expect(lumberSticks(s, [lumber(100, 2), lumber(30, 3)])).toEqual([120, 120, 96]);
  });
});

describe('rack cost', () => {
  const req = RackPlanRequest.parse(RACK_PLAN_EXAMPLE);
  const p = planRack(req);

  it('traces every line to a price-list key and adds up', () => {
    for (const l of p.cost.lines) {
      expect(PRICE_KEY_LIST).toContain(l.key);
      expect(l.amount).toBeCloseTo(l.quantity * l.unitPrice, 2);
    }
    const sum = p.cost.lines.reduce((a, l) => a + l.amount, 0);
    expect(p.cost.subtotal).toBeCloseTo(sum, 2);
    expect(p.cost.margin).toBeCloseTo((p.cost.subtotal * DEFAULT_PRICES['margin-percent']) / 100, 2);
    expect(p.cost.total).toBeCloseTo(p.cost.subtotal + p.cost.margin, 2);
  });

  it('takes prices from the request over the defaults', () => {
    const q = planRack(RackPlanRequest.parse({ ...RACK_PLAN_EXAMPLE, prices: { thermostat: 10, 'margin-percent': 0, 'labor.rate-per-hour': 60 } }));
    expect(q.cost.lines.find((l) => l.key === 'thermostat')!.unitPrice).toBe(10);
    expect(q.cost.margin).toBe(0);
    expect(q.cost.total).toBe(q.cost.subtotal);
    const setup = q.cost.lines.find((l) => l.key === 'labor.minutes-setup')!;
    expect(setup.amount).toBe(DEFAULT_PRICES['labor.minutes-setup']); // 60 min at 60/h
  });

  it('buys heat tape by the whole foot and a thermostat per rating', () => {
    const tape = p.cost.lines.find((l) => l.key === 'heat-tape.per-foot')!;
    expect(tape.quantity).toBe(Math.ceil(p.heat.totalTapeFeet));
    expect(p.cost.lines.find((l) => l.key === 'thermostat')!.quantity).toBe(p.heat.thermostats);
  });

  it('says when sheet counts are estimates', () => {
    expect(p.cost.notes.join(' ')).toMatch(/area estimate/);
  });
});
