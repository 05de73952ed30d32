import { formatInches, formatMillimetres, inToMm, lbToKg } from '../../../../shared/units.js';
import type { RackGeometry } from './geometry.js';
import { HEAT_CAUTIONS, type HeatPlan } from './heat.js';
import type { LevelGap, Masses, ShelfAnalysis } from './loads.js';
import { loadPerCasterLb } from './loads.js';
import { MATERIALS, PSI_PER_MPA } from './materials.js';
import type { RackSpec } from './rack-spec.js';

export type Severity = 'info' | 'warning' | 'danger';
export interface Check {
  code: string;
  severity: Severity;
  message: string;
  basis: string;
}

export interface CheckInputs {
  spec: RackSpec;
  geometry: RackGeometry;
  shelves: ShelfAnalysis;
  gaps: LevelGap[];
  masses: Masses;
  casters: number;
  heat: HeatPlan;
}

const SAG_BASIS = 'sag = 5wL^4/384EI, simply supported beam under uniform load (AISC Steel Construction Manual, Table 3-23); w = tubs in the bay + shelf self-weight; I = bt^3/12';
const levelList = (levels: number[]) => (levels.length === 1 ? `level ${levels[0]}` : `levels ${levels.join(', ')}`);

/** The checks a careful builder makes, each with its basis. Lengths in messages are in the request unit. */
export function rackChecks({ spec, geometry, shelves, gaps, masses, casters, heat }: CheckInputs): Check[] {
  const u = spec.unit;
  // Sags and gaps are small: inches to 1/32 so that a pinch does not print as 0.
  const L = (lengthIn: number) => {
    // A sag that rounds to nothing still reads as a sag, not as zero.
    if (lengthIn > 0 && lengthIn < 1 / 64) return u === 'in' ? 'under 1/32 in' : `${formatMillimetres(inToMm(lengthIn))} mm`;
    return u === 'in' ? `${formatInches(lengthIn, 32)} in` : `${formatMillimetres(inToMm(lengthIn))} mm`;
  };
  const mass = (lb: number) => (u === 'in' ? `${Math.round(lb)} lb` : `${Math.round(lbToKg(lb))} kg`);
  const checks: Check[] = [];
  const limit = spec.limits.maxShelfSagIn;
  const modulusText = `E = ${Math.round(shelves.modulusPsi / 1000)} ksi (${Math.round(shelves.modulusPsi / PSI_PER_MPA)} MPa, ${shelves.modulusHeated ? 'heated shelf' : 'room temperature'}: ${shelves.modulusSource})`;

  if (spec.layout.levels > 1) {
    const everyColumn = spec.construction.supportBlock.placement === 'every-column';
    const withoutBlocks = `without blocks it would be ${L(shelves.sagUnsupportedIn)} over ${L(shelves.longestSpanUnsupportedIn)}`;
    if (shelves.supportBlocksUsed) {
      const ok = shelves.shelfSagIn <= limit;
      const where = everyColumn ? 'at every column boundary without a divider' : 'near mid-span of each bay that needs them';
      checks.push({
        code: 'shelf_sag',
        severity: ok ? 'info' : 'warning',
        message: `Shelf sag ${L(shelves.shelfSagIn)} with support blocks ${where} (limit ${L(limit)}; ${withoutBlocks}).${ok ? '' : ' Still too much: use a thicker or stiffer shelf, or lighter tubs.'}`,
        basis: `${SAG_BASIS}; with blocks each span between supports is taken as simply supported; ${modulusText}`,
      });
    } else if (shelves.sagUnsupportedIn <= limit) {
      checks.push({ code: 'shelf_sag', severity: 'info', message: `Shelf sag ${L(shelves.sagUnsupportedIn)} over ${L(shelves.longestSpanUnsupportedIn)} is within ${L(limit)}; no mid-span support needed.`, basis: `${SAG_BASIS}; ${modulusText}` });
    } else {
      checks.push({ code: 'shelf_sag', severity: 'warning', message: `Shelf sag ${L(shelves.sagUnsupportedIn)} over ${L(shelves.longestSpanUnsupportedIn)} exceeds ${L(limit)}, and a one-column bay has no room for a support block: use a thicker or stiffer shelf.`, basis: `${SAG_BASIS}; ${modulusText}` });
    }
  }

  const gapBasis = 'effective lid gap = lid gap + floor sag - ceiling sag at mid-span (a sagging shelf pinches the tub below; a sagging floor opens the gap above its tub; common practice)';
  const binding = gaps.filter((g) => g.lidGapIn < spec.limits.bindGapIn);
  const escaping = gaps.filter((g) => g.lidGapIn > spec.limits.escapeGapIn);
  if (binding.length > 0) {
    const worst = Math.min(...binding.map((g) => g.lidGapIn));
    checks.push({ code: 'lid_gap_bind', severity: 'warning', message: `Tubs on ${levelList(binding.map((g) => g.level))} would bind: the effective lid gap falls to ${L(worst)}. Add support, stiffen the shelf above or increase the lid gap.`, basis: gapBasis });
  }
  if (escaping.length > 0) {
    const worst = Math.max(...escaping.map((g) => g.lidGapIn));
    checks.push({ code: 'lid_gap_escape', severity: 'danger', message: `On ${levelList(escaping.map((g) => g.level))} the lid gap opens to ${L(worst)}, above the escape threshold of ${L(spec.limits.escapeGapIn)}: small animals may get out. Stiffen the floor or reduce the lid gap.`, basis: gapBasis });
  }
  if (binding.length === 0 && escaping.length === 0) {
    const min = Math.min(...gaps.map((g) => g.lidGapIn));
    const max = Math.max(...gaps.map((g) => g.lidGapIn));
    checks.push({ code: 'lid_gap', severity: 'info', message: `Effective lid gaps stay between ${L(min)} and ${L(max)}.`, basis: gapBasis });
  }

  const perCasterLb = loadPerCasterLb(masses.loadedMassLb, casters);
  const casterBasis = `loaded mass / (casters - 1): one caster assumed unloaded on an uneven floor (common practice); empty mass from densities in the material list (${MATERIALS[spec.construction.carcassMaterial].densityKgM3.source})`;
  if (perCasterLb > spec.base.casterRatingLb) {
    checks.push({ code: 'caster_load', severity: 'danger', message: `Each caster may carry ${mass(perCasterLb)}, more than its rating of ${mass(spec.base.casterRatingLb)}: use stronger or more casters.`, basis: casterBasis });
  } else {
    checks.push({ code: 'caster_load', severity: 'info', message: `Each caster carries up to ${mass(perCasterLb)} of its ${mass(spec.base.casterRatingLb)} rating.`, basis: casterBasis });
  }

  const ratio = geometry.overallHeightIn / geometry.overallDepthIn;
  if (ratio > spec.limits.tipRatio) {
    checks.push({ code: 'tipping', severity: 'warning', message: `The rack is ${ratio.toFixed(1)} times as tall as it is deep: anchor it to the wall and lock the casters.`, basis: `overall height / overall depth > ${spec.limits.tipRatio} (common practice for tall furniture)` });
  }

  const tall = geometry.sections.filter((s) => s.heightIn > spec.limits.doorwayHeightIn);
  if (tall.length > 0) {
    checks.push({ code: 'doorway_clearance', severity: 'warning', message: `Section ${tall.map((s) => s.index).join(', ')} is taller (${L(Math.max(...tall.map((s) => s.heightIn)))}) than the doorway clearance of ${L(spec.limits.doorwayHeightIn)}: use more sections or build it in the room.`, basis: 'section height (side panel + top, + bottom for the lowest) against limits.doorwayHeight' });
  }
  if (geometry.overallHeightIn > spec.limits.ceilingHeightIn) {
    checks.push({ code: 'ceiling_clearance', severity: 'warning', message: `The rack stands ${L(geometry.overallHeightIn)} tall, above the ceiling height of ${L(spec.limits.ceilingHeightIn)}.`, basis: 'overall height against limits.ceilingHeight' });
  } else {
    // Standing a section up from its back sweeps its diagonal.
    const tilting = geometry.sections.filter((s) => Math.hypot(s.heightIn + (s.hasBottomPanel ? geometry.baseHeightIn : 0), geometry.depthIn) > spec.limits.ceilingHeightIn);
    if (tilting.length > 0) {
      checks.push({ code: 'ceiling_tilt', severity: 'info', message: `Section ${tilting.map((s) => s.index).join(', ')} cannot be tipped upright under a ${L(spec.limits.ceilingHeightIn)} ceiling: stand it up before stacking or assemble it upright.`, basis: 'diagonal of height and depth against limits.ceilingHeight' });
    }
  }

  if (heat.enabled) {
    if (heat.stripPowerW > heat.thermostatRatingW) {
      checks.push({ code: 'thermostat_rating', severity: 'danger', message: `One strip draws ${Math.round(heat.stripPowerW)} W, more than a thermostat's ${heat.thermostatRatingW} W rating: use a lower-watt tape or a higher-rated thermostat.`, basis: "strip watts = length in feet x watts per foot; against the thermostat maker's rating" });
    }
    const [c15, c20] = heat.circuits;
    const pct = (x: number) => `${Math.round(x * 100)} %`;
    const circuitBasis = 'continuous loads at most 80 % of the branch circuit rating: 15 A x 120 V = 1800 W, 1440 W continuous; 20 A = 2400 W, 1920 W continuous (NFPA 70, 210.19/210.20)';
    if (c20.share > 1) {
      checks.push({ code: 'circuit_load', severity: 'danger', message: `Heat tape draws ${Math.round(heat.totalPowerW)} W, more than one 20 A circuit may carry continuously (${pct(c20.share)}): split it over several circuits.`, basis: circuitBasis });
    } else if (c15.share > 1) {
      checks.push({ code: 'circuit_load', severity: 'warning', message: `Heat tape draws ${Math.round(heat.totalPowerW)} W: ${pct(c15.share)} of a 15 A circuit's continuous limit; it needs a 20 A circuit (${pct(c20.share)}) or two circuits.`, basis: circuitBasis });
    } else {
      checks.push({ code: 'circuit_load', severity: 'info', message: `Heat tape draws ${Math.round(heat.totalPowerW)} W (${heat.currentA.toFixed(1)} A at ${heat.supplyVoltageV} V): ${pct(c15.share)} of a 15 A circuit's continuous limit, ${pct(c20.share)} of a 20 A circuit's, before anything else on the circuit.`, basis: circuitBasis });
    }
  }
  checks.push({ code: 'electrical_code', severity: 'info', message: HEAT_CAUTIONS.slice(0, 2).join(' '), basis: "thermostat maker's rating; NFPA 70 and local electrical code" });
  return checks;
}
