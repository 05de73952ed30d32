import { MATERIALS, densityLbIn3, shelfModulus } from './materials.js';
import type { RackGeometry } from './geometry.js';
import { LUMBER_2X4_IN, type RackSpec } from './rack-spec.js';
import type { PartIn } from './parts.js';

/** Mid-span deflection of a simply supported beam under a uniform load (AISC Manual Table 3-23, case 1). */
export const uniformLoadDeflection = (wPerLength: number, span: number, modulus: number, inertia: number): number =>
  (5 * wPerLength * span ** 4) / (384 * modulus * inertia);

/** Mid-span deflection of a simply supported beam under a point load at the centre (AISC Manual Table 3-23, case 7). */
export const centerPointLoadDeflection = (load: number, span: number, modulus: number, inertia: number): number =>
  (load * span ** 3) / (48 * modulus * inertia);

/** Second moment of area of a rectangle b wide and h deep about its centroid: b h^3 / 12. */
export const rectangleInertia = (width: number, depth: number): number => (width * depth ** 3) / 12;

export interface ShelfAnalysis {
  material: string;
  modulusPsi: number;
  modulusHeated: boolean;
  modulusSource: string;
  /** Longest clear span between side panels and dividers. */
  longestSpanUnsupportedIn: number;
  sagUnsupportedIn: number;
  /** With support blocks at the column boundary nearest mid-span of each bay that needs one; null when no bay can take one. */
  longestSpanSupportedIn: number | null;
  sagSupportedIn: number | null;
  /** Whether blocks are built in (the unsupported sag exceeds the limit and some bay can take them). */
  supportBlocksUsed: boolean;
  /** Columns of support blocks (a front and a back block per level in each); each widens the shelf like a divider. */
  supportColumns: number;
  /** Mid-span sag of a loaded shelf as built (supported where blocks are used). */
  shelfSagIn: number;
  /** Sag of the topmost panel, which carries only itself (blocks in the top level carry it too). */
  topSagIn: number;
  /** Sag of the bottom panel between a base end member and the centre brace. */
  bottomSagIn: number;
  bottomSpanIn: number;
}

/**
 * Sag of the shelves under their tubs and their own weight, each span taken as simply supported
 * (conservative: screwed ends give some fixity). Tub load is spread evenly over the bay it stands in.
 */
export function analyseShelves(spec: RackSpec, geometry: RackGeometry): ShelfAnalysis {
  const { construction: c, tub, layout, allowances } = spec;
  const carcass = MATERIALS[c.carcassMaterial];
  const modulus = shelfModulus(carcass, spec.heat.enabled);
  const inertia = rectangleInertia(geometry.depthIn, c.panelThicknessIn);
  const selfWeightLbPerIn = densityLbIn3(carcass) * c.panelThicknessIn * geometry.depthIn;
  // Play is shared by the columns, so a bay of g columns gets g / columns of it.
  const spanOf = (cols: number) => cols * (tub.widthIn + allowances.sidePlayIn / layout.columns);
  const sagOf = (cols: number, loaded: boolean) => {
    const spanIn = spanOf(cols);
    const w = selfWeightLbPerIn + (loaded ? (cols * tub.loadedMassLb) / spanIn : 0);
    return uniformLoadDeflection(w, spanIn, modulus.modulusPsi, inertia);
  };

  const widestBay = Math.max(...geometry.bays);
  const sagUnsupportedIn = sagOf(widestBay, true);
  const needsSupport = sagUnsupportedIn > spec.limits.maxShelfSagIn;

  // A block can only stand between two tubs, so a bay needs at least two columns to take one.
  const splittable = geometry.bays.filter((g) => g >= 2);
  let longestSpanSupportedIn: number | null = null;
  let sagSupportedIn: number | null = null;
  if (splittable.length > 0) {
    const after = geometry.bays.map((g) => (g < 2 ? g : c.supportBlock.placement === 'every-column' ? 1 : Math.ceil(g / 2)));
    const worst = Math.max(...after);
    longestSpanSupportedIn = spanOf(worst);
    sagSupportedIn = sagOf(worst, true);
  }
  // Common practice: blocks at every column boundary a divider does not take, so each tub has its own span.
  const everyColumn = c.supportBlock.placement === 'every-column';
  const supportBlocksUsed = (everyColumn || needsSupport) && splittable.length > 0 && layout.levels > 1;
  // When placed only as needed, only bays that are too saggy on their own get blocks.
  const blocked = (g: number) => supportBlocksUsed && g >= 2 && (everyColumn || sagOf(g, true) > spec.limits.maxShelfSagIn);
  const supportColumns = everyColumn
    ? geometry.bays.filter(blocked).reduce((sum, g) => sum + g - 1, 0)
    : geometry.bays.filter(blocked).length;
  const asBuiltColumns = (g: number) => (!blocked(g) ? g : everyColumn ? 1 : Math.ceil(g / 2));
  const asBuilt = (loaded: boolean) => Math.max(...geometry.bays.map((g) => sagOf(asBuiltColumns(g), loaded)));
  const shelfSagIn = asBuilt(true);

  const bottom = MATERIALS[c.bottomMaterial];
  const bottomModulus = shelfModulus(bottom, spec.heat.enabled);
  // Base: a cross member at each end and a centre brace, all 2x4 on edge, leave two clear spans.
  const bottomSpanIn = Math.max((geometry.outerShelfLengthIn - 3 * LUMBER_2X4_IN.thickness) / 2, 0);
  const bottomW =
    densityLbIn3(bottom) * c.bottomThicknessIn * geometry.depthIn +
    (layout.columns * tub.loadedMassLb) / geometry.interiorShelfLengthIn;
  const bottomSagIn = uniformLoadDeflection(bottomW, bottomSpanIn, bottomModulus.modulusPsi, rectangleInertia(geometry.depthIn, c.bottomThicknessIn));

  return {
    material: carcass.id,
    modulusPsi: modulus.modulusPsi,
    modulusHeated: modulus.heated,
    modulusSource: modulus.source,
    longestSpanUnsupportedIn: spanOf(widestBay),
    sagUnsupportedIn,
    longestSpanSupportedIn,
    sagSupportedIn,
    supportBlocksUsed,
    supportColumns,
    shelfSagIn,
    topSagIn: asBuilt(false),
    bottomSagIn,
    bottomSpanIn,
  };
}

export interface LevelGap {
  level: number;
  floorSagIn: number;
  ceilingSagIn: number;
  lidGapIn: number;
}

/**
 * Effective lid gap of each level at mid-span: a sagging ceiling pinches the tub, a sagging floor
 * lowers it and opens the gap. Interior levels cancel out; the bottom and top levels do not.
 */
export function levelGaps(spec: RackSpec, shelves: ShelfAnalysis): LevelGap[] {
  const n = spec.layout.levels;
  return Array.from({ length: n }, (_, i) => {
    const level = i + 1;
    const floorSagIn = level === 1 ? shelves.bottomSagIn : shelves.shelfSagIn;
    const ceilingSagIn = level === n ? shelves.topSagIn : shelves.shelfSagIn;
    return { level, floorSagIn, ceilingSagIn, lidGapIn: spec.allowances.lidGapIn + floorSagIn - ceilingSagIn };
  });
}

export interface Masses {
  emptyMassLb: number;
  tubsMassLb: number;
  loadedMassLb: number;
}

/** Mass of the parts from their volumes and the material list's densities; hardware is left out (a few pounds). */
export function rackMasses(spec: RackSpec, parts: readonly PartIn[]): Masses {
  const emptyMassLb = parts.reduce(
    (sum, p) => sum + p.lengthIn * p.widthIn * p.thicknessIn * p.quantity * densityLbIn3(MATERIALS[p.material]),
    0,
  );
  const tubsMassLb = spec.layout.levels * spec.layout.columns * spec.tub.loadedMassLb;
  return { emptyMassLb, tubsMassLb, loadedMassLb: emptyMassLb + tubsMassLb };
}

/** Load on each caster with one caster assumed to carry nothing (uneven floor; common practice). */
export const loadPerCasterLb = (loadedMassLb: number, casters: number): number => loadedMassLb / Math.max(casters - 1, 1);
