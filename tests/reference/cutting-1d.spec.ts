import { describe, expect, it } from 'vitest';
import { martelloTothL2 } from '../../services/calculator/src/domain/cutting/lower-bounds.js';
import { cutOneDimensional } from '../../services/calculator/src/domain/cutting/one-dimensional.js';
import { readOrLibrary, type BinPackingInstance } from './data/or-library.js';

// Source: E. Falkenauer (1996), Journal of Heuristics 2, via J. E. Beasley's OR-Library
// (binpack5 = t60_*, binpack6 = t120_*, binpack2 = u250_*), CC0 through the ESICUP datasets.
const t60 = readOrLibrary('binpack5.txt');
const t120 = readOrLibrary('binpack6.txt');
const u250 = readOrLibrary('binpack2.txt');
const pick = (list: BinPackingInstance[], id: string) => list.find((i) => i.id.trim() === id)!;

function solveAsBoards(inst: BinPackingInstance) {
  // A board of length `capacity`, zero kerf: the bin-packing instance as a cutting instance.
  const r = cutOneDimensional(inst.items, inst.capacity, 0, { deadline: Date.now() + 4000 });
  const used = r.bins.flat().sort((a, b) => a - b);
  expect(used).toEqual(inst.items.map((_, i) => i));
  for (const bin of r.bins) expect(bin.reduce((s, i) => s + inst.items[i], 0)).toBeLessThanOrEqual(inst.capacity + 1e-9);
  return r;
}

describe('one-dimensional known optima (Falkenauer 1996, OR-Library)', () => {
  it('file check: t60_00 has capacity 100, 60 items, optimum 20', () => {
    expect(pick(t60, 't60_00')).toMatchObject({ capacity: 100, best: 20 });
    expect(pick(t60, 't60_00').items).toHaveLength(60);
  });

  it.each(['t60_00', 't60_01', 't60_02', 't60_03', 't60_04'])('%s: triplets, optimum 20 bins', (id) => {
    const inst = pick(t60, id);
    const r = solveAsBoards(inst);
    expect(r.bins.length).toBe(20);
    expect(r.optimal).toBe(true);
  });

  it.each(['t120_02', 't120_05'])('%s: triplets, optimum 40 bins', (id) => {
    expect(solveAsBoards(pick(t120, id)).bins.length).toBe(40);
  });

  it.each(['u250_00', 'u250_01', 'u250_08'])('%s: uniform items, proven optimum', (id) => {
    const inst = pick(u250, id);
    expect(solveAsBoards(inst).bins.length).toBe(inst.best);
  });

  it('u250_07: never worse than the best known 104, never below the L2 bound', () => {
    const inst = pick(u250, 'u250_07');
    const r = solveAsBoards(inst);
    expect(r.bins.length).toBeLessThanOrEqual(104);
    expect(r.bins.length).toBeGreaterThanOrEqual(martelloTothL2(inst.items, 150));
  });

  it('L2 equals the triplet optimum n/3 (the bins are exactly full)', () => {
    for (const inst of [...t60, ...t120]) expect(martelloTothL2(inst.items, inst.capacity)).toBe(inst.best);
  });
});
