import type { SheetMaterialId } from '../../../../shared/api/rack-plan.js';

/** Where a property value comes from. `from memory` values are typical figures still to be checked against a data sheet. */
export interface SourcedValue {
  value: number;
  source: string;
  fromMemory: boolean;
}

export interface Material {
  id: SheetMaterialId | 'lumber-2x4';
  name: string;
  densityKgM3: SourcedValue;
  /** Bending (flexural) modulus at room temperature, MPa. */
  modulusMPa: SourcedValue;
  /** Modulus at the temperature of a shelf over heat tape (about 35 to 50 °C), where known. */
  heatedModulusMPa?: SourcedValue;
}

const memory = (value: number, source: string): SourcedValue => ({ value, source: `${source} (from memory)`, fromMemory: true });

export const MATERIALS: Record<SheetMaterialId | 'lumber-2x4', Material> = {
  'pvc-rigid': {
    id: 'pvc-rigid',
    name: 'rigid PVC sheet',
    // Specific gravity 1.41: the value plastics makers' data sheets give per ASTM D792 for type I rigid PVC.
    densityKgM3: { value: 1410, source: 'ASTM D792 specific gravity 1.41 in makers’ data sheets for rigid PVC', fromMemory: false },
    modulusMPa: memory(2900, 'makers’ data sheets, flexural modulus per ASTM D790, about 420 ksi'),
    // PVC stiffness falls steadily as it warms toward its glass transition (about 80 °C).
    heatedModulusMPa: memory(2300, 'about 80 % of the room-temperature modulus near 50 °C, makers’ modulus-temperature curves'),
  },
  'pvc-expanded': {
    id: 'pvc-expanded',
    name: 'expanded (foamed) PVC sheet',
    densityKgM3: memory(550, 'makers’ data sheets for 1/2 in foamed PVC board, ASTM D792'),
    modulusMPa: memory(900, 'makers’ data sheets for foamed PVC board, flexural modulus per ASTM D790'),
    heatedModulusMPa: memory(700, 'about 80 % of the room-temperature modulus near 50 °C, as for rigid PVC'),
  },
  'melamine-particleboard': {
    id: 'melamine-particleboard',
    name: 'melamine-faced particleboard',
    densityKgM3: memory(720, 'ANSI A208.1 grade M-2 particleboard, typical density'),
    modulusMPa: memory(2250, 'ANSI A208.1 grade M-2 minimum modulus of elasticity'),
  },
  plywood: {
    id: 'plywood',
    name: 'softwood plywood',
    densityKgM3: memory(545, 'APA, typical softwood plywood about 34 lb/ft³'),
    modulusMPa: memory(8300, 'APA Panel Design Specification, effective bending stiffness along the face grain, about 1.2 Msi'),
  },
  'lumber-2x4': {
    id: 'lumber-2x4',
    name: '2x4 lumber (spruce-pine-fir)',
    densityKgM3: memory(420, 'NDS Supplement, specific gravity 0.42 for spruce-pine-fir'),
    modulusMPa: memory(9650, 'NDS Supplement Table 4A, No. 2 spruce-pine-fir E = 1,400,000 psi'),
  },
};

/** lb/in³ per kg/m³, from the exact inch and pound (NIST SP 811). */
export const LB_PER_IN3_PER_KG_M3 = 0.0254 ** 3 / 0.45359237;
/** psi per MPa: 1 lbf/in² = 4.4482216152605 N / (0.0254 m)² (NIST SP 811). */
export const PSI_PER_MPA = 1e6 / (4.4482216152605 / 0.0254 ** 2);

export const densityLbIn3 = (m: Material): number => m.densityKgM3.value * LB_PER_IN3_PER_KG_M3;

/** Modulus for a shelf, in psi: the heated value when the shelf is heated and the list gives one. */
export function shelfModulus(m: Material, heated: boolean): { modulusPsi: number; heated: boolean; source: string } {
  const useHeated = heated && m.heatedModulusMPa !== undefined;
  const v = useHeated ? m.heatedModulusMPa! : m.modulusMPa;
  return { modulusPsi: v.value * PSI_PER_MPA, heated: useHeated, source: v.source };
}
