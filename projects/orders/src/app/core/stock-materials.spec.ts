import { SHEET_MATERIAL_IDS } from '@tubwright/shared/api/rack-plan';
import { BOARD_MATERIAL_IDS, STOCK_KINDS as API_STOCK_KINDS } from '@tubwright/shared/api/stock';
import { BOARD_MATERIALS, SHEET_MATERIALS, STOCK_KINDS, materialName, stockItemLabel, stockSize } from './stock-materials';

describe('stock materials', () => {
  it('mirror the API’s lists', () => {
    expect([...STOCK_KINDS]).toEqual([...API_STOCK_KINDS]);
    expect([...SHEET_MATERIALS]).toEqual([...SHEET_MATERIAL_IDS]);
    expect([...BOARD_MATERIALS]).toEqual([...BOARD_MATERIAL_IDS]);
  });

  it('names materials and cutting keys as a builder says them', () => {
    expect(materialName('pvc-rigid')).toBe('Rigid PVC');
    expect(materialName('pvc-rigid@0.5')).toBe('Rigid PVC, 1/2 in');
    expect(materialName('Caster, 3 in')).toBe('Caster, 3 in');
  });

  it('writes sizes and one-line labels', () => {
    expect(stockSize({ lengthIn: 96, widthIn: 48 })).toBe('96 x 48 in');
    expect(stockSize({ lengthIn: 96, widthIn: null })).toBe('96 in');
    expect(stockSize({ lengthIn: null, widthIn: null })).toBe('');
    expect(stockItemLabel({ material: 'pvc-rigid', lengthIn: 41, widthIn: 23.5, offcut: true })).toBe('Rigid PVC, 41 x 23 1/2 in (offcut)');
    expect(stockItemLabel({ material: 'Caster, 3 in', lengthIn: null, widthIn: null, offcut: false })).toBe('Caster, 3 in');
  });
});
