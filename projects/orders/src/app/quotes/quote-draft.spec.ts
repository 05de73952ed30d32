import type { PlanListItem } from '../core/orders-types';
import { animalLine, effectivePriceCents, fromQuoteLine, lineProblem, planLine, plainLine, specLine, toLineInput } from './quote-draft';

const plan = {
  id: 4,
  name: 'Longhold 28, 9 high x 3 wide',
  version: 2,
  summary: { levels: 9, columns: 3, tubs: 27, sections: 2, overallHeight: 80, overallWidth: 55, overallDepth: 29, sheets: 5, total: 1480.5, warnings: 0, dangers: 0 },
} as PlanListItem;

describe('quote draft lines', () => {
  it('sends a saved plan by id and lets the server price it', () => {
    const line = planLine(plan, 2);
    expect(effectivePriceCents(line)).toBe(148050);
    expect(toLineInput(line)).toEqual({ kind: 'rack', quantity: 2, planId: 4 });
  });

  it('sends a typed price instead of the calculated one', () => {
    const line = { ...planLine(plan, 1), priceText: '1,395' };
    expect(effectivePriceCents(line)).toBe(139500);
    expect(toLineInput(line)).toEqual({ kind: 'rack', quantity: 1, planId: 4, unitPriceCents: 139500 });
  });

  it('sends a spec rack with its tub and layout', () => {
    const line = specLine({ lengthIn: 23, widthIn: 16.25, heightIn: 6.5, levels: 6, columns: 2 }, 1, 86500, 'Rack, 6 x 2 tubs');
    expect(line.origin).toBe('Rack, 6 x 2 tubs (tub 23 x 16 1/4 x 6 1/2 in)');
    expect(toLineInput(line)).toEqual({ kind: 'rack', quantity: 1, spec: { unit: 'in', tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 6, columns: 2 } } });
  });

  it("leaves a delivery without a price at the shop's fee", () => {
    const line = plainLine('delivery', 'Delivery within 40 miles', 1, '', 4500);
    expect(lineProblem(line)).toBeNull();
    expect(toLineInput(line)).toEqual({ kind: 'delivery', quantity: 1, description: 'Delivery within 40 miles' });
  });

  it('names what keeps a line from being saved', () => {
    expect(lineProblem(plainLine('item', 'Thermostat', 1, ''))).toBe('Enter a price.');
    expect(lineProblem(plainLine('item', '', 1, '10'))).toBe('Describe the line.');
    expect(lineProblem(plainLine('item', 'Thermostat', 0, '10'))).toMatch(/at least 1/);
    expect(lineProblem(plainLine('labor', 'Assembly on site', 3, '-40'))).toMatch(/amount/);
    expect(lineProblem(plainLine('discount', 'Repeat customer', 1, '25'))).toBeNull();
  });

  it('names the animal an animal line sells, and keeps it when a saved quote is edited again', () => {
    const line = animalLine({ id: 12, code: 'BP-2026-012', name: '', sex: 'female', species: 'ball python', morph: 'amber het dusk' } as Parameters<typeof animalLine>[0], 15000);
    const body = toLineInput(line);
    expect(body).toMatchObject({ kind: 'item', quantity: 1, animalId: 12, unitPriceCents: 15000 });
    const saved = { id: 1, position: 1, kind: 'item' as const, description: String(body['description']), planId: null, spec: null, animalId: 12, quantity: 1, unitPriceCents: 15000, amountCents: 15000 };
    expect(toLineInput(fromQuoteLine(saved))).toEqual(body);
  });
});
