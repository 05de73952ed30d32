import type { Cut, GNode, Placement, Rect, SheetTree } from './types.js';

/** Output coordinates are rounded to 1e-6 of the unit so sums of decimals print cleanly. */
export const round6 = (v: number): number => Math.round(v * 1e6) / 1e6;

export interface TreeLayout {
  placements: Placement[];
  cuts: Cut[];
  /** Leaves of the tree that hold no part (waste or offcut), largest first. */
  holes: Rect[];
}

/**
 * Turns a cutting tree into saw-ready output: cuts breadth first (so every rip of the stock comes
 * before the cross-cuts of the strips it makes), pieces numbered as the cut list in the API says:
 * 0 is the stock with trim removed, each cut makes two new pieces, the one below `at` first.
 */
export function treeToLayout(sheet: SheetTree, kerf: number, trim: number): TreeLayout {
  const placements: Placement[] = [];
  const cuts: Cut[] = [];
  const holes: Rect[] = [];
  const queue: Array<{ node: GNode; rect: Rect; piece: number }> = [
    { node: sheet.root, rect: { x: trim, y: trim, length: sheet.length, width: sheet.width }, piece: 0 },
  ];
  let nextPiece = 1;
  for (let head = 0; head < queue.length; head++) {
    const { node, rect, piece } = queue[head];
    if (node.kind === 'part') {
      placements.push({
        part: node.part!,
        x: round6(rect.x),
        y: round6(rect.y),
        length: round6(rect.length),
        width: round6(rect.width),
        rotated: node.rotated ?? false,
      });
    } else if (node.kind === 'hole') {
      if (rect.length > 1e-9 && rect.width > 1e-9) {
        holes.push({ x: round6(rect.x), y: round6(rect.y), length: round6(rect.length), width: round6(rect.width) });
      }
    } else {
      const offset = node.offset!;
      const alongX = node.axis === 'x';
      const start = alongX ? rect.x : rect.y;
      const size = alongX ? rect.length : rect.width;
      cuts.push({ step: cuts.length + 1, axis: node.axis!, at: round6(start + offset), piece });
      const firstRect: Rect = alongX ? { ...rect, length: offset } : { ...rect, width: offset };
      const rest = size - offset - kerf;
      const secondRect: Rect = alongX
        ? { ...rect, x: rect.x + offset + kerf, length: rest }
        : { ...rect, y: rect.y + offset + kerf, width: rest };
      queue.push({ node: node.first!, rect: firstRect, piece: nextPiece++ });
      queue.push({ node: node.second!, rect: secondRect, piece: nextPiece++ });
    }
  }
  holes.sort((a, b) => b.length * b.width - a.length * a.width);
  return { placements, cuts, holes };
}

/** A canonical text of a tree: sheets with equal keys are cut alike and are counted together. */
export function treeKey(node: GNode): string {
  if (node.kind === 'hole') return 'h';
  if (node.kind === 'part') return `p${node.part}${node.rotated ? 'r' : ''}`;
  return `(${node.axis}${round6(node.offset!)} ${treeKey(node.first!)} ${treeKey(node.second!)})`;
}
