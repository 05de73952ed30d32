import type { RackPlanRequest, SheetMaterialId } from '../../../../shared/api/rack-plan.js';
import { kgToLb, toInches, type LengthUnit } from '../../../../shared/units.js';

/**
 * Defaults of the lengths and masses whose value depends on the request unit, in inches and
 * pounds; a millimetre request gets the exact conversion, so an inch spec and its mm twin
 * give the same rack.
 */
export const LENGTH_DEFAULTS_IN = {
  lidGap: 0.125, // common practice: the shelf above is the lid
  sidePlay: 0.5, // common practice
  depthPlay: 0.5, // common practice
  panelThickness: 0.5, // common practice: 1/2 in sheet
  dividerThickness: 0.5, // common practice
  kerf: 0.125, // a typical carbide blade
  sheetLength: 96, // 4 x 8 ft sheet
  sheetWidth: 48,
  supportBlockFrontDepth: 2, // ours
  supportBlockBackDepth: 0.75, // ours: thin, to stay clear of the heat tape
  casterHeight: 3.5, // from memory: a 3 in plate caster stands about 3 1/2 to 4 in
  lumberStockLengths: [96, 120, 144, 168, 192], // 8 to 16 ft, as yards stock them
  heatEndMargin: 1, // common practice: tape clear of the side panels
  maxShelfSag: 0.0625, // ours: half the default lid gap
  bindGap: 0,
  escapeGap: 0.25, // common practice for hatchlings; configurable
  doorwayHeight: 80, // from memory: a standard 6 ft 8 in interior door
  ceilingHeight: 96, // from memory: a standard 8 ft ceiling
} as const;

export const MASS_DEFAULTS_LB = {
  tubLoaded: 4.5, // the example tub
  casterRating: 200, // from memory: a typical 3 in plate caster
} as const;

/** Nominal 2x4 is 1-1/2 x 3-1/2 in actual (American Softwood Lumber Standard PS 20, dry size). */
export const LUMBER_2X4_IN = { thickness: 1.5, width: 3.5 } as const;

/** Rack wider than this gets a middle pair of casters by default (ours). */
export const SIX_CASTER_WIDTH_IN = 48;

/** A request in inches and pounds, every default resolved. */
export interface RackSpec {
  unit: LengthUnit;
  tub: { lengthIn: number; widthIn: number; heightIn: number; loadedMassLb: number };
  layout: { levels: number; columns: number; dividers: number };
  allowances: { lidGapIn: number; sidePlayIn: number; depthPlayIn: number };
  construction: {
    panelThicknessIn: number;
    dividerThicknessIn: number;
    bottomThicknessIn: number;
    backPanelThicknessIn: number;
    carcassMaterial: SheetMaterialId;
    bottomMaterial: SheetMaterialId;
    kerfIn: number;
    sheet: { lengthIn: number; widthIn: number };
    backPanel: boolean;
    supportBlock: { placement: 'every-column' | 'when-needed'; frontDepthIn: number; backDepthIn: number };
  };
  sections: { maxSidePanelLengthIn: number } | { levelsPerSection: number[] };
  base: {
    casterCount: number | null; // null: chosen from the width
    lockingCasters: number;
    casterHeightIn: number;
    casterRatingLb: number;
    lumberStockLengthsIn: number[];
  };
  heat: { enabled: boolean; wattsPerFoot: number; endMarginIn: number; supplyVoltageV: number; thermostatRatingW: number };
  joints: RackPlanRequest['joints'];
  limits: {
    maxShelfSagIn: number;
    bindGapIn: number;
    escapeGapIn: number;
    tipRatio: number;
    doorwayHeightIn: number;
    ceilingHeightIn: number;
  };
  prices: RackPlanRequest['prices'];
}

/** Resolves defaults and converts a validated request to inches and pounds. */
export function normaliseRequest(request: RackPlanRequest): RackSpec {
  const unit = request.unit;
  const D = LENGTH_DEFAULTS_IN;
  // A given length is converted; a missing one takes the inch default as is.
  const len = (given: number | undefined, fallbackIn: number): number =>
    given === undefined ? fallbackIn : toInches(given, unit);
  const massLb = (given: number | undefined, fallbackLb: number): number =>
    given === undefined ? fallbackLb : unit === 'in' ? given : kgToLb(given);

  const c = request.construction;
  const panelThicknessIn = len(c.panelThickness, D.panelThickness);
  const sheet = { lengthIn: len(c.sheet?.length, D.sheetLength), widthIn: len(c.sheet?.width, D.sheetWidth) };
  const s = request.sections;
  const l = request.limits;

  return {
    unit,
    tub: {
      lengthIn: toInches(request.tub.length, unit),
      widthIn: toInches(request.tub.width, unit),
      heightIn: toInches(request.tub.height, unit),
      loadedMassLb: massLb(request.tub.loadedMass, MASS_DEFAULTS_LB.tubLoaded),
    },
    layout: { ...request.layout },
    allowances: {
      lidGapIn: len(request.allowances.lidGap, D.lidGap),
      sidePlayIn: len(request.allowances.sidePlay, D.sidePlay),
      depthPlayIn: len(request.allowances.depthPlay, D.depthPlay),
    },
    construction: {
      panelThicknessIn,
      dividerThicknessIn: len(c.dividerThickness, D.dividerThickness),
      bottomThicknessIn: len(c.bottomThickness, panelThicknessIn),
      backPanelThicknessIn: len(c.backPanelThickness, panelThicknessIn),
      carcassMaterial: c.carcassMaterial,
      bottomMaterial: c.bottomMaterial,
      kerfIn: len(c.kerf, D.kerf),
      sheet,
      backPanel: c.backPanel,
      supportBlock: {
        placement: c.supportBlock?.placement ?? 'every-column',
        frontDepthIn: len(c.supportBlock?.frontDepth, D.supportBlockFrontDepth),
        backDepthIn: len(c.supportBlock?.backDepth, D.supportBlockBackDepth),
      },
    },
    sections: s.levelsPerSection
      ? { levelsPerSection: [...s.levelsPerSection] }
      : { maxSidePanelLengthIn: len(s.maxSidePanelLength, sheet.lengthIn) },
    base: {
      casterCount: request.base.casterCount ?? null,
      lockingCasters: request.base.lockingCasters,
      casterHeightIn: len(request.base.casterHeight, D.casterHeight),
      casterRatingLb: massLb(request.base.casterRating, MASS_DEFAULTS_LB.casterRating),
      lumberStockLengthsIn: request.base.lumberStockLengths
        ? request.base.lumberStockLengths.map((x) => toInches(x, unit))
        : [...D.lumberStockLengths],
    },
    heat: {
      enabled: request.heat.enabled,
      wattsPerFoot: request.heat.wattsPerFoot,
      endMarginIn: len(request.heat.endMargin, D.heatEndMargin),
      supplyVoltageV: request.heat.supplyVoltage,
      thermostatRatingW: request.heat.thermostatRatingW,
    },
    joints: { ...request.joints },
    limits: {
      maxShelfSagIn: len(l.maxShelfSag, D.maxShelfSag),
      // bindGap may be negative (allowing a little pinch), so convert it without the positivity of len()
      bindGapIn: l.bindGap === undefined ? D.bindGap : toInches(l.bindGap, unit),
      escapeGapIn: len(l.escapeGap, D.escapeGap),
      tipRatio: l.tipRatio,
      doorwayHeightIn: len(l.doorwayHeight, D.doorwayHeight),
      ceilingHeightIn: len(l.ceilingHeight, D.ceilingHeight),
    },
    prices: { ...request.prices },
  };
}
