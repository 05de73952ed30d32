import { IDENTITY_HEADER, signIdentity, type Identity } from '../../../common/src/internal-identity.js';
import { createApp } from '../app.js';

export const CALC_TEST_SECRET = 'calculator-test-secret';

export const calculatorTestApp = () => createApp({ internalSecret: CALC_TEST_SECRET });

export function asRole(role: Identity['role']): Record<string, string> {
  return { [IDENTITY_HEADER]: signIdentity({ kind: 'user', sub: '1', role }, CALC_TEST_SECRET) };
}
