import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { loadConfig, type Config } from '../../services/common/src/config.js';
import { IDENTITY_HEADER, signIdentity, type Role } from '../../services/common/src/internal-identity.js';
import { ROOT } from '../../scripts/lib/processes.js';

/*
 * The real records service as a child process on a free port and a throw-away data folder, for
 * tests that must kill it, back it up or restore under it. Requests carry a freshly signed
 * identity, as the gateway would send them.
 */

export const INTERNAL_SECRET = 'durability-internal-secret';

/** A port the OS just handed out and released; another process could take it, but rarely does on loopback. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.unref();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

export function tempDataDir(prefix: string): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), `tubwright-${prefix}-`));
}

/** Environment and config of one records service: its own port, folder and secret; other ports unused. */
export async function recordsEnv(dataDir: string): Promise<{ env: NodeJS.ProcessEnv; config: Config }> {
  const [records, calculator, smtp, payments] = await Promise.all([freePort(), freePort(), freePort(), freePort()]);
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    DATA_DIR: dataDir,
    DATABASE_FILE: path.join(dataDir, 'tubwright.sqlite'),
    DATABASE_URL: `sqlite:${path.join(dataDir, 'tubwright.sqlite')}`,
    RECORDS_PORT: String(records),
    CALCULATOR_PORT: String(calculator),
    SMTP_PORT: String(smtp),
    PAYMENTS_PORT: String(payments),
    INTERNAL_SECRET,
  };
  return { env, config: loadConfig(env, ROOT) };
}

export interface RecordsProcess {
  child: ChildProcess;
  baseUrl: string;
  /** Output so far, for a failure message. */
  output: () => string;
  /** SIGTERM, then SIGKILL after a few seconds; resolves once the process has exited. */
  stop: () => Promise<void>;
}

/** Starts services/records/src/server.ts and waits until /health answers. */
export async function startRecords(config: Config, env: NodeJS.ProcessEnv, timeoutMs = 60_000): Promise<RecordsProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'services/records/src/server.ts'], { cwd: ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] });
  let log = '';
  child.stdout!.on('data', (d: Buffer) => (log += d));
  child.stderr!.on('data', (d: Buffer) => (log += d));
  const baseUrl = `http://${config.host}:${config.recordsPort}`;
  const proc: RecordsProcess = { child, baseUrl, output: () => log, stop: () => stopProcess(child) };
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null || child.signalCode !== null) throw new Error(`records exited while starting:\n${log}`);
    if (await answers(`${baseUrl}/health`)) return proc;
    await new Promise((r) => setTimeout(r, 150));
  }
  await proc.stop();
  throw new Error(`records did not answer ${baseUrl}/health within ${timeoutMs} ms:\n${log}`);
}

export function exited(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => child.once('exit', () => resolve()));
}

export async function stopProcess(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  const done = exited(child);
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), 5000);
  await done;
  clearTimeout(timer);
}

async function answers(url: string): Promise<boolean> {
  try {
    return (await fetch(url, { signal: AbortSignal.timeout(1000) })).ok;
  } catch {
    return false;
  }
}

/** Headers of a request the gateway forwarded for a demo user of this role. */
export function asRole(role: Role): Record<string, string> {
  const identity = signIdentity({ kind: 'user', sub: `durability-${role}`, role, email: `${role}@demo.tubwright.test` }, INTERNAL_SECRET);
  return { [IDENTITY_HEADER]: identity, 'content-type': 'application/json' };
}

/** A JSON call to the service; throws on a network error, answers status and body otherwise. */
export async function call(baseUrl: string, method: string, urlPath: string, role: Role, body?: unknown): Promise<{ status: number; body: any }> {
  const res = await fetch(`${baseUrl}${urlPath}`, {
    method,
    headers: asRole(role),
    body: body === undefined ? undefined : JSON.stringify(body),
    signal: AbortSignal.timeout(20_000),
  });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}
