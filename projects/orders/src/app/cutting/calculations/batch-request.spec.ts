import { batchCuttingRequest, pieceCount, separateSheetCounts, type BatchRack } from './batch-request';

const part = (name: string, material: string, length: number, width: number, thickness: number, quantity: number) => ({
  key: name, name, material, length, width, thickness, quantity, section: 1,
});
const cost = (sheets: Array<{ material: string; thickness: number; count: number }>) =>
  ({ sheets: sheets.map((s) => ({ ...s, method: 'nested' as const })) }) as BatchRack['result']['cost'];

const inchRack: BatchRack = {
  source: 'O-2026-0001',
  quantity: 2,
  spec: { unit: 'in', construction: { kerf: 0.125 } },
  result: {
    unit: 'in',
    parts: [part('side panel', 'pvc-rigid', 63.625, 23.5, 0.5, 2), part('base rail', 'lumber-2x4', 50.25, 3.5, 1.5, 2)],
    cost: cost([{ material: 'pvc-rigid', thickness: 0.5, count: 1 }]),
  },
};
// The same panel drawn in millimetres: 1616.075 mm = 63.625 in, 12.7 mm = 1/2 in (1 in = 25.4 mm).
const mmRack: BatchRack = {
  source: 'O-2026-0002',
  quantity: 1,
  spec: { unit: 'mm', construction: { kerf: 4, sheet: { length: 2440, width: 1220 } } },
  result: {
    unit: 'mm',
    parts: [part('side panel', 'pvc-rigid', 1616.075, 596.9, 12.7, 2)],
    cost: cost([{ material: 'pvc-rigid', thickness: 12.7, count: 1 }]),
  },
};

describe('batchCuttingRequest', () => {
  const request = batchCuttingRequest([inchRack, mmRack]);

  it('puts every part of every order in inches, named by its order', () => {
    expect(request.unit).toBe('in');
    expect(request.parts).toEqual([
      { name: 'side panel', material: 'pvc-rigid@0.5', length: 63.625, width: 23.5, quantity: 4, canRotate: true, source: 'O-2026-0001' },
      { name: 'base rail', material: 'lumber-2x4', length: 50.25, quantity: 4, canRotate: false, source: 'O-2026-0001' },
      { name: 'side panel', material: 'pvc-rigid@0.5', length: 63.625, width: 23.5, quantity: 2, canRotate: true, source: 'O-2026-0002' },
    ]);
    expect(pieceCount(request)).toBe(10);
  });

  it('offers each sheet size once and the default 2x4 lengths (8 to 16 ft)', () => {
    expect(request.stock).toEqual([
      { material: 'pvc-rigid@0.5', kind: 'sheet', length: 96, width: 48 },
      // 2440 x 1220 mm is 96.063 x 48.0315 in: a second sheet size of the same material
      { material: 'pvc-rigid@0.5', kind: 'sheet', length: 96.063, width: 48.0315 },
      ...[96, 120, 144, 168, 192].map((length) => ({ material: 'lumber-2x4', kind: 'board', length })),
    ]);
  });

  it('cuts with the widest kerf any of the plans asks for', () => {
    // 4 mm = 0.1575 in, wider than 1/8 in
    expect(request.kerf).toBe(0.1575);
    expect(batchCuttingRequest([inchRack]).kerf).toBe(0.125);
  });
});

describe('separateSheetCounts', () => {
  it('adds up what each rack needs cut on its own', () => {
    expect(separateSheetCounts([inchRack, mmRack])).toEqual(new Map([['pvc-rigid@0.5', 3]]));
  });
});
