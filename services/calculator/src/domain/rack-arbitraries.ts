import fc from 'fast-check';

/** Random valid rack requests in inches, for the property tests (test-only). */
export const arbitraryRequest = fc.record({
  unit: fc.constant('in' as const),
  tub: fc.record({
    length: fc.double({ min: 8, max: 40, noNaN: true }),
    width: fc.double({ min: 4, max: 20, noNaN: true }),
    height: fc.double({ min: 2, max: 12, noNaN: true }),
    loadedMass: fc.double({ min: 0.5, max: 30, noNaN: true }),
  }),
  layout: fc
    .record({ levels: fc.integer({ min: 1, max: 30 }), columns: fc.integer({ min: 1, max: 4 }), dividers: fc.integer({ min: 0, max: 3 }) })
    .map((l) => ({ ...l, dividers: Math.min(l.dividers, l.columns - 1) })),
  allowances: fc.record({
    lidGap: fc.double({ min: 0, max: 0.5, noNaN: true }),
    sidePlay: fc.double({ min: 0, max: 1, noNaN: true }),
    depthPlay: fc.double({ min: 0, max: 1, noNaN: true }),
  }),
  construction: fc.record({
    panelThickness: fc.double({ min: 0.25, max: 1, noNaN: true }),
    dividerThickness: fc.double({ min: 0.25, max: 1, noNaN: true }),
  }),
  sections: fc.record({ maxSidePanelLength: fc.double({ min: 30, max: 96, noNaN: true }) }),
});
