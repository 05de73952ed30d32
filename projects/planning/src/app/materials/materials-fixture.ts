import type { ShopMaterial } from '../shared/plan-types';

/** Two materials as GET /api/v1/materials lists them (values as the demo shop keeps them). */
export const MATERIALS: ShopMaterial[] = [
  {
    id: 1,
    key: 'pvc-rigid',
    label: 'Rigid PVC sheet, 1/2 in',
    kind: 'sheet',
    thicknessIn: 0.5,
    densityKgM3: 1410,
    modulusMPa: 2900,
    heatedModulusMPa: 2300,
    source: 'Supplier data sheet',
    pricePerSheet: 235,
    sheetLengthIn: 96,
    sheetWidthIn: 48,
    usedByCalculator: true,
    updatedAt: '2026-12-01T09:00:00.000Z',
  },
  {
    id: 5,
    key: 'lumber-2x4',
    label: '2x4 stud',
    kind: 'board',
    thicknessIn: 1.5,
    densityKgM3: 450,
    modulusMPa: 9000,
    heatedModulusMPa: null,
    source: '',
    pricePerSheet: 4.5,
    sheetLengthIn: 96,
    sheetWidthIn: 3.5,
    usedByCalculator: true,
    updatedAt: '2026-12-01T09:00:00.000Z',
  },
];

export const ownerSession = (role = 'owner') => ({
  accessToken: `token-${role}`,
  refreshToken: 'r',
  expiresIn: 900,
  user: { id: 1, email: `${role}@example.test`, name: role, role },
});
