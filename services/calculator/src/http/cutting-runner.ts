import type { CuttingPlanRequestInput, CuttingPlanResponse } from '../../../../shared/api/cutting-plan.js';
import { UnprocessableError } from '../../../common/src/errors.js';
import { planCutting } from '../domain/cutting/cutting-plan.js';
import { PartTooLargeError, StockExhaustedError } from '../domain/cutting/types.js';
import { createCuttingPool, unwrapCuttingResult } from '../domain/cutting/cutting-worker.js';

/** Runs one cutting plan; the service uses a worker pool, tests may run in-process. */
export type CuttingRunner = (request: CuttingPlanRequestInput) => Promise<CuttingPlanResponse>;

export const inProcessCutting: CuttingRunner = async (request) => planCutting(request);

/** Worker threads keep long searches off the event loop, so other requests are answered meanwhile. */
export function pooledCutting(maxThreads?: number): { run: CuttingRunner; close: () => Promise<void> } {
  const pool = createCuttingPool({ maxThreads });
  return {
    run: async (request) => unwrapCuttingResult(await pool.run({ request, queuedAt: Date.now() })),
    close: () => pool.destroy(),
  };
}

/** Cutting errors that come from valid input are 422s naming the part or stock at fault. */
export async function runCuttingOrReject(run: CuttingRunner, request: CuttingPlanRequestInput, fieldPrefix = ''): Promise<CuttingPlanResponse> {
  try {
    return await run(request);
  } catch (err) {
    if (err instanceof PartTooLargeError) {
      throw new UnprocessableError(`Cannot cut: ${err.message}.`, `${fieldPrefix}parts[${err.partIndex}]`);
    }
    if (err instanceof StockExhaustedError) throw new UnprocessableError(`Cannot cut: ${err.message}.`, `${fieldPrefix}stock`);
    throw err;
  }
}
