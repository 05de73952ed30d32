import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Config } from '../../services/common/src/config.js';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

export interface ProcessSpec {
  name: string;
  entry: string;
  healthUrl: string;
  /** Variables this process gets on top of the shared environment (each calculator copy its port). */
  env?: Record<string, string>;
}

/** Every process of the product, in start order (the gateway last, once its services answer). */
export function processSpecs(config: Config): ProcessSpec[] {
  const at = (port: number, p = '/health') => `http://${config.host}:${port}${p}`;
  // CALCULATOR_COPIES copies of the stateless calculator, each on its own port; the gateway spreads over them.
  const calculators = config.calculatorPorts.map((port, i) => ({
    name: i === 0 ? 'calculator' : `calculator-${i + 1}`,
    entry: 'services/calculator/src/server.ts',
    healthUrl: at(port),
    env: { CALCULATOR_PORT: String(port) },
  }));
  return [
    ...calculators,
    { name: 'records', entry: 'services/records/src/server.ts', healthUrl: at(config.recordsPort) },
    { name: 'mail', entry: 'services/mail-catcher/src/server.ts', healthUrl: at(config.mailHttpPort) },
    { name: 'payments', entry: 'services/payments-standin/src/server.ts', healthUrl: at(config.paymentsPort) },
    { name: 'gateway', entry: 'gateway/src/server.ts', healthUrl: at(config.gatewayPort, '/api/v1/health') },
  ];
}

export interface Running {
  children: ChildProcess[];
  stop: () => Promise<void>;
}

/** Starts each process with Node and tsx's loader (one process each, so a signal reaches it directly). */
export async function startAll(
  config: Config,
  env: NodeJS.ProcessEnv,
  options: { quiet?: boolean; timeoutMs?: number } = {},
): Promise<Running> {
  const children: ChildProcess[] = [];
  const stop = async () => {
    await Promise.all(
      children.map(
        (child) =>
          new Promise<void>((resolve) => {
            if (child.exitCode !== null || child.signalCode !== null) return resolve();
            child.once('exit', () => resolve());
            child.kill('SIGTERM');
            setTimeout(() => {
              child.kill('SIGKILL');
              resolve();
            }, 3000).unref();
          }),
      ),
    );
  };
  const spawnOne = (spec: ProcessSpec) => {
    const child = spawn(process.execPath, ['--import', 'tsx', spec.entry], {
      cwd: ROOT,
      env: { ...env, ...spec.env },
      stdio: options.quiet ? ['ignore', 'ignore', 'pipe'] : ['ignore', 'inherit', 'inherit'],
    });
    if (options.quiet) child.stderr?.on('data', (d: Buffer) => process.stderr.write(`[${spec.name}] ${d}`));
    children.push(child);
    return waitForHealth(spec, child, options.timeoutMs ?? 60_000);
  };
  try {
    const specs = processSpecs(config);
    // Services start side by side; the gateway only once they answer.
    await Promise.all(specs.filter((s) => s.name !== 'gateway').map(spawnOne));
    await spawnOne(specs.find((s) => s.name === 'gateway')!);
  } catch (err) {
    await stop();
    throw err;
  }
  return { children, stop };
}

async function waitForHealth(spec: ProcessSpec, child: ChildProcess, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`${spec.name} exited with code ${child.exitCode} while starting`);
    try {
      const res = await fetch(spec.healthUrl, { signal: AbortSignal.timeout(1000) });
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`${spec.name} did not answer ${spec.healthUrl} within ${timeoutMs} ms`);
}
