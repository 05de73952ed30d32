import type { PriceKey } from '../../../../shared/api/rack-plan.js';
import type { RackGeometry } from './geometry.js';
import type { PartIn } from './parts.js';
import { SIX_CASTER_WIDTH_IN, type RackSpec } from './rack-spec.js';

export interface HardwareItem {
  key: PriceKey;
  name: string;
  quantity: number;
  unit: 'each' | 'can';
  note?: string;
  basis: string;
}

/** Casters: as requested, else 4, or 6 (a middle pair under the centre brace) for a wide rack. */
export const casterCount = (spec: RackSpec, geometry: RackGeometry): number =>
  spec.base.casterCount ?? (geometry.overallWidthIn > SIX_CASTER_WIDTH_IN ? 6 : 4);

const quantityOf = (parts: readonly PartIn[], key: string) =>
  parts.filter((p) => p.key === key).reduce((sum, p) => sum + p.quantity, 0);

/** Fasteners and fittings from the joint rules (defaults are common practice). */
export function rackHardware(spec: RackSpec, geometry: RackGeometry, parts: readonly PartIn[]): HardwareItem[] {
  const j = spec.joints;
  const sections = geometry.sections.length;
  const shelves = quantityOf(parts, 'interior-shelf');
  const dividerPieces = quantityOf(parts, 'divider');
  const blocks = quantityOf(parts, 'support-block-front') + quantityOf(parts, 'support-block-back');
  const casters = casterCount(spec, geometry);
  const locking = Math.min(spec.base.lockingCasters, casters);
  const items: HardwareItem[] = [];
  const add = (item: HardwareItem) => {
    if (item.quantity > 0) items.push(item);
  };

  add({ key: 'screw.carcass', name: 'flat-head screw, top panel to side panel', quantity: j.screwsPerCorner * 2 * sections, unit: 'each', basis: `${j.screwsPerCorner} per corner x 2 corners x ${sections} top panel(s)` });
  add({ key: 'screw.carcass', name: 'flat-head screw, bottom panel to side panel', quantity: j.screwsPerCorner * 2, unit: 'each', note: `countersunk pilot holes in the ${spec.construction.bottomMaterial === 'plywood' ? 'plywood' : 'bottom panel'}`, basis: `${j.screwsPerCorner} per corner x 2 corners` });
  add({ key: 'screw.carcass', name: 'flat-head screw, interior shelf ends', quantity: j.screwsPerShelfEnd * 2 * shelves, unit: 'each', basis: `${j.screwsPerShelfEnd} per end x 2 ends x ${shelves} interior shelves` });
  add({ key: 'screw.carcass', name: 'flat-head screw, divider ends', quantity: j.screwsPerDividerEnd * 2 * dividerPieces, unit: 'each', basis: `${j.screwsPerDividerEnd} per end x 2 ends x ${dividerPieces} divider pieces` });
  add({ key: 'screw.base', name: 'screw, base frame corners', quantity: j.screwsPerBaseCorner * 4, unit: 'each', basis: `${j.screwsPerBaseCorner} per corner x 4 corners` });
  add({ key: 'screw.base', name: 'screw, centre brace ends', quantity: j.screwsPerBraceEnd * 2, unit: 'each', basis: `${j.screwsPerBraceEnd} per end x 2 ends` });
  add({ key: 'screw.caster', name: 'screw, caster plates', quantity: j.screwsPerCasterPlate * casters, unit: 'each', basis: `${j.screwsPerCasterPlate} per plate x ${casters} casters` });
  add({ key: 'dowel', name: 'dowel, section joints', quantity: j.dowelsPerJoint * (sections - 1), unit: 'each', note: 'drilled through the top of the section below into the side panels above', basis: `${j.dowelsPerJoint} per joint x ${sections - 1} joint(s)` });
  add({ key: 'caster', name: 'caster', quantity: casters - locking, unit: 'each', basis: `${casters} casters, ${locking} of them locking` });
  add({ key: 'caster.locking', name: 'caster with brake', quantity: locking, unit: 'each', basis: `${locking} locking casters` });
  const pvc = spec.construction.carcassMaterial.startsWith('pvc');
  add({ key: 'pvc-cement', name: 'PVC cement', quantity: pvc ? 1 : 0, unit: 'can', note: blocks > 0 ? `glues the ${blocks} support blocks` : undefined, basis: 'one can per rack' });
  return items;
}
