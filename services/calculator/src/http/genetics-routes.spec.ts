import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { PAIRING_OUTCOMES_EXAMPLE, PairingOutcomesResponse } from '../../../../shared/api/genetics.js';
import { errorHandler } from '../../../common/src/error-handler.js';
import { IDENTITY_HEADER, requireGatewayIdentity, signIdentity, type Identity } from '../../../common/src/internal-identity.js';
import { geneticsRoutes } from './genetics-routes.js';

const SECRET = 'genetics-test-secret';
const PATH = '/api/v1/genetics/pairing-outcomes';

function testApp() {
  const app = express();
  app.use(requireGatewayIdentity(SECRET));
  app.use(express.json());
  app.use(geneticsRoutes());
  app.use(errorHandler(() => {}));
  return app;
}

const as = (role: Identity['role']) => ({
  [IDENTITY_HEADER]: signIdentity({ kind: role === 'integrator' ? 'api-key' : 'user', sub: '1', role }, SECRET),
});

const post = (body: unknown, role: Identity['role'] = 'keeper') => request(testApp()).post(PATH).set(as(role)).send(body as object);

describe(`POST ${PATH}`, () => {
  it('answers the documented example with its schema; het x het gives 1/4 visual and 2/3 het among the rest', async () => {
    const res = await post(PAIRING_OUTCOMES_EXAMPLE);
    expect(res.status).toBe(200);
    expect(PairingOutcomesResponse.safeParse(res.body).success).toBe(true);
    expect(res.body.outcomes).toContainEqual({ name: 'amber, dusk', genotype: { amber: 'visual', dusk: 'single' }, probability: 0.125, fraction: '1/8' });
    const normal = res.body.appearances.find((a: { name: string }) => a.name === 'normal');
    expect(normal).toMatchObject({ fraction: '3/8', hetChance: { amber: 0.6667 }, hetFraction: { amber: '2/3' } });
  });

  it.each(['owner', 'keeper', 'sales', 'integrator'] as const)('lets %s ask', async (role) => {
    expect((await post(PAIRING_OUTCOMES_EXAMPLE, role)).status).toBe(200);
  });

  it('accepts a possible-het parent', async () => {
    const res = await post({
      traits: [{ name: 'amber', mode: 'recessive' }],
      sire: { amber: { state: 'possible-het', hetProbability: 0.5 } },
      dam: { amber: 'het' },
    });
    expect(res.status).toBe(200);
    expect(res.body.appearances.map((a: { fraction: string }) => a.fraction)).toEqual(['7/8', '1/8']);
  });

  describe('bad input answers 400 naming the field', () => {
    const cases: [string, unknown, string][] = [
      ['a trait in sire that is not listed', { ...PAIRING_OUTCOMES_EXAMPLE, sire: { amber: 'het', ember: 'het' } }, 'sire.ember'],
      ['a state that does not fit the mode', { ...PAIRING_OUTCOMES_EXAMPLE, dam: { dusk: 'het' } }, 'dam.dusk'],
      ['super for a recessive trait', { ...PAIRING_OUTCOMES_EXAMPLE, sire: { amber: 'super' } }, 'sire.amber'],
      ['possible het for an incomplete dominant', { ...PAIRING_OUTCOMES_EXAMPLE, sire: { dusk: { state: 'possible-het', hetProbability: 0.5 } } }, 'sire.dusk'],
      ['a duplicate trait name', { ...PAIRING_OUTCOMES_EXAMPLE, traits: [...PAIRING_OUTCOMES_EXAMPLE.traits, { name: 'amber', mode: 'dominant' }] }, 'traits[2].name'],
      ['a duplicate differing only in case', { ...PAIRING_OUTCOMES_EXAMPLE, traits: [...PAIRING_OUTCOMES_EXAMPLE.traits, { name: 'Dusk', mode: 'dominant' }] }, 'traits[2].name'],
      ['an unknown mode', { ...PAIRING_OUTCOMES_EXAMPLE, traits: [{ name: 'amber', mode: 'codominant' }] }, 'traits[0].mode'],
      ['traits that are not an array', { ...PAIRING_OUTCOMES_EXAMPLE, traits: 'amber' }, 'traits'],
      ['no traits', { traits: [], sire: {}, dam: {} }, 'traits'],
      ['a state that is a number', { ...PAIRING_OUTCOMES_EXAMPLE, sire: { amber: 1 } }, 'sire.amber'],
      ['a parent that is a list', { ...PAIRING_OUTCOMES_EXAMPLE, dam: ['het'] }, 'dam'],
      ['a missing parent', { traits: PAIRING_OUTCOMES_EXAMPLE.traits, sire: {} }, 'dam'],
      ['a het probability above 1', { ...PAIRING_OUTCOMES_EXAMPLE, sire: { amber: { state: 'possible-het', hetProbability: 1.5 } } }, 'sire.amber.hetProbability'],
      ['a het probability with five decimals', { ...PAIRING_OUTCOMES_EXAMPLE, sire: { amber: { state: 'possible-het', hetProbability: 0.66667 } } }, 'sire.amber.hetProbability'],
      ['a trait name with a leading space', { ...PAIRING_OUTCOMES_EXAMPLE, traits: [{ name: ' amber', mode: 'recessive' }] }, 'traits[0].name'],
      ['thirteen traits', { traits: Array.from({ length: 13 }, (_, i) => ({ name: `t${i}`, mode: 'recessive' })), sire: {}, dam: {} }, 'traits'],
    ];
    it.each(cases)('%s', async (_what, body, field) => {
      const res = await post(body);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(res.body.error.field).toBe(field);
    });

    it('an unknown member is refused', async () => {
      const res = await post({ ...PAIRING_OUTCOMES_EXAMPLE, litter: 6 });
      expect(res.status).toBe(400);
      expect(res.body.error.message).toContain('litter');
    });
  });

  it('answers 422 naming traits when the table would be too large', async () => {
    const names = Array.from({ length: 9 }, (_, i) => `t${i}`);
    const hets = Object.fromEntries(names.map((n) => [n, 'het']));
    const res = await post({ traits: names.map((name) => ({ name, mode: 'recessive' })), sire: hets, dam: hets });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('traits');
  });

  it('answers 401 without the gateway identity', async () => {
    const res = await request(testApp()).post(PATH).send(PAIRING_OUTCOMES_EXAMPLE);
    expect(res.status).toBe(401);
  });

  it('answers 403 for a builder', async () => {
    const res = await post(PAIRING_OUTCOMES_EXAMPLE, 'builder');
    expect(res.status).toBe(403);
  });
});
