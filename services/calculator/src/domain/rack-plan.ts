import type { RackPlanRequest, RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { formatInches, fromInches, lbToKg, type LengthUnit } from '../../../../shared/units.js';
import { rackChecks } from './checks.js';
import { estimateSheetsByArea, rackCost, type SheetCounter } from './cost.js';
import { rackGeometry, type RackGeometry } from './geometry.js';
import { casterCount, rackHardware } from './hardware.js';
import { heatPlan } from './heat.js';
import { analyseShelves, levelGaps, loadPerCasterLb, rackMasses } from './loads.js';
import { PSI_PER_MPA } from './materials.js';
import { rackParts } from './parts.js';
import { normaliseRequest } from './rack-spec.js';

export { UnbuildableSpecError } from './errors.js';
export type { SheetCounter, SheetGroup, SheetCount } from './cost.js';

export type RackPlan = RackPlanResponse;

export interface PlanRackOptions {
  /** Exact sheet counts from the cutting planner; default: an area estimate. */
  countSheets?: SheetCounter;
}

/** Lengths leave in the request unit, trimmed of float noise far below a saw's precision. */
const lengthOut = (unit: LengthUnit) => (lengthIn: number) => {
  const v = fromInches(lengthIn, unit);
  const f = unit === 'in' ? 1e6 : 1e3;
  return Math.round(v * f) / f;
};
const round3 = (x: number) => Math.round(x * 1000) / 1000;

const DIMENSION_KEYS = [
  'levelOpening',
  'interiorShelfLength',
  'outerShelfLength',
  'depth',
  'carcassHeight',
  'baseHeight',
  'overallHeight',
  'overallWidth',
  'overallDepth',
] as const;

function dimensionsIn(g: RackGeometry): Record<(typeof DIMENSION_KEYS)[number], number> {
  return {
    levelOpening: g.levelOpeningIn,
    interiorShelfLength: g.interiorShelfLengthIn,
    outerShelfLength: g.outerShelfLengthIn,
    depth: g.depthIn,
    carcassHeight: g.carcassHeightIn,
    baseHeight: g.baseHeightIn,
    overallHeight: g.overallHeightIn,
    overallWidth: g.overallWidthIn,
    overallDepth: g.overallDepthIn,
  };
}

/**
 * A complete rack plan from a validated request (defaults applied by the RackPlanRequest schema).
 * Pure and fast; throws UnbuildableSpecError when no rack can be built from the spec.
 */
export function planRack(request: RackPlanRequest, options: PlanRackOptions = {}): RackPlan {
  const spec = normaliseRequest(request);
  // Sag decides whether support blocks are needed; they widen the shelf, so the geometry follows them.
  // Spans between supports depend on the tubs only, so the second analysis keeps the decision.
  const bare = rackGeometry(spec);
  const first = analyseShelves(spec, bare);
  const geometry = first.supportColumns > 0 ? rackGeometry(spec, first.supportColumns) : bare;
  const shelves = first.supportColumns > 0 ? analyseShelves(spec, geometry) : first;
  const parts = rackParts(spec, geometry, shelves);
  const hardware = rackHardware(spec, geometry, parts);
  const heat = heatPlan(spec, geometry);
  const masses = rackMasses(spec, parts);
  const casters = casterCount(spec, geometry);
  const gaps = levelGaps(spec, shelves);
  const checks = rackChecks({ spec, geometry, shelves, gaps, masses, casters, heat });
  const cost = rackCost(spec, parts, hardware, heat, options.countSheets ?? estimateSheetsByArea);

  const len = lengthOut(spec.unit);
  const dims = dimensionsIn(geometry);
  const perCasterLb = loadPerCasterLb(masses.loadedMassLb, casters);

  return {
    unit: spec.unit,
    dimensions: Object.fromEntries(DIMENSION_KEYS.map((k) => [k, len(dims[k])])) as RackPlan['dimensions'],
    sections: geometry.sections.map((s) => ({
      index: s.index,
      levels: s.levels,
      firstLevel: s.firstLevel,
      sidePanelHeight: len(s.sidePanelHeightIn),
      height: len(s.heightIn),
      hasBottomPanel: s.hasBottomPanel,
      dowels: s.dowels,
    })),
    parts: parts.map((p) => ({
      key: p.key,
      name: p.name,
      material: p.material,
      length: len(p.lengthIn),
      width: len(p.widthIn),
      thickness: len(p.thicknessIn),
      quantity: p.quantity,
      section: p.section,
      ...(p.note ? { note: p.note } : {}),
    })),
    hardware: hardware.map((h) => ({
      key: h.key,
      name: h.name,
      quantity: h.quantity,
      unit: h.unit,
      ...(h.note ? { note: h.note } : {}),
      basis: h.basis,
    })),
    heat: {
      enabled: heat.enabled,
      strips: heat.strips,
      stripLength: len(heat.stripLengthIn),
      stripPowerW: round3(heat.stripPowerW),
      wattsPerFoot: heat.wattsPerFoot,
      totalTapeFeet: round3(heat.totalTapeFeet),
      totalPowerW: round3(heat.totalPowerW),
      supplyVoltageV: heat.supplyVoltageV,
      currentA: round3(heat.currentA),
      thermostats: heat.thermostats,
      stripsPerThermostat: heat.stripsPerThermostat,
      thermostatRatingW: heat.thermostatRatingW,
      circuits: heat.circuits.map((c) => ({ ...c, share: round3(c.share) })),
      cautions: heat.cautions,
    },
    loads: {
      emptyMassLb: round3(masses.emptyMassLb),
      emptyMassKg: round3(lbToKg(masses.emptyMassLb)),
      tubsMassLb: round3(masses.tubsMassLb),
      tubsMassKg: round3(lbToKg(masses.tubsMassLb)),
      loadedMassLb: round3(masses.loadedMassLb),
      loadedMassKg: round3(lbToKg(masses.loadedMassLb)),
      casters,
      loadPerCasterLb: round3(perCasterLb),
      loadPerCasterKg: round3(lbToKg(perCasterLb)),
      casterRatingLb: round3(spec.base.casterRatingLb),
      casterRatingKg: round3(lbToKg(spec.base.casterRatingLb)),
      shelfMaterial: shelves.material,
      shelfModulusPsi: Math.round(shelves.modulusPsi),
      shelfModulusMPa: Math.round(shelves.modulusPsi / PSI_PER_MPA),
      shelfModulusHeated: shelves.modulusHeated,
      longestSpanUnsupported: len(shelves.longestSpanUnsupportedIn),
      sagUnsupported: len(shelves.sagUnsupportedIn),
      longestSpanSupported: shelves.longestSpanSupportedIn === null ? null : len(shelves.longestSpanSupportedIn),
      sagSupported: shelves.sagSupportedIn === null ? null : len(shelves.sagSupportedIn),
      supportBlocksUsed: shelves.supportBlocksUsed,
      supportColumns: shelves.supportColumns,
      levels: gaps.map((g) => ({ level: g.level, floorSag: len(g.floorSagIn), ceilingSag: len(g.ceilingSagIn), lidGap: len(g.lidGapIn) })),
      heightToDepth: round3(geometry.overallHeightIn / geometry.overallDepthIn),
    },
    checks,
    cost: {
      ...cost,
      sheets: cost.sheets.map((s) => ({ material: s.material, thickness: len(s.thicknessIn), count: s.count, method: s.method })),
    },
    display: {
      dimensions: Object.fromEntries(DIMENSION_KEYS.map((k) => [k, formatInches(dims[k])])),
      sections: geometry.sections.map((s) => ({ index: s.index, sidePanelHeight: formatInches(s.sidePanelHeightIn), height: formatInches(s.heightIn) })),
      parts: parts.map((p) => ({ key: p.key, length: formatInches(p.lengthIn), width: formatInches(p.widthIn), thickness: formatInches(p.thicknessIn) })),
    },
  };
}
