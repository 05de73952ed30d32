/** Names of the calculator's materials as a builder says them; the shop's own labels come from /materials. */
const NAMES: Record<string, string> = {
  'pvc-rigid': 'Rigid PVC',
  'pvc-expanded': 'Foamed PVC',
  'melamine-particleboard': 'Melamine particleboard',
  plywood: 'Plywood',
  'lumber-2x4': '2x4 lumber',
};

/** `pvc-rigid` → `Rigid PVC`; a cutting stock key `pvc-rigid@0.5` → `Rigid PVC`. Unknown keys show as they are. */
export function materialName(key: string): string {
  const base = key.split('@')[0] ?? key;
  return NAMES[base] ?? base;
}

export const SHEET_MATERIALS = ['pvc-rigid', 'pvc-expanded', 'melamine-particleboard', 'plywood'] as const;
