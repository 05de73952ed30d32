import { Piscina } from 'piscina';
import type { CuttingPlanRequestInput, CuttingPlanResponse } from '../../../../../shared/api/cutting-plan.js';
import { planCutting } from './cutting-plan.js';
import { PartTooLargeError, StockExhaustedError } from './types.js';

export interface CuttingTask {
  request: CuttingPlanRequestInput;
  /** When the task was queued (Date.now()), so time spent waiting for a thread counts against the limit. */
  queuedAt?: number;
}

/** What crosses back from the thread: a plan, or a typed failure rebuilt on the other side (errors lose their class in transit). */
export type CuttingTaskResult =
  | { plan: CuttingPlanResponse }
  | { failure: { kind: 'part-too-large'; partIndex: number; partName: string } | { kind: 'stock-exhausted'; material: string } };

/** Worker entry: plans one request on a worker thread, so large batches leave the event loop free. */
export default function runCuttingTask(task: CuttingTask): CuttingTaskResult {
  const limit = task.request.timeLimitMs ?? 2000;
  const waited = task.queuedAt ? Math.max(0, Date.now() - task.queuedAt) : 0;
  try {
    return { plan: planCutting(task.request, { timeLimitMs: Math.max(10, limit - waited) }) };
  } catch (err) {
    if (err instanceof PartTooLargeError) return { failure: { kind: 'part-too-large', partIndex: err.partIndex, partName: err.partName } };
    if (err instanceof StockExhaustedError) return { failure: { kind: 'stock-exhausted', material: err.material } };
    throw err;
  }
}

/** The plan from a task result, throwing the same typed error planCutting would have thrown. */
export function unwrapCuttingResult(result: CuttingTaskResult): CuttingPlanResponse {
  if ('plan' in result) return result.plan;
  const f = result.failure;
  throw f.kind === 'part-too-large' ? new PartTooLargeError(f.partIndex, f.partName) : new StockExhaustedError(f.material);
}

/**
 * A thread pool running `runCuttingTask`. Under tsx (TypeScript sources) the workers load tsx too;
 * a compiled build points at the .js file next to this one.
 */
export function createCuttingPool(options: { maxThreads?: number; idleTimeout?: number } = {}): Piscina<CuttingTask, CuttingTaskResult> {
  const self = new URL(import.meta.url);
  const typescript = self.pathname.endsWith('.ts');
  return new Piscina<CuttingTask, CuttingTaskResult>({
    filename: self.href,
    execArgv: typescript ? [...process.execArgv.filter((a) => !a.startsWith('--input-type')), '--import', 'tsx'] : process.execArgv,
    maxThreads: options.maxThreads,
    idleTimeout: options.idleTimeout ?? 30_000,
  });
}
