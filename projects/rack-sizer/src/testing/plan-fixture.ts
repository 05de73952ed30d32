import type { RackPlanResponse } from '@tubwright/shared/api/rack-plan';

/**
 * What POST /api/v1/calc/rack-plan answered for a 23 x 16 1/4 x 6 1/2 in tub, 9 levels of 3
 * (default allowances and 1/2 in panels; copied from the calculator, trimmed to what the widget reads).
 * Outside width by the documented rules: 3 x 16.25 + 1/2 side play + 2 support columns x 1/2
 * + 2 x 1/2 side panels = 51.25 in (common practice).
 */
export function planFixture(overrides: Partial<Pick<RackPlanResponse, 'unit' | 'checks'>> = {}): RackPlanResponse {
  return {
    unit: 'in',
    dimensions: {
      levelOpening: 6.625,
      interiorShelfLength: 50.25,
      outerShelfLength: 51.25,
      depth: 23.5,
      carcassHeight: 64.625,
      baseHeight: 7,
      overallHeight: 71.625,
      overallWidth: 51.25,
      overallDepth: 23.5,
    },
    sections: [],
    parts: [],
    hardware: [],
    heat: { enabled: true } as RackPlanResponse['heat'],
    loads: {} as RackPlanResponse['loads'],
    checks: [
      { code: 'caster_load', severity: 'info', message: 'Each caster carries up to 100 lb of its 200 lb rating.', basis: 'x' },
      { code: 'tipping', severity: 'warning', message: 'The rack is 3.0 times as tall as it is deep: anchor it to the wall and lock the casters.', basis: 'x' },
    ],
    cost: {
      lines: [],
      subtotals: { materials: 0, hardware: 0, heat: 0, labor: 0 },
      subtotal: 0,
      laborMinutes: 0,
      labor: 0,
      marginPercent: 0,
      margin: 0,
      total: 2026.64,
      sheets: [
        { material: 'pvc-rigid', thickness: 0.5, count: 4, method: 'nested' },
        { material: 'plywood', thickness: 0.5, count: 1, method: 'nested' },
      ],
      notes: [],
    },
    display: { dimensions: {}, sections: [], parts: [] },
    ...overrides,
  };
}
