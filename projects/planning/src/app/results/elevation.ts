import type { RackPlanRequest, RackPlanResponse } from '../shared/plan-types';
import { showLength } from '../shared/plan-units';

/*
 * The front elevation of a rack as plain shapes, to scale, in the plan's unit. y runs up from the
 * floor; the drawing flips it. Built from the request (tub, thicknesses, layout) and the
 * calculator's answer (dimensions, sections, support columns, casters), never re-deriving the
 * calculator's numbers: every dimension line shows a value from the result.
 */

export type ShapeKind = 'bottom' | 'side' | 'shelf' | 'top' | 'divider' | 'support' | 'tub' | 'base' | 'caster';

export interface Shape {
  kind: ShapeKind;
  x: number;
  y: number;
  width: number;
  height: number;
  /** For tubs: level (1 at the bottom) and column (1 at the left). */
  level?: number;
  column?: number;
}

export interface DimensionLine {
  /** Horizontal lines measure along x at height `at`; vertical ones along y at x = `at`. */
  axis: 'x' | 'y';
  from: number;
  to: number;
  at: number;
  label: string;
}

export interface Elevation {
  width: number;
  height: number;
  shapes: Shape[];
  dimensions: DimensionLine[];
  /** Suggested text size and margin around the rack for the dimension lines, in drawing units. */
  textSize: number;
  margin: number;
}

/** Nominal 2x4 on edge is 3 1/2 in tall (American Softwood Lumber Standard PS 20, dry size). */
const LUMBER_ON_EDGE_IN = 3.5;
const DEFAULT_THICKNESS_IN = 0.5;

export function rackElevation(request: RackPlanRequest, result: RackPlanResponse): Elevation {
  const unit = result.unit;
  const perIn = unit === 'in' ? 1 : 25.4;
  const d = result.dimensions;
  const t = request.construction?.panelThickness ?? DEFAULT_THICKNESS_IN * perIn;
  const bottomT = request.construction?.bottomThickness ?? t;
  const dividerT = request.construction?.dividerThickness ?? DEFAULT_THICKNESS_IN * perIn;
  const W = d.overallWidth;
  const H = d.overallHeight;
  const lumberH = LUMBER_ON_EDGE_IN * perIn;
  const casterH = Math.max(d.baseHeight - lumberH, 0);
  const textSize = Math.max(W, H) * 0.03;
  const margin = textSize * 6.5;
  const shapes: Shape[] = [];

  // Rolling base: casters seen from the front (one row), then the 2x4 frame on edge.
  const frontCasters = Math.max(2, Math.ceil(result.loads.casters / 2));
  const casterW = Math.min(3 * perIn, W / (frontCasters * 2));
  for (let i = 0; i < frontCasters; i++) {
    const x = frontCasters === 1 ? (W - casterW) / 2 : (i * (W - casterW)) / (frontCasters - 1);
    shapes.push({ kind: 'caster', x, y: 0, width: casterW, height: casterH });
  }
  shapes.push({ kind: 'base', x: 0, y: casterH, width: W, height: lumberH });

  // Columns and vertical supports, left to right inside the side panels.
  const cells = columnCells(request, result, t, dividerT);

  let y = d.baseHeight;
  let level = 1;
  for (const section of result.sections) {
    if (section.hasBottomPanel) {
      shapes.push({ kind: 'bottom', x: 0, y, width: W, height: bottomT });
      y += bottomT;
    }
    shapes.push({ kind: 'side', x: 0, y, width: t, height: section.sidePanelHeight });
    shapes.push({ kind: 'side', x: W - t, y, width: t, height: section.sidePanelHeight });
    let floor = y;
    for (let k = 0; k < section.levels; k++) {
      for (const cell of cells) {
        if (cell.kind === 'tub') {
          shapes.push({ kind: 'tub', x: cell.x, y: floor, width: cell.width, height: request.tub.height, level, column: cell.column });
        } else {
          shapes.push({ kind: cell.kind, x: cell.x, y: floor, width: cell.width, height: d.levelOpening });
        }
      }
      floor += d.levelOpening;
      if (k < section.levels - 1) {
        shapes.push({ kind: 'shelf', x: t, y: floor, width: W - 2 * t, height: t });
        floor += t;
      }
      level++;
    }
    y += section.sidePanelHeight;
    shapes.push({ kind: 'top', x: 0, y, width: W, height: t });
    y += t;
  }

  const gap = textSize * 2.2;
  const firstFloor = d.baseHeight + (result.sections[0]?.hasBottomPanel ? bottomT : 0);
  const dimensions: DimensionLine[] = [
    { axis: 'x', from: 0, to: W, at: H + gap, label: showLength(W, unit) },
    { axis: 'x', from: t, to: W - t, at: -gap * 1.1, label: `${showLength(d.interiorShelfLength, unit)} inside` },
    { axis: 'y', from: 0, to: H, at: W + gap * 2, label: showLength(H, unit) },
    { axis: 'y', from: 0, to: d.baseHeight, at: W + gap * 0.8, label: showLength(d.baseHeight, unit) },
    { axis: 'y', from: firstFloor, to: firstFloor + d.levelOpening, at: -gap * 0.8, label: showLength(d.levelOpening, unit) },
  ];
  if (result.sections.length > 1) {
    let start = d.baseHeight;
    for (const section of result.sections) {
      dimensions.push({ axis: 'y', from: start, to: start + section.height, at: -gap * 2.2, label: showLength(section.height, unit) });
      start += section.height;
    }
  }
  return { width: W, height: H, shapes, dimensions, textSize, margin };
}

interface Cell {
  kind: 'tub' | 'divider' | 'support';
  x: number;
  width: number;
  column?: number;
}

/** `total` split into `parts` whole numbers differing by at most one, larger first (as the calculator splits bays). */
export function balancedSplit(total: number, parts: number): number[] {
  const base = Math.floor(total / parts);
  const extra = total % parts;
  return Array.from({ length: parts }, (_, i) => base + (i < extra ? 1 : 0));
}

/**
 * Tubs, dividers and support blocks across the interior. Dividers split the columns into
 * balanced bays; support blocks stand at every column boundary inside a bay (every-column) or
 * at the boundary nearest each bay's mid-span (when-needed). The side play is shared evenly.
 */
function columnCells(request: RackPlanRequest, result: RackPlanResponse, t: number, dividerT: number): Cell[] {
  const { columns } = request.layout;
  const dividers = request.layout.dividers ?? 0;
  const bays = balancedSplit(columns, dividers + 1);
  const everyColumn = (request.construction?.supportBlock?.placement ?? 'every-column') === 'every-column';
  let supportsLeft = result.loads.supportColumns;
  const supportsAfter: Array<Set<number>> = bays.map((g) => {
    const after = new Set<number>();
    if (g < 2 || supportsLeft <= 0) return after;
    const wanted = everyColumn ? Array.from({ length: g - 1 }, (_, i) => i + 1) : [Math.floor(g / 2)];
    for (const boundary of wanted) {
      if (supportsLeft <= 0) break;
      after.add(boundary);
      supportsLeft--;
    }
    return after;
  });
  const verticals = dividers + result.loads.supportColumns - supportsLeft;
  const interior = result.dimensions.interiorShelfLength;
  const tubW = request.tub.width;
  const cellW = (interior - verticals * dividerT) / columns;
  const cells: Cell[] = [];
  let x = t;
  let column = 1;
  bays.forEach((g, bay) => {
    for (let j = 1; j <= g; j++) {
      cells.push({ kind: 'tub', x: x + (cellW - tubW) / 2, width: tubW, column: column++ });
      x += cellW;
      if (supportsAfter[bay]!.has(j) && j < g) {
        cells.push({ kind: 'support', x, width: dividerT });
        x += dividerT;
      }
    }
    if (bay < bays.length - 1) {
      cells.push({ kind: 'divider', x, width: dividerT });
      x += dividerT;
    }
  });
  return cells;
}
