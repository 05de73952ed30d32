import { Piscina } from 'piscina';
import type { CuttingPlanRequestInput, CuttingPlanResponse } from '../../../../../shared/api/cutting-plan.js';
import { planCutting } from './cutting-plan.js';

export interface CuttingTask {
  request: CuttingPlanRequestInput;
  /** When the task was queued (Date.now()), so time spent waiting for a thread counts against the limit. */
  queuedAt?: number;
}

/** Worker entry: plans one request on a worker thread, so large batches leave the event loop free. */
export default function runCuttingTask(task: CuttingTask): CuttingPlanResponse {
  const limit = task.request.timeLimitMs ?? 2000;
  const waited = task.queuedAt ? Math.max(0, Date.now() - task.queuedAt) : 0;
  return planCutting(task.request, { timeLimitMs: Math.max(10, limit - waited) });
}

/**
 * A thread pool running `runCuttingTask`. Under tsx (TypeScript sources) the workers load tsx too;
 * a compiled build points at the .js file next to this one.
 */
export function createCuttingPool(options: { maxThreads?: number; idleTimeout?: number } = {}): Piscina<CuttingTask, CuttingPlanResponse> {
  const self = new URL(import.meta.url);
  const typescript = self.pathname.endsWith('.ts');
  return new Piscina<CuttingTask, CuttingPlanResponse>({
    filename: self.href,
    execArgv: typescript ? [...process.execArgv.filter((a) => !a.startsWith('--input-type')), '--import', 'tsx'] : process.execArgv,
    maxThreads: options.maxThreads,
    idleTimeout: options.idleTimeout ?? 30_000,
  });
}
