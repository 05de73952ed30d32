import { spawn, type ChildProcess } from 'node:child_process';
import autocannon from 'autocannon';
import { ROOT } from '../../scripts/lib/processes.js';
import { median } from './stats.js';

export interface Throughput {
  name: string;
  requestsPerSecond: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
}

type AutocannonOptions = Parameters<typeof autocannon>[0];

/** A bounded autocannon run on loopback: fixed duration and connections, stops by itself. */
async function run(name: string, url: string, headers: Record<string, string>, seconds: number, body: Partial<AutocannonOptions>): Promise<Throughput> {
  const result = await autocannon({
    url,
    method: 'POST',
    connections: 16,
    duration: seconds,
    headers: { 'content-type': 'application/json', ...headers },
    ...body,
  });
  return {
    name,
    requestsPerSecond: Math.round(result.requests.average),
    p99Ms: result.latency.p99,
    errors: result.errors,
    non2xx: result.non2xx,
  };
}

/** The same body on every request. */
export function measure(name: string, url: string, body: unknown, headers: Record<string, string> = {}, seconds = 8): Promise<Throughput> {
  return run(name, url, headers, seconds, { body: JSON.stringify(body) });
}

/** Every request a body of its own (so no answer can be reused). */
export function measureDistinct(name: string, url: string, bodyFor: (n: number) => unknown, headers: Record<string, string> = {}, seconds = 8): Promise<Throughput> {
  let n = 0;
  return run(name, url, headers, seconds, { requests: [{ setupRequest: (req) => ({ ...req, body: JSON.stringify(bodyFor(n++)) }) }] });
}

/** The median of several runs of one measurement: requests per second and p99 each taken as their median. */
export function medianRun(runs: Throughput[]): Throughput {
  return {
    name: runs[0]!.name,
    requestsPerSecond: Math.round(median(runs.map((r) => r.requestsPerSecond))),
    p99Ms: median(runs.map((r) => r.p99Ms)),
    errors: runs.reduce((sum, r) => sum + r.errors, 0),
    non2xx: runs.reduce((sum, r) => sum + r.non2xx, 0),
  };
}

export function startBareServer(port: number): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'tests/bench/bare-server.ts', String(port)], { cwd: ROOT, stdio: ['ignore', 'pipe', 'inherit'] });
  return new Promise((resolve, reject) => {
    child.stdout!.once('data', () => resolve(child));
    child.once('exit', (code) => reject(new Error(`bare server exited ${code}`)));
  });
}
