import type { RackPlanResponse } from './plan-types';

export type DimensionKey = keyof RackPlanResponse['dimensions'];

/** Key dimensions as a builder names them, in the order the results and comparisons show them. */
export const DIMENSION_LABELS: ReadonlyArray<[DimensionKey, string, string]> = [
  ['levelOpening', 'Level opening', 'tub height + lid gap'],
  ['interiorShelfLength', 'Interior shelf', 'between the side panels'],
  ['outerShelfLength', 'Top and bottom panels', 'cover both side panels'],
  ['depth', 'Panel depth', 'tub length + depth play'],
  ['carcassHeight', 'Carcass height', 'without the base'],
  ['baseHeight', 'Base height', '2x4 on edge + casters'],
  ['overallHeight', 'Overall height', 'on its casters'],
  ['overallWidth', 'Overall width', ''],
  ['overallDepth', 'Overall depth', ''],
];
