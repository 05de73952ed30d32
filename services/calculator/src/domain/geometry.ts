import { UnbuildableSpecError } from './errors.js';
import { LUMBER_2X4_IN, type RackSpec } from './rack-spec.js';

/** Slack for comparing lengths that went through a mm conversion (1e-7 in is far below any saw). */
export const EPS_IN = 1e-7;

export interface SectionGeometry {
  index: number;
  levels: number;
  firstLevel: number;
  sidePanelHeightIn: number;
  heightIn: number;
  hasBottomPanel: boolean;
  dowels: number;
}

export interface RackGeometry {
  levelOpeningIn: number;
  interiorShelfLengthIn: number;
  outerShelfLengthIn: number;
  depthIn: number;
  carcassHeightIn: number;
  baseHeightIn: number;
  overallHeightIn: number;
  overallWidthIn: number;
  overallDepthIn: number;
  sections: SectionGeometry[];
  /** Columns in each bay between the side panels and dividers. */
  bays: number[];
}

export interface SheetSizeIn {
  lengthIn: number;
  widthIn: number;
}

/** Side panel of a section with k levels: k openings and the k - 1 shelves between them (common practice). */
export const sidePanelHeight = (levels: number, openingIn: number, panelThicknessIn: number): number =>
  levels * openingIn + (levels - 1) * panelThicknessIn;

/** Whether a rectangle fits a sheet, turned either way. */
export const fitsSheet = (lengthIn: number, widthIn: number, sheet: SheetSizeIn): boolean =>
  (lengthIn <= sheet.lengthIn + EPS_IN && widthIn <= sheet.widthIn + EPS_IN) ||
  (lengthIn <= sheet.widthIn + EPS_IN && widthIn <= sheet.lengthIn + EPS_IN);

/** Longest a part of the given width can be on the sheet, or 0 when the width fits neither way. */
export function longestOnSheet(widthIn: number, sheet: SheetSizeIn): number {
  const long = Math.max(sheet.lengthIn, sheet.widthIn);
  const short = Math.min(sheet.lengthIn, sheet.widthIn);
  if (widthIn <= short + EPS_IN) return long;
  if (widthIn <= long + EPS_IN) return short;
  return 0;
}

/** `total` split into `parts` whole numbers differing by at most one, larger ones first. */
export function balancedSplit(total: number, parts: number): number[] {
  const base = Math.floor(total / parts);
  const extra = total % parts;
  return Array.from({ length: parts }, (_, i) => base + (i < extra ? 1 : 0));
}

/**
 * Levels per section, from the bottom: the fewest sections whose side panels are no longer than
 * `maxSideIn`, balanced (sizes differ by at most one, larger sections lowest).
 */
export function fewestBalancedSections(levels: number, openingIn: number, panelThicknessIn: number, maxSideIn: number): number[] {
  // Largest k with k x opening + (k - 1) x t <= max, i.e. k <= (max + t) / (opening + t).
  let k = Math.floor((maxSideIn + panelThicknessIn + EPS_IN) / (openingIn + panelThicknessIn));
  k = Math.min(k, levels);
  if (k < 1) return [];
  return balancedSplit(levels, Math.ceil(levels / k));
}

/** Columns in each bay: dividers + 1 bays, balanced. */
export const baysOf = (columns: number, dividers: number): number[] => balancedSplit(columns, dividers + 1);

/**
 * Dimensions and sections. `supportColumns` columns of support blocks stand between columns and,
 * like dividers, widen the shelf by their thickness.
 */
export function rackGeometry(spec: RackSpec, supportColumns = 0): RackGeometry {
  const { tub, layout, allowances, construction: c } = spec;
  const t = c.panelThicknessIn;
  const levelOpeningIn = tub.heightIn + allowances.lidGapIn;
  const interiorShelfLengthIn = layout.columns * tub.widthIn + allowances.sidePlayIn + (layout.dividers + supportColumns) * c.dividerThicknessIn;
  const outerShelfLengthIn = interiorShelfLengthIn + 2 * t;
  const depthIn = tub.lengthIn + allowances.depthPlayIn;

  const sideMaxOnSheet = longestOnSheet(depthIn, c.sheet);
  if (sideMaxOnSheet === 0) {
    throw new UnbuildableSpecError(
      `panels are ${depthIn.toFixed(3)} in deep, deeper than the sheet is wide or long`,
      'tub.length',
    );
  }
  if (levelOpeningIn > sideMaxOnSheet + EPS_IN) {
    throw new UnbuildableSpecError(
      `a level opening of ${levelOpeningIn.toFixed(3)} in is taller than a side panel can be cut from the sheet`,
      'tub.height',
    );
  }

  let levelsPerSection: number[];
  if ('levelsPerSection' in spec.sections) {
    levelsPerSection = spec.sections.levelsPerSection;
    levelsPerSection.forEach((k, i) => {
      if (sidePanelHeight(k, levelOpeningIn, t) > sideMaxOnSheet + EPS_IN) {
        throw new UnbuildableSpecError(
          `section ${i + 1} (${k} levels) has side panels longer than the sheet allows`,
          'sections.levelsPerSection',
        );
      }
    });
  } else {
    const maxSideIn = Math.min(spec.sections.maxSidePanelLengthIn, sideMaxOnSheet);
    levelsPerSection = fewestBalancedSections(layout.levels, levelOpeningIn, t, maxSideIn);
    if (levelsPerSection.length === 0) {
      throw new UnbuildableSpecError(
        `a single level (${levelOpeningIn.toFixed(3)} in opening) is taller than maxSidePanelLength`,
        'sections.maxSidePanelLength',
      );
    }
  }

  let firstLevel = 1;
  const sections = levelsPerSection.map((levels, i): SectionGeometry => {
    const sidePanelHeightIn = sidePanelHeight(levels, levelOpeningIn, t);
    const hasBottomPanel = i === 0;
    const section: SectionGeometry = {
      index: i + 1,
      levels,
      firstLevel,
      sidePanelHeightIn,
      heightIn: sidePanelHeightIn + t + (hasBottomPanel ? c.bottomThicknessIn : 0),
      hasBottomPanel,
      dowels: i === 0 ? 0 : spec.joints.dowelsPerJoint,
    };
    firstLevel += levels;
    return section;
  });

  const carcassHeightIn = c.bottomThicknessIn + sections.reduce((sum, s) => sum + s.sidePanelHeightIn + t, 0);
  const baseHeightIn = LUMBER_2X4_IN.width + spec.base.casterHeightIn; // 2x4 on edge
  return {
    levelOpeningIn,
    interiorShelfLengthIn,
    outerShelfLengthIn,
    depthIn,
    carcassHeightIn,
    baseHeightIn,
    overallHeightIn: carcassHeightIn + baseHeightIn,
    overallWidthIn: outerShelfLengthIn,
    overallDepthIn: depthIn + (c.backPanel ? c.backPanelThicknessIn : 0),
    sections,
    bays: baysOf(layout.columns, layout.dividers),
  };
}
