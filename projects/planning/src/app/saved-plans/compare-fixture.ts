import type { PlanComparison } from '../shared/plan-types';

/** A comparison as the API answers it: a 9 x 3 rack (A) against a 10 x 3 one (B), both in inches. */
export const COMPARISON: PlanComparison = {
  unit: 'in',
  a: { id: 4, name: 'Longhold 28, 9 high x 3 wide', version: 2, unit: 'in', levels: 9, columns: 3, sections: 1 },
  b: { id: 7, name: 'Longhold 28, 10 high', version: 1, unit: 'in', levels: 10, columns: 3, sections: 2 },
  dimensions: [
    { key: 'levelOpening', a: 6.625, b: 6.625, difference: 0, aDisplay: '6 5/8 in', bDisplay: '6 5/8 in' },
    { key: 'interiorShelfLength', a: 50.25, b: 50.25, difference: 0, aDisplay: '50 1/4 in', bDisplay: '50 1/4 in' },
    { key: 'overallHeight', a: 71.625, b: 78.25, difference: 6.625, aDisplay: '71 5/8 in', bDisplay: '78 1/4 in' },
    // Less than 1/32 in apart: the same on a tape, so not marked.
    { key: 'overallWidth', a: 51.25, b: 51.26, difference: 0.01, aDisplay: '51 1/4 in', bDisplay: '51 1/4 in' },
    { key: 'overallDepth', a: 24, b: 23.5, difference: -0.5, aDisplay: '24 in', bDisplay: '23 1/2 in' },
  ],
  sheets: [
    { material: 'lumber-2x4', thickness: 1.5, a: 2, b: 2, difference: 0 },
    { material: 'pvc-rigid', thickness: 0.5, a: 5, b: 6, difference: 1 },
    { material: 'plywood', thickness: 0.75, a: 0, b: 1, difference: 1 },
  ],
  cost: [
    { key: 'materials', a: 1250, b: 1480.5, difference: 230.5 },
    { key: 'hardware', a: 96.4, b: 96.4, difference: 0 },
    { key: 'heat', a: 210, b: 230, difference: 20 },
    { key: 'labor', a: 400, b: 380, difference: -20 },
    { key: 'subtotal', a: 1956.4, b: 2186.9, difference: 230.5 },
    { key: 'margin', a: 586.92, b: 656.07, difference: 69.15 },
    { key: 'total', a: 2543.32, b: 2842.97, difference: 299.65 },
  ],
  checks: { a: { warnings: 1, dangers: 0 }, b: { warnings: 1, dangers: 1 } },
};
