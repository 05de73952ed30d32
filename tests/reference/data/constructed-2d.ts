import { seededRandom } from '../../../services/calculator/src/domain/cutting/one-dimensional.js';

export interface ConstructedInstance {
  name: string;
  sheetLength: number;
  sheetWidth: number;
  /** Sheets cut up to make the pieces: the optimum, since the pieces cover them exactly (zero kerf). */
  sheets: number;
  canRotate: boolean;
  pieces: Array<{ length: number; width: number }>;
}

/**
 * Two-dimensional instances whose optimum is known by construction: `sheets` sheets of 96 x 48 are
 * each cut into pieces by random guillotine cuts (zero kerf, positions on a 1/8 grid, no piece
 * side under 4). The pieces fill the sheets exactly, so no plan can use fewer sheets, and the cuts
 * themselves show that many suffice.
 */
export function constructedInstance(seed: number): ConstructedInstance {
  const random = seededRandom(seed);
  const between = (lo: number, hi: number) => lo + Math.floor(random() * (hi - lo + 1));
  const sheetLength = 96;
  const sheetWidth = 48;
  const grid = 1 / 8;
  const minSide = 4;
  const sheets = between(1, 3);
  const pieces: Array<{ length: number; width: number }> = [];
  for (let s = 0; s < sheets; s++) {
    const target = between(3, 8);
    const bits = [{ length: sheetLength, width: sheetWidth }];
    for (let guard = 0; bits.length < target && guard < 100; guard++) {
      const i = Math.floor(random() * bits.length);
      const b = bits[i];
      // Cut across the longer side more often, as a saw would.
      const alongX = random() < b.length / (b.length + b.width);
      const size = alongX ? b.length : b.width;
      if (size < 2 * minSide) continue;
      const at = minSide + grid * Math.floor((random() * (size - 2 * minSide)) / grid);
      const [p, q] = alongX
        ? [{ length: at, width: b.width }, { length: b.length - at, width: b.width }]
        : [{ length: b.length, width: at }, { length: b.length, width: b.width - at }];
      bits.splice(i, 1, p, q);
    }
    pieces.push(...bits);
  }
  return { name: `constructed-${seed}`, sheetLength, sheetWidth, sheets, canRotate: random() < 0.5, pieces };
}
