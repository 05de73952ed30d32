/** Internal model of the cutting domain. Lengths are in the request unit throughout. */

export type Axis = 'x' | 'y';

/** One physical piece to cut (a part line expanded by its quantity). */
export interface Piece {
  /** Index of the part line in the request. */
  part: number;
  length: number;
  /** 0 for board parts. */
  width: number;
  canRotate: boolean;
}

/**
 * A node of a guillotine cutting tree. Its region is implied by the parent: a cut at `offset`
 * gives the first child [0, offset) and the second [offset + kerf, end) of the parent region.
 * Mutable so that a packer can fill a hole in place.
 */
export interface GNode {
  kind: 'hole' | 'part' | 'cut';
  part?: number;
  rotated?: boolean;
  axis?: Axis;
  offset?: number;
  first?: GNode;
  second?: GNode;
}

/** One stock piece with its cutting tree; length/width are the usable size (trim removed). */
export interface SheetTree {
  stock: number;
  length: number;
  width: number;
  root: GNode;
}

export interface Placement {
  part: number;
  x: number;
  y: number;
  length: number;
  width: number;
  rotated: boolean;
}

export interface Cut {
  step: number;
  axis: Axis;
  at: number;
  piece: number;
}

export interface Rect {
  x: number;
  y: number;
  length: number;
  width: number;
}

export interface Layout {
  stock: number;
  count: number;
  placements: Placement[];
  cuts: Cut[];
  offcuts: Rect[];
}

export const hole = (): GNode => ({ kind: 'hole' });
export const partLeaf = (part: number, rotated: boolean): GNode => ({ kind: 'part', part, rotated });
export const cutNode = (axis: Axis, offset: number, first: GNode, second: GNode): GNode => ({
  kind: 'cut',
  axis,
  offset,
  first,
  second,
});

/** Tolerance for comparing lengths given as decimals (mm to 0.001 or inches to 1/64 are far coarser). */
export const EPS = 1e-7;

/** A part fits no stock of its material in any allowed orientation (HTTP: 422). */
export class PartTooLargeError extends Error {
  readonly code = 'part_too_large';
  readonly field: string;
  constructor(
    readonly partIndex: number,
    readonly partName: string,
  ) {
    super(`part ${partIndex + 1} (${partName}) is larger than every stock of its material in every allowed orientation`);
    this.name = 'PartTooLargeError';
    this.field = `parts.${partIndex}`;
  }
}

/** Only limited stock exists for a material and it runs out (HTTP: 422). */
export class StockExhaustedError extends Error {
  readonly code = 'stock_exhausted';
  readonly field = 'stock';
  constructor(readonly material: string) {
    super(`the stock of ${material} on hand is not enough for its parts`);
    this.name = 'StockExhaustedError';
  }
}
