import { Router } from 'express';
import { PairingOutcomesRequest } from '../../../../shared/api/genetics.js';
import { json } from '../../../common/src/async-handler.js';
import { UnprocessableError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { pairingOutcomes, TooManyOutcomesError } from '../domain/genetics/pairing-outcomes.js';

/** Offspring tables for a pairing; stateless, so any role that plans pairings or sells animals may ask. */
export function geneticsRoutes(): Router {
  const router = Router();
  router.post(
    '/api/v1/genetics/pairing-outcomes',
    allow('owner', 'keeper', 'sales', 'integrator'),
    json((req) => {
      const request = parseOrThrow(PairingOutcomesRequest, req.body);
      try {
        return pairingOutcomes(request);
      } catch (err) {
        if (err instanceof TooManyOutcomesError) throw new UnprocessableError(err.message, 'traits');
        throw err;
      }
    }),
  );
  return router;
}
