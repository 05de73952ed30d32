import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { RACK_PLAN_EXAMPLE } from '../../shared/api/rack-plan.js';
import { loadConfig } from '../../services/common/src/config.js';
import { buildWeb } from '../../scripts/build-web.js';
import { widgetFirstRender } from './widget-timing.js';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { ROOT, startAll } from '../../scripts/lib/processes.js';
import { bundleSizes } from './bundle-sizes.js';
import { runCopiesBench } from './calculator-copies.js';
import { runCuttingBench } from './cutting.js';
import { runLoadBench } from './load.js';
import { moduleTimings } from './module-timing.js';
import { rackPlanInProcess } from './rack-plan.js';
import { measure, measureDistinct, medianRun, startBareServer, type Throughput } from './throughput.js';

/**
 * `npm run bench`: the figures the issues ask for, measured on this machine in one run.
 * Not part of `npm test`; results go to tests/bench/results/latest.json.
 */
const only = process.argv.slice(2);
const wants = (name: string) => only.length === 0 || only.includes(name);
const results: Record<string, unknown> = { machine: { cpus: os.cpus().length, cpu: os.cpus()[0]?.model, node: process.version }, at: new Date().toISOString() };
const log = (line: string) => console.log(line);

if (wants('rack')) {
  log('\n== Rack plan, in process (72 tubs, no cutting) ==');
  const rack = rackPlanInProcess();
  log(`median ${rack.medianMs} ms over ${rack.runs} runs (target < 1 ms)`);
  results.rackPlanInProcess = rack;
}

if (wants('cutting')) {
  log('\n== Cutting ==');
  results.cutting = runCuttingBench(log);
}

if (wants('web') || wants('http')) {
  buildWeb();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-bench-'));
  const env = {
    ...process.env, DATA_DIR: dataDir, PORT: '4500', CALCULATOR_PORT: '4501', RECORDS_PORT: '4502', SMTP_PORT: '4525',
    MAIL_HTTP_PORT: '4526', PAYMENTS_PORT: '4510', JWT_SECRET: 'bench-jwt', INTERNAL_SECRET: 'bench-internal', LOGIN_RATE_LIMIT_PER_MINUTE: '1000',
  };
  const config = loadConfig(env);
  await prepareDatabase(config.databaseFile, { seed: true });
  const stack = await startAll(config, env, { quiet: true });
  const base = `http://${config.host}:${config.gatewayPort}`;
  try {
    if (wants('web')) {
      log('\n== Console bundles (gzip) ==');
      const sizes = bundleSizes(path.join(ROOT, 'dist/web'));
      for (const s of sizes) {
        const all = s.allGzipKiB !== undefined ? `; all JS with pages loaded on first use ${s.allGzipKiB} KiB` : '';
        log(`${s.name.padEnd(32)} ${String(s.gzipKiB).padStart(7)} KiB (target <= ${s.targetKiB} KiB)${all}`);
      }
      results.bundleSizes = sizes;
      log('\n== Module switch in Chromium (median of 10) ==');
      const timings = await moduleTimings(base);
      for (const t of timings) log(`${t.module.padEnd(12)} first visit ${t.firstVisitMs} ms, return visit ${t.returnVisitMs} ms`);
      results.moduleTimings = timings;
      log('\n== Website widget: script load to first interactive render in Chromium (median of 10) ==');
      const widget = await widgetFirstRender(base);
      log(`tw-rack-sizer first render ${widget.medianMs} ms (samples ${widget.samplesMs.join(', ')})`);
      results.widgetFirstRender = widget;
    }
    if (wants('http')) {
      log('\n== Rack-plan route through the gateway vs a bare Express route (autocannon, 16 connections; bare and gateway 3 x 6 s alternating, the rest 8 s) ==');
      const login = await fetch(`${base}/api/v1/auth/login`, {
        method: 'POST', headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: 'builder@demo.tubwright.test', password: 'tubwright-demo' }),
      });
      const { accessToken } = (await login.json()) as { accessToken: string };
      const auth = { authorization: `Bearer ${accessToken}` };
      const bare = await startBareServer(4590);
      try {
        const noCutting = { ...RACK_PLAN_EXAMPLE, cutting: { include: false } };
        // Bare and gateway runs alternate, three of each, and the medians are compared: one run of
        // either moves by a fifth from one try to the next on this machine.
        const bareRuns: Throughput[] = [];
        const planRuns: Throughput[] = [];
        for (let round = 0; round < 3; round++) {
          bareRuns.push(await measure('bare Express route (fixed JSON)', 'http://127.0.0.1:4590/bare', { levels: 9 }, {}, 6));
          planRuns.push(await measure('rack plan via gateway (no cutting)', `${base}/api/v1/calc/rack-plan`, noCutting, auth, 6));
        }
        const bareRun = medianRun(bareRuns);
        const planRun = medianRun(planRuns);
        // Every request a tub of its own: nothing reused, each plan computed by the calculator.
        const distinctRun = await measureDistinct('  the same, every spec different', `${base}/api/v1/calc/rack-plan`, (n) => ({ ...noCutting, tub: { ...noCutting.tub, length: 20 + (n % 50_000) * 0.0001 } }), auth);
        const cutRun = await measure('rack plan via gateway (with cutting)', `${base}/api/v1/calc/rack-plan`, RACK_PLAN_EXAMPLE, auth);
        const distinctCutRun = await measureDistinct('  the same, every spec different', `${base}/api/v1/calc/rack-plan`, (n) => ({ ...RACK_PLAN_EXAMPLE, tub: { ...RACK_PLAN_EXAMPLE.tub, length: 20 + (n % 50_000) * 0.0001 } }), auth);
        for (const r of [bareRun, planRun, distinctRun, cutRun, distinctCutRun]) {
          log(`${r.name.padEnd(38)} ${String(r.requestsPerSecond).padStart(6)} req/s  p99 ${r.p99Ms} ms  errors ${r.errors}  non-2xx ${r.non2xx}`);
        }
        const ratio = planRun.requestsPerSecond / bareRun.requestsPerSecond;
        const distinctRatio = distinctRun.requestsPerSecond / bareRun.requestsPerSecond;
        log(`(bare runs ${bareRuns.map((r) => r.requestsPerSecond).join(', ')}; gateway runs ${planRuns.map((r) => r.requestsPerSecond).join(', ')} req/s; medians above)`);
        log(`ratio (no cutting) / bare = ${(ratio * 100).toFixed(0)} % (target >= 50 %); every spec different: ${(distinctRatio * 100).toFixed(0)} %`);
        results.throughput = { bare: bareRun, rackPlan: planRun, rackPlanDistinct: distinctRun, rackPlanWithCutting: cutRun, rackPlanWithCuttingDistinct: distinctCutRun, ratio, distinctRatio };
      } finally {
        bare.kill('SIGTERM');
      }
    }
  } finally {
    await stack.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

if (wants('copies')) {
  log('\n== Calculator copies: rack plans through the gateway with 1 and 2 copies (autocannon, 16 connections; bare and gateway 3 x 6 s alternating, the rest 8 s) ==');
  results.calculatorCopies = await runCopiesBench(log);
}

if (wants('load')) {
  log('\n== Load: calculator, records and both at once (tests/bench/load.ts) ==');
  results.load = await runLoadBench(log);
}

const outDir = path.join(ROOT, 'tests/bench/results');
fs.mkdirSync(outDir, { recursive: true });
fs.writeFileSync(path.join(outDir, 'latest.json'), JSON.stringify(results, null, 2));
log(`\nWrote tests/bench/results/latest.json`);
process.exit(0);
