import { readFileSync } from 'node:fs';

export interface BinPackingInstance {
  id: string;
  capacity: number;
  /** Optimum, or best known value in 1996 for u250_07, u250_12 and u250_13 (see README). */
  best: number;
  items: number[];
}

/** Reads an OR-Library bin-packing file (binpack1 to binpack8 format) from this folder. */
export function readOrLibrary(file: string): BinPackingInstance[] {
  const tokens = readFileSync(new URL(file, import.meta.url), 'utf8').split(/\s+/).filter(Boolean);
  let k = 0;
  const count = Number(tokens[k++]);
  const out: BinPackingInstance[] = [];
  for (let p = 0; p < count; p++) {
    const id = tokens[k++];
    const capacity = Number(tokens[k++]);
    const n = Number(tokens[k++]);
    const best = Number(tokens[k++]);
    const items = tokens.slice(k, k + n).map(Number);
    k += n;
    out.push({ id, capacity, best, items });
  }
  return out;
}
