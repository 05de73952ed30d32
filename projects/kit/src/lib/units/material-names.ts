/*
 * The calculator's material keys as a builder says them, shared by every module. Plain values
 * mirroring shared/api (importing the zod schemas would put zod into each bundle); the orders
 * module's spec checks they agree with the API's lists.
 */
const MATERIAL_NAMES: Record<string, string> = {
  'pvc-rigid': 'Rigid PVC',
  'pvc-expanded': 'Foamed PVC',
  'melamine-particleboard': 'Melamine particleboard',
  plywood: 'Plywood',
  'lumber-2x4': '2x4 lumber',
};

export const SHEET_MATERIALS = ['pvc-rigid', 'pvc-expanded', 'melamine-particleboard', 'plywood'] as const;
export const BOARD_MATERIALS = ['lumber-2x4'] as const;

/** `pvc-rigid` → `Rigid PVC`; a cutting stock key `pvc-rigid@0.5` → `Rigid PVC`. Unknown keys (hardware) show as they are. */
export function baseMaterialName(key: string): string {
  const base = key.split('@')[0] ?? key;
  return MATERIAL_NAMES[base] ?? base;
}
