import type { RackPlanResponse } from '@tubwright/shared/api/rack-plan';
import { fromInches } from '@tubwright/shared/units';

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A front view in the plan's unit, y downwards from the top of the rack (SVG coordinates). */
export interface RackDrawing {
  width: number;
  height: number;
  carcass: Box;
  /** The two side panels, full carcass height. */
  sides: Box[];
  /** The horizontal panels: the top, the shelves between levels, and the bottom. */
  panels: Box[];
  tubs: Box[];
  /** The 2x4 frame on edge under the carcass. */
  base: Box;
  casters: Box[];
}

export interface DrawnTub {
  width: number;
  height: number;
  levels: number;
  columns: number;
}

/** Actual depth of a nominal 2x4 on edge (American Softwood Lumber Standard PS 20). */
const RAIL_IN = 3.5;

/**
 * Lays out the front view to scale from the calculator's dimensions. n levels have n + 1 horizontal
 * panels (shared/api/rack-plan.ts, rack plan rules), so levels are `levelOpening` apart with one panel
 * between; whatever the carcass height leaves over is the bottom panel. Tubs sit on their shelf,
 * spread evenly; supports between them are not drawn.
 */
export function rackDrawing(plan: RackPlanResponse, tub: DrawnTub): RackDrawing {
  const d = plan.dimensions;
  const panel = (d.outerShelfLength - d.interiorShelfLength) / 2;
  const bottom = Math.max(d.carcassHeight - tub.levels * (d.levelOpening + panel), 0);
  const panels: Box[] = [{ x: 0, y: 0, width: d.overallWidth, height: panel }];
  const tubs: Box[] = [];
  const bay = d.interiorShelfLength / tub.columns;
  const tubWidth = Math.min(tub.width, bay);
  const tubHeight = Math.min(tub.height, d.levelOpening);
  for (let level = 0; level < tub.levels; level++) {
    const floor = panel + level * (d.levelOpening + panel) + d.levelOpening;
    const lowest = level === tub.levels - 1;
    panels.push({ x: 0, y: floor, width: d.overallWidth, height: lowest ? bottom : panel });
    for (let column = 0; column < tub.columns; column++) {
      tubs.push({ x: panel + column * bay + (bay - tubWidth) / 2, y: floor - tubHeight, width: tubWidth, height: tubHeight });
    }
  }
  const rail = Math.min(fromInches(RAIL_IN, plan.unit), d.baseHeight);
  const casterHeight = d.baseHeight - rail;
  const casterWidth = Math.min(Math.max(casterHeight, fromInches(1, plan.unit)), d.overallWidth / 6);
  const casters = [casterWidth * 0.75, d.overallWidth - casterWidth * 1.75].map((x) => ({
    x,
    y: d.carcassHeight + rail,
    width: casterWidth,
    height: casterHeight,
  }));
  return {
    width: d.overallWidth,
    height: d.overallHeight,
    carcass: { x: 0, y: 0, width: d.overallWidth, height: d.carcassHeight },
    sides: [0, d.overallWidth - panel].map((x) => ({ x, y: 0, width: panel, height: d.carcassHeight })),
    panels,
    tubs,
    base: { x: 0, y: d.carcassHeight, width: d.overallWidth, height: rail },
    casters,
  };
}
