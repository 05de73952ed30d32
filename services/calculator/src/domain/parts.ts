import type { SheetMaterialId } from '../../../../shared/api/rack-plan.js';
import { UnbuildableSpecError } from './errors.js';
import { EPS_IN, fitsSheet, type RackGeometry } from './geometry.js';
import type { ShelfAnalysis } from './loads.js';
import { LUMBER_2X4_IN, type RackSpec } from './rack-spec.js';

export type PartMaterial = SheetMaterialId | 'lumber-2x4';

export interface PartIn {
  key: string;
  name: string;
  material: PartMaterial;
  lengthIn: number;
  widthIn: number;
  thicknessIn: number;
  quantity: number;
  /** Section index, 1 = lowest; null for the base. */
  section: number | null;
  note?: string;
}

export const isSheetPart = (p: PartIn): p is PartIn & { material: SheetMaterialId } => p.material !== 'lumber-2x4';

/** Most pieces a back panel is split into before we call it unbuildable. */
const MAX_BACK_PIECES = 12;

/** Every part of the rack, with quantities, in inches. Throws UnbuildableSpecError when a part fits no stock. */
export function rackParts(spec: RackSpec, geometry: RackGeometry, shelves: ShelfAnalysis): PartIn[] {
  const c = spec.construction;
  const g = geometry;
  const t = c.panelThicknessIn;
  const carcass = c.carcassMaterial;
  const { dividers } = spec.layout;
  const parts: PartIn[] = [];
  const add = (p: PartIn) => {
    if (p.quantity > 0) parts.push(p);
  };

  for (const s of g.sections) {
    const section = s.index;
    add({ key: 'side-panel', name: 'side panel', material: carcass, lengthIn: s.sidePanelHeightIn, widthIn: g.depthIn, thicknessIn: t, quantity: 2, section });
    add({ key: 'interior-shelf', name: 'interior shelf', material: carcass, lengthIn: g.interiorShelfLengthIn, widthIn: g.depthIn, thicknessIn: t, quantity: s.levels - 1, section, note: 'fits between the side panels' });
    add({ key: 'top-panel', name: 'top panel', material: carcass, lengthIn: g.outerShelfLengthIn, widthIn: g.depthIn, thicknessIn: t, quantity: 1, section, note: 'covers the ends of both side panels' });
    if (s.hasBottomPanel) {
      add({ key: 'bottom-panel', name: 'bottom panel', material: c.bottomMaterial, lengthIn: g.outerShelfLengthIn, widthIn: g.depthIn, thicknessIn: c.bottomThicknessIn, quantity: 1, section, note: 'covers the ends of both side panels; countersunk pilot holes for the screws' });
    }
    add({
      key: 'divider',
      name: 'divider',
      material: carcass,
      lengthIn: g.levelOpeningIn,
      widthIn: g.depthIn,
      thicknessIn: c.dividerThicknessIn,
      quantity: s.levels * dividers,
      section,
      note: spec.heat.enabled ? 'one per level per divider; notch the back lower corner for the heat tape' : 'one per level per divider',
    });
    if (shelves.supportBlocksUsed) {
      // Every level gets a pair per support column: each pair carries the shelf above it.
      const quantity = s.levels * shelves.supportColumns;
      const b = c.supportBlock;
      add({ key: 'support-block-front', name: 'support block, front (wide)', material: carcass, lengthIn: g.levelOpeningIn, widthIn: b.frontDepthIn, thicknessIn: c.dividerThicknessIn, quantity, section, note: 'a vertical support between two columns near mid-span, flush with the front edge; glue to the shelves' });
      add({ key: 'support-block-back', name: 'support block, back (thin)', material: carcass, lengthIn: g.levelOpeningIn, widthIn: b.backDepthIn, thicknessIn: c.dividerThicknessIn, quantity, section, note: 'stands in line with the front block, just in front of the heat tape; glue to the shelves' });
    }
    if (c.backPanel) {
      // Split the back into equal vertical strips until one fits the sheet.
      let pieces = 1;
      while (pieces <= MAX_BACK_PIECES && !fitsSheet(s.heightIn, g.outerShelfLengthIn / pieces, c.sheet)) pieces++;
      if (pieces > MAX_BACK_PIECES) {
        throw new UnbuildableSpecError(`the back panel of section ${section} cannot be cut from the sheet`, 'construction.backPanel');
      }
      add({ key: 'back-panel', name: 'back panel', material: carcass, lengthIn: s.heightIn, widthIn: g.outerShelfLengthIn / pieces, thicknessIn: c.backPanelThicknessIn, quantity: pieces, section, note: pieces > 1 ? `${pieces} strips butted side by side` : 'covers the whole back of the section' });
    }
  }

  const lumber = { material: 'lumber-2x4' as const, widthIn: LUMBER_2X4_IN.width, thicknessIn: LUMBER_2X4_IN.thickness, section: null };
  const betweenRailsIn = g.depthIn - 2 * LUMBER_2X4_IN.thickness;
  add({ ...lumber, key: 'base-rail', name: 'base rail', lengthIn: g.outerShelfLengthIn, quantity: 2, note: 'full width, front and back, on edge' });
  add({ ...lumber, key: 'base-cross-member', name: 'base cross member', lengthIn: betweenRailsIn, quantity: 2, note: 'between the rails at each end, on edge' });
  add({ ...lumber, key: 'base-centre-brace', name: 'base centre brace', lengthIn: betweenRailsIn, quantity: 1, note: 'between the rails at mid-width, on edge' });

  assertFitsStock(spec, parts);
  return parts;
}

const FIELD_OF_PART: Record<string, string> = {
  'interior-shelf': 'layout.columns',
  'top-panel': 'layout.columns',
  'bottom-panel': 'layout.columns',
  divider: 'tub.height',
  'side-panel': 'sections',
  'support-block-front': 'construction.supportBlock',
  'support-block-back': 'construction.supportBlock',
  'back-panel': 'construction.backPanel',
};

function assertFitsStock(spec: RackSpec, parts: readonly PartIn[]): void {
  const longestStockIn = Math.max(...spec.base.lumberStockLengthsIn);
  for (const p of parts) {
    if (isSheetPart(p)) {
      if (!fitsSheet(p.lengthIn, p.widthIn, spec.construction.sheet)) {
        throw new UnbuildableSpecError(
          `the ${p.name} (${p.lengthIn.toFixed(3)} x ${p.widthIn.toFixed(3)} in) does not fit on the sheet`,
          FIELD_OF_PART[p.key] ?? 'construction.sheet',
        );
      }
    } else if (p.lengthIn > longestStockIn + EPS_IN) {
      throw new UnbuildableSpecError(
        `the ${p.name} (${p.lengthIn.toFixed(3)} in) is longer than the longest 2x4 stock`,
        'base.lumberStockLengths',
      );
    } else if (p.lengthIn <= 0) {
      throw new UnbuildableSpecError(`the rack is too shallow for a 2x4 base (${p.name})`, 'tub.length');
    }
  }
}
