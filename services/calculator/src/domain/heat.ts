import { UnbuildableSpecError } from './errors.js';
import type { RackGeometry } from './geometry.js';
import type { RackSpec } from './rack-spec.js';

/** Continuous loads may use 80 % of a branch circuit's rating (NFPA 70, 210.19(A) and 210.20(A)). */
export const CONTINUOUS_LOAD_FACTOR = 0.8;
export const BRANCH_CIRCUIT_VOLTAGE_V = 120;
export const BRANCH_CIRCUIT_RATINGS_A = [15, 20] as const;

export const HEAT_CAUTIONS = [
  "Follow the thermostat maker's rating: never connect more heat tape to one thermostat than it is rated to switch.",
  'Follow local electrical code; have wiring done by a licensed electrician where required.',
  'Heat tape runs continuously for hours: plan circuits at 80 % of their rating (NFPA 70, 210.19/210.20), and keep tape, terminals and leads insulated and clear of substrate and water.',
];

export interface CircuitShare {
  ratingA: number;
  voltageV: number;
  capacityW: number;
  continuousLimitW: number;
  share: number;
}

export interface HeatPlan {
  enabled: boolean;
  strips: number;
  stripLengthIn: number;
  stripPowerW: number;
  wattsPerFoot: number;
  totalTapeFeet: number;
  totalPowerW: number;
  supplyVoltageV: number;
  currentA: number;
  thermostats: number;
  stripsPerThermostat: number;
  thermostatRatingW: number;
  circuits: CircuitShare[];
  cautions: string[];
}

export function circuitShare(ratingA: number, powerW: number): CircuitShare {
  const capacityW = ratingA * BRANCH_CIRCUIT_VOLTAGE_V;
  const continuousLimitW = capacityW * CONTINUOUS_LOAD_FACTOR;
  return { ratingA, voltageV: BRANCH_CIRCUIT_VOLTAGE_V, capacityW, continuousLimitW, share: powerW / continuousLimitW };
}

/** One strip per level along the back of the shelf each tub stands on. */
export function heatPlan(spec: RackSpec, geometry: RackGeometry): HeatPlan {
  const h = spec.heat;
  const strips = h.enabled ? spec.layout.levels : 0;
  const stripLengthIn = h.enabled ? geometry.interiorShelfLengthIn - 2 * h.endMarginIn : 0;
  if (h.enabled && stripLengthIn <= 0) {
    throw new UnbuildableSpecError('the heat tape end margins leave no tape on the shelf', 'heat.endMargin');
  }
  const stripPowerW = (stripLengthIn / 12) * h.wattsPerFoot;
  const totalPowerW = strips * stripPowerW;
  // Strips are not split between thermostats; a strip above the rating still gets one (and a danger check).
  const stripsPerThermostat = stripPowerW > 0 ? Math.floor(h.thermostatRatingW / stripPowerW) : 0;
  const thermostats = strips === 0 ? 0 : stripsPerThermostat === 0 ? strips : Math.ceil(strips / stripsPerThermostat);
  return {
    enabled: h.enabled,
    strips,
    stripLengthIn,
    stripPowerW,
    wattsPerFoot: h.wattsPerFoot,
    totalTapeFeet: (strips * stripLengthIn) / 12,
    totalPowerW,
    supplyVoltageV: h.supplyVoltageV,
    currentA: totalPowerW / h.supplyVoltageV,
    thermostats,
    stripsPerThermostat,
    thermostatRatingW: h.thermostatRatingW,
    circuits: BRANCH_CIRCUIT_RATINGS_A.map((a) => circuitShare(a, totalPowerW)),
    cautions: [...HEAT_CAUTIONS],
  };
}
