import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { RACK_PLAN_EXAMPLE } from '../../shared/api/rack-plan.js';
import { loadConfig } from '../../services/common/src/config.js';
import { DEMO_PASSWORD } from '../../services/records/src/seed/demo-data.js';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { startAll } from '../../scripts/lib/processes.js';
import { measure, type Throughput } from './throughput.js';

/*
 * `npm run bench -- copies`: rack plans through the gateway with one calculator copy and then two
 * (CALCULATOR_COPIES), the whole product started each time on its own ports (base 48: 4800..4832,
 * BENCH_COPIES_PORT_BASE moves them) over a seeded throw-away database.
 * On a machine with as many cores as processes a second copy adds throughput; on 2 cores the
 * gateway, the copies and autocannon share them, and the question is only that it is not slower.
 */

export interface CopiesFigures {
  cpus: number;
  runs: { copies: number; geometry: Throughput; withCutting: Throughput }[];
  /** Requests per second with two copies over one, for each request kind. */
  ratioGeometry: number;
  ratioWithCutting: number;
}

const GEOMETRY_REQUEST = { ...RACK_PLAN_EXAMPLE, cutting: { include: false } };

async function runWith(copies: number, portBase: number): Promise<CopiesFigures['runs'][number]> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-bench-copies-'));
  const p = (n: number) => String(portBase * 100 + n);
  const env = {
    ...process.env, DATA_DIR: dataDir, PORT: p(0), CALCULATOR_PORT: p(1), RECORDS_PORT: p(2), SMTP_PORT: p(25), MAIL_HTTP_PORT: p(26), PAYMENTS_PORT: p(10),
    JWT_SECRET: 'bench-jwt', INTERNAL_SECRET: 'bench-internal', LOGIN_RATE_LIMIT_PER_MINUTE: '1000', CALCULATOR_COPIES: String(copies), CALCULATOR_URLS: '',
    // The same spec every time: reused answers would hide how much the copies compute.
    CALCULATION_MEMO_ENTRIES: '0',
  };
  const config = loadConfig(env);
  await prepareDatabase(config.databaseUrl, { seed: true });
  const stack = await startAll(config, env, { quiet: true });
  try {
    const base = `http://${config.host}:${config.gatewayPort}`;
    const login = await fetch(`${base}/api/v1/auth/login`, {
      method: 'POST', headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'builder@demo.tubwright.test', password: DEMO_PASSWORD }),
    });
    const auth = { authorization: `Bearer ${((await login.json()) as { accessToken: string }).accessToken}` };
    const url = `${base}/api/v1/calc/rack-plan`;
    // A short warm-up of both kinds, so every copy's code is compiled and its cutting workers started.
    await measure('warm-up', url, GEOMETRY_REQUEST, auth, 2);
    await measure('warm-up', url, RACK_PLAN_EXAMPLE, auth, 3);
    const geometry = await measure(`rack plan, no cutting, ${copies} ${copies === 1 ? 'copy' : 'copies'}`, url, GEOMETRY_REQUEST, auth);
    const withCutting = await measure(`rack plan with cutting, ${copies} ${copies === 1 ? 'copy' : 'copies'}`, url, RACK_PLAN_EXAMPLE, auth);
    return { copies, geometry, withCutting };
  } finally {
    await stack.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

export async function runCopiesBench(log: (line: string) => void, portBase = Number(process.env.BENCH_COPIES_PORT_BASE || 48)): Promise<CopiesFigures> {
  const runs = [];
  for (const copies of [1, 2]) {
    const run = await runWith(copies, portBase);
    for (const r of [run.geometry, run.withCutting]) {
      log(`${r.name.padEnd(40)} ${String(r.requestsPerSecond).padStart(6)} req/s  p99 ${r.p99Ms} ms  errors ${r.errors}  non-2xx ${r.non2xx}`);
    }
    runs.push(run);
  }
  const [one, two] = runs as [CopiesFigures['runs'][number], CopiesFigures['runs'][number]];
  const ratioGeometry = Math.round((two.geometry.requestsPerSecond / one.geometry.requestsPerSecond) * 100) / 100;
  const ratioWithCutting = Math.round((two.withCutting.requestsPerSecond / one.withCutting.requestsPerSecond) * 100) / 100;
  log(`two copies / one: ${ratioGeometry} without cutting, ${ratioWithCutting} with cutting, on ${os.cpus().length} cores (should not fall below about 1)`);
  return { cpus: os.cpus().length, runs, ratioGeometry, ratioWithCutting };
}
