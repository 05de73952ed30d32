import type { CuttingPlanRequestInput, CuttingPlanResponse, StockItem } from '../../core/orders-types';
import { MAX_STOCK_ENTRIES, ON_HAND_PRICE, heldOutside, stockUse, withStockOnHand } from './stock-use';

const item = (id: number, over: Partial<StockItem>): StockItem => ({
  id, kind: 'sheet', material: 'pvc-rigid', description: '', lengthIn: 96, widthIn: 48, quantity: 1, offcut: false, location: '', createdAt: '2026-12-02T10:00:00.000Z', ...over,
});

// The batch request as batchCuttingRequest makes it: unlimited sheet and board sizes to buy.
const request: CuttingPlanRequestInput = {
  unit: 'in',
  kerf: 0.125,
  trim: 0,
  stock: [
    { material: 'pvc-rigid@0.5', kind: 'sheet', length: 96, width: 48 },
    { material: 'lumber-2x4', kind: 'board', length: 96 },
    { material: 'lumber-2x4', kind: 'board', length: 120 },
  ],
  parts: [{ name: 'side panel', material: 'pvc-rigid@0.5', length: 63.625, width: 23.5, quantity: 4 }],
  timeLimitMs: 5000,
};

const stock = [
  item(1, { quantity: 14, location: 'sheet rack' }),
  item(2, { lengthIn: 60, widthIn: 23.5, offcut: true, location: 'offcut bin' }),
  item(3, { lengthIn: 41, widthIn: 23.5, quantity: 2, offcut: true, location: 'offcut bin' }),
  item(4, { kind: 'board', material: 'lumber-2x4', lengthIn: 96, widthIn: null, quantity: 18, location: 'lumber wall' }),
  item(5, { material: 'plywood', quantity: 3 }),
  item(6, { kind: 'hardware', material: 'Caster, 3 in', lengthIn: null, widthIn: null, quantity: 24 }),
  // Full sheets turned sideways are the same size.
  item(7, { lengthIn: 48, widthIn: 96, quantity: 1, location: 'back wall' }),
];

describe('heldOutside', () => {
  it('counts only what orders outside the batch hold', () => {
    const reservations = [
      { stockItemId: 1, orderId: 7, quantity: 4 },
      { stockItemId: 1, orderId: 5, quantity: 2 },
      { stockItemId: 3, orderId: 8, quantity: 1 },
    ];
    expect(heldOutside(reservations, [5, 6])).toEqual(new Map([[1, 4], [3, 1]]));
  });
});

describe('withStockOnHand', () => {
  const held = new Map([[1, 4], [3, 1]]);
  const stocked = withStockOnHand(request, stock, held);

  it('sends offcuts as stock with a quantity, smallest first, after the sizes to buy; sizes on hand cost least', () => {
    expect(stocked.request.stock).toEqual([
      { material: 'pvc-rigid@0.5', kind: 'sheet', length: 96, width: 48, quantity: null, price: ON_HAND_PRICE },
      { material: 'lumber-2x4', kind: 'board', length: 96, quantity: null, price: ON_HAND_PRICE },
      { material: 'lumber-2x4', kind: 'board', length: 120, quantity: null },
      // item 3: 2 on hand, 1 held by another order
      { material: 'pvc-rigid@0.5', kind: 'sheet', length: 41, width: 23.5, quantity: 1 },
      { material: 'pvc-rigid@0.5', kind: 'sheet', length: 60, width: 23.5, quantity: 1 },
    ]);
  });

  it('counts free full pieces against the size they match; plywood, hardware and other thicknesses stay out', () => {
    // 14 - 4 held elsewhere + 1 turned sideways
    expect(stocked.sources[0]).toMatchObject({ from: 'buy', onHand: 11 });
    expect(stocked.sources[1]).toMatchObject({ from: 'buy', onHand: 18 });
    expect(stocked.sources[2]).toMatchObject({ from: 'buy', onHand: 0 });
    expect(stocked.sources.slice(3).map((s) => s.from)).toEqual(['offcut', 'offcut']);
    expect(stocked.notes).toEqual([]);
  });

  it('leaves out stock of a material cut in two thicknesses, and says so', () => {
    const twoThicknesses = { ...request, stock: [...request.stock, { material: 'pvc-rigid@0.75', kind: 'sheet' as const, length: 96, width: 48 }] };
    const result = withStockOnHand(twoThicknesses, stock, new Map());
    expect(result.request.stock).toHaveLength(4);
    expect(result.sources[0]).toMatchObject({ onHand: 0 });
    expect(result.notes).toEqual(['Rigid PVC is cut in more than one thickness here and stock records no thickness, so its stock on hand was not counted.']);
  });

  it('keeps within the API’s limit on stock sizes', () => {
    const many = Array.from({ length: 60 }, (_, i) => item(100 + i, { lengthIn: 20 + i / 4, widthIn: 10, offcut: true }));
    const result = withStockOnHand(request, many, new Map());
    expect(result.request.stock).toHaveLength(MAX_STOCK_ENTRIES);
    expect(result.notes[0]).toMatch(/^13 of the offcuts/);
  });
});

describe('stockUse', () => {
  const stocked = withStockOnHand(request, stock, new Map([[1, 4], [3, 1]]));
  const layout = (stockIndex: number, count: number) => ({ stock: stockIndex, count, placements: [], cuts: [], offcuts: [] });
  const plan: Pick<CuttingPlanResponse, 'materials'> = {
    materials: [
      { material: 'pvc-rigid@0.5', kind: 'sheet', stockUsed: 16, lowerBound: 15, optimal: false, yield: 0.8, layouts: [layout(3, 1), layout(4, 1), layout(0, 9), layout(0, 5)] },
      { material: 'lumber-2x4', kind: 'board', stockUsed: 21, lowerBound: 21, optimal: true, yield: 0.9, layouts: [layout(1, 20), layout(2, 1)] },
    ],
  };

  it('splits what the plan cuts into offcuts, stock on hand and pieces to buy', () => {
    const use = stockUse(stocked, plan);
    expect(use.materials).toEqual([
      // 14 full sheets cut; 11 free on hand, so 3 to buy; 2 offcuts
      { material: 'pvc-rigid@0.5', kind: 'sheet', used: 16, fromOffcuts: 2, fromStock: 11, toBuy: 3 },
      // 20 8-ft boards with 18 on hand: 2 to buy, and the only 10-ft board too
      { material: 'lumber-2x4', kind: 'board', used: 21, fromOffcuts: 0, fromStock: 18, toBuy: 3 },
    ]);
    expect(use.buy).toEqual([
      { count: 3, text: 'Rigid PVC, 1/2 in, 96 x 48 in', location: '' },
      { count: 2, text: '2x4 lumber, 96 in', location: '' },
      { count: 1, text: '2x4 lumber, 120 in', location: '' },
    ]);
    expect(use.pull).toEqual([
      { count: 11, text: 'Rigid PVC, 1/2 in, 96 x 48 in', location: 'sheet rack, back wall' },
      { count: 1, text: 'Rigid PVC, 1/2 in, 41 x 23 1/2 in (offcut)', location: 'offcut bin' },
      { count: 1, text: 'Rigid PVC, 1/2 in, 60 x 23 1/2 in (offcut)', location: 'offcut bin' },
      { count: 18, text: '2x4 lumber, 96 in', location: 'lumber wall' },
    ]);
  });

  it('buys nothing when the stock on hand covers the plan', () => {
    const small = { materials: [{ ...plan.materials[0]!, stockUsed: 4, layouts: [layout(0, 4)] }] };
    expect(stockUse(stocked, small).materials[0]).toMatchObject({ used: 4, fromStock: 4, toBuy: 0 });
    expect(stockUse(stocked, small).buy).toEqual([]);
  });
});
