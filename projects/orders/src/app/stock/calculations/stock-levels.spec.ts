import type { StockItem } from '../../core/orders-types';
import { setAsideByItem, stockLevels } from './stock-levels';

const item = (id: number, kind: StockItem['kind'], quantity: number): StockItem => ({
  id, kind, material: kind === 'board' ? 'lumber-2x4' : 'pvc-rigid', description: '', lengthIn: 96, widthIn: kind === 'sheet' ? 48 : null,
  quantity, offcut: false, location: '', createdAt: '2026-12-02T10:00:00.000Z',
});

describe('stock levels', () => {
  it('adds up what every order holds of an item', () => {
    expect(setAsideByItem([{ stockItemId: 1, quantity: 4 }, { stockItemId: 2, quantity: 1 }, { stockItemId: 1, quantity: 3 }])).toEqual(new Map([[1, 7], [2, 1]]));
  });

  it('groups items by kind with on hand, set aside and free', () => {
    const groups = stockLevels([item(1, 'sheet', 14), item(2, 'board', 18), item(3, 'sheet', 2)], [{ stockItemId: 1, quantity: 4 }, { stockItemId: 3, quantity: 3 }]);
    expect([...groups.keys()]).toEqual(['sheet', 'board', 'hardware']);
    expect(groups.get('sheet')!.map((l) => [l.item.id, l.setAside, l.free])).toEqual([[1, 4, 10], [3, 3, -1]]);
    expect(groups.get('board')!.map((l) => [l.setAside, l.free])).toEqual([[0, 18]]);
    expect(groups.get('hardware')).toEqual([]);
  });
});
