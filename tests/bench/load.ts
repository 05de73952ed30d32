import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import { openDatabase } from '../../services/records/src/db/knex.js';
import { RACK_PLAN_EXAMPLE } from '../../shared/api/rack-plan.js';
import { loadConfig } from '../../services/common/src/config.js';
import { DEMO_PASSWORD } from '../../services/records/src/seed/demo-data.js';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { startAll } from '../../scripts/lib/processes.js';
import { rackRequest, tenRacks } from './cutting.js';
import { percentile, round } from './stats.js';

/*
 * `npm run bench -- load`: the whole product on its own ports (base 49: 4900..4926) and a seeded
 * throw-away database, loaded over loopback through the gateway, as the reliability issue asks:
 * 1. the calculator (rack plan) at 50 connections; 2. twenty keepers recording feeding days of
 * 30 tubs, then events in the database counted against acknowledged writes; 3. both at once while
 * a large batch cutting plan runs again and again; the rack plan's p99 must stay under 100 ms.
 * BENCH_LOAD_SECONDS sets each phase's length (default 60); BENCH_LOAD_PORT_BASE moves the ports.
 */

const CALC_CONNECTIONS = 50;
const KEEPERS = 20;
const TUBS_PER_RACK = 30; // 6 levels x 5 columns
const MIXED_P99_LIMIT_MS = 100;
const CUTTING_TIME_LIMIT_MS = 5000;
/** The rack plan's geometry (dimensions, parts, loads, heat, cost) without the nesting search, which runs up to its own time limit. */
const GEOMETRY_REQUEST = { ...RACK_PLAN_EXAMPLE, cutting: { include: false } };

export interface CalcFigures {
  requests: number;
  requestsPerSecond: number;
  errors: number;
  timeouts: number;
  non2xx: number;
  p50Ms: number;
  p99Ms: number;
}

export interface RecordsFigures {
  keepers: number;
  requests: number;
  acknowledged: number;
  errors: number;
  non2xx: number;
  p50Ms: number;
  p99Ms: number;
  eventsAcknowledged: number;
  eventsInDatabase: number;
  /** Acknowledged entries whose row is not in the database. */
  lost: number;
}

export interface LoadFigures {
  seconds: number;
  calculator: CalcFigures;
  records: RecordsFigures;
  mixed: { calculator: CalcFigures; records: RecordsFigures; cutting: { runs: number; pieces: number; non2xx: number; errors: number; medianMs: number }; rackPlanP99LimitMs: number; pass: boolean };
}

interface Session {
  base: string;
  builder: string;
  keeper: string;
}

async function login(base: string, email: string): Promise<string> {
  const res = await fetch(`${base}/api/v1/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email} answered ${res.status}: ${await res.text()}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

async function api<T>(s: Session, method: string, urlPath: string, body: unknown): Promise<T> {
  const res = await fetch(`${s.base}${urlPath}`, {
    method,
    headers: { authorization: `Bearer ${s.keeper}`, 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${urlPath} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

interface BenchRack {
  id: number;
  tubIds: number[];
}

/** One rack of 30 tubs per keeper, each tub with an animal of its own, made through the API one at a time (set-up, not measured). */
async function makeRacks(s: Session): Promise<BenchRack[]> {
  const racks: BenchRack[] = [];
  for (let k = 0; k < KEEPERS; k++) {
    const rack = await api<{ id: number; tubs: { id: number }[] }>(s, 'POST', '/api/v1/racks', { name: `Load ${k + 1}`, levels: 6, columns: 5, location: 'load bench' });
    if (rack.tubs.length !== TUBS_PER_RACK) throw new Error(`rack ${rack.id} has ${rack.tubs.length} tubs`);
    for (const [t, tub] of rack.tubs.entries()) {
      const animal = await api<{ id: number }>(s, 'POST', '/api/v1/animals', { code: `LOAD-${k + 1}-${t + 1}`, species: 'Python regius' });
      await api(s, 'PUT', `/api/v1/animals/${animal.id}/tub`, { tubId: tub.id });
    }
    racks.push({ id: rack.id, tubIds: rack.tubs.map((t) => t.id) });
  }
  return racks;
}

async function calculatorLoad(s: Session, seconds: number): Promise<CalcFigures> {
  const result = await autocannon({
    url: `${s.base}/api/v1/calc/rack-plan`,
    method: 'POST',
    connections: CALC_CONNECTIONS,
    duration: seconds,
    headers: { 'content-type': 'application/json', authorization: `Bearer ${s.builder}` },
    body: JSON.stringify(GEOMETRY_REQUEST),
  });
  return {
    requests: result.requests.total,
    requestsPerSecond: Math.round(result.requests.average),
    errors: result.errors,
    timeouts: result.timeouts,
    non2xx: result.non2xx,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
  };
}

/**
 * Twenty keepers, each entering feeding days for its own rack back to back until the time is up.
 * New requests stop at the deadline and the ones in flight are awaited, so every write is either
 * acknowledged or answered with an error: none is left unknown.
 */
async function recordsLoad(s: Session, racks: BenchRack[], seconds: number, dbFile: string): Promise<RecordsFigures> {
  const latencies: number[] = [];
  const acknowledged: number[] = [];
  const problems: string[] = [];
  let errors = 0;
  let non2xx = 0;
  const maxBefore = await batchHighWater(dbFile);
  const deadline = performance.now() + seconds * 1000;
  await Promise.all(
    racks.map(async (rack, k) => {
      for (let n = 0; performance.now() < deadline; n++) {
        const body = {
          occurredAt: new Date(Date.now() - 60_000).toISOString(),
          preyKind: 'rat',
          preySize: 'small',
          entries: rack.tubIds.map((tubId, t) => ({ tubId, result: (t + n + k) % 7 === 0 ? 'refused' : 'accepted' })),
        };
        const started = performance.now();
        try {
          const res = await fetch(`${s.base}/api/v1/racks/${rack.id}/feeding`, {
            method: 'POST',
            headers: { authorization: `Bearer ${s.keeper}`, 'content-type': 'application/json' },
            body: JSON.stringify(body),
          });
          const text = await res.text();
          latencies.push(performance.now() - started);
          if (res.status === 201) acknowledged.push((JSON.parse(text) as { id: number }).id);
          else {
            non2xx++;
            if (problems.length < 3) problems.push(`${res.status} ${text.slice(0, 200)}`);
          }
        } catch (err) {
          errors++;
          if (problems.length < 3) problems.push(String(err));
        }
      }
    }),
  );
  for (const p of problems) console.log(`  records problem: ${p}`);
  const { eventsInDatabase, lost } = await countWrites(dbFile, racks, maxBefore, acknowledged);
  return {
    keepers: racks.length,
    requests: latencies.length + errors,
    acknowledged: acknowledged.length,
    errors,
    non2xx,
    p50Ms: round(percentile(latencies, 50), 1),
    p99Ms: round(percentile(latencies, 99), 1),
    eventsAcknowledged: acknowledged.length * TUBS_PER_RACK,
    eventsInDatabase,
    lost,
  };
}

async function batchHighWater(target: string): Promise<number> {
  const db = openDatabase(target);
  try {
    const row = (await db('event_batches').max({ m: 'id' }).first()) as { m: number | string | null } | undefined;
    return Number(row?.m ?? 0);
  } finally {
    await db.destroy();
  }
}

/** Events of this phase's feeding entries in the database (SQLite file or PostgreSQL), and acknowledged entries missing from it. */
async function countWrites(target: string, racks: BenchRack[], maxBefore: number, acknowledged: number[]): Promise<{ eventsInDatabase: number; lost: number }> {
  const db = openDatabase(target);
  try {
    const rackIds = racks.map((r) => r.id);
    const row = (await db('events as e')
      .join('event_batches as b', 'b.id', 'e.batch_id')
      .where('b.id', '>', maxBefore)
      .whereIn('b.rack_id', rackIds)
      .count({ n: '*' })
      .first()) as { n: number | string };
    const stored = new Set(((await db('event_batches').where('id', '>', maxBefore).pluck('id')) as (number | string)[]).map(Number));
    return { eventsInDatabase: Number(row.n), lost: acknowledged.filter((id) => !stored.has(id)).length };
  } finally {
    await db.destroy();
  }
}

/** A ten-rack batch cutting plan, posted again as soon as the last one answers, until the deadline. */
async function cuttingLoop(s: Session, seconds: number) {
  const request = rackRequest(tenRacks(), CUTTING_TIME_LIMIT_MS);
  const pieces = request.parts.reduce((sum, p) => sum + (p.quantity ?? 1), 0);
  const times: number[] = [];
  let non2xx = 0;
  let errors = 0;
  const deadline = performance.now() + seconds * 1000;
  while (performance.now() < deadline) {
    const started = performance.now();
    try {
      const res = await fetch(`${s.base}/api/v1/calc/cutting-plan`, {
        method: 'POST',
        headers: { authorization: `Bearer ${s.builder}`, 'content-type': 'application/json' },
        body: JSON.stringify(request),
      });
      const text = await res.text();
      if (res.ok) times.push(performance.now() - started);
      else {
        non2xx++;
        if (non2xx <= 3) console.log(`  cutting problem: ${res.status} ${text.slice(0, 200)}`);
      }
    } catch (err) {
      errors++;
      if (errors <= 3) console.log(`  cutting problem: ${String(err)}`);
    }
  }
  const sorted = [...times].sort((a, b) => a - b);
  return { runs: times.length, pieces, non2xx, errors, medianMs: Math.round(sorted[Math.floor(sorted.length / 2)] ?? 0) };
}

const calcLine = (c: CalcFigures) =>
  `${c.requests} requests, ${c.requestsPerSecond} req/s, errors ${c.errors}, timeouts ${c.timeouts}, non-2xx ${c.non2xx}, p50 ${c.p50Ms} ms, p99 ${c.p99Ms} ms`;
const recordsLine = (r: RecordsFigures) =>
  `${r.requests} feeding entries (${r.keepers} keepers x ${TUBS_PER_RACK} tubs), acknowledged ${r.acknowledged}, errors ${r.errors}, non-2xx ${r.non2xx}, p50 ${r.p50Ms} ms, p99 ${r.p99Ms} ms\n` +
  `  events acknowledged ${r.eventsAcknowledged}, in the database ${r.eventsInDatabase}, lost entries ${r.lost}: ${r.eventsInDatabase === r.eventsAcknowledged && r.lost === 0 ? 'zero lost' : 'MISMATCH'}`;

export async function runLoadBench(log: (line: string) => void, env: NodeJS.ProcessEnv = process.env): Promise<LoadFigures> {
  const seconds = Number(env['BENCH_LOAD_SECONDS'] ?? 60);
  if (!Number.isFinite(seconds) || seconds <= 0) throw new Error(`BENCH_LOAD_SECONDS must be a positive number, got ${env['BENCH_LOAD_SECONDS']}`);
  const base = Number(env['BENCH_LOAD_PORT_BASE'] ?? 49);
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-load-'));
  // BENCH_DATABASE_URL runs the same load against PostgreSQL (an empty database), to set beside SQLite.
  const databaseUrl = env['BENCH_DATABASE_URL'] || `sqlite:${path.join(dataDir, 'tubwright.sqlite')}`;
  const stackEnv = {
    ...process.env,
    DATA_DIR: dataDir,
    DATABASE_FILE: path.join(dataDir, 'tubwright.sqlite'),
    DATABASE_URL: databaseUrl,
    PORT: `${base}00`,
    CALCULATOR_PORT: `${base}01`,
    RECORDS_PORT: `${base}02`,
    PAYMENTS_PORT: `${base}10`,
    SMTP_PORT: `${base}25`,
    MAIL_HTTP_PORT: `${base}26`,
    JWT_SECRET: 'load-bench-jwt',
    INTERNAL_SECRET: 'load-bench-internal',
    ACCESS_TOKEN_TTL_S: '7200',
    LOGIN_RATE_LIMIT_PER_MINUTE: '1000',
    // One spec posted over and over: without this the gateway would reuse one answer and the calculator would sit idle.
    CALCULATION_MEMO_ENTRIES: '0',
  };
  const config = loadConfig(stackEnv);
  await prepareDatabase(config.databaseUrl, { seed: true });
  const stack = await startAll(config, stackEnv, { quiet: true });
  try {
    const gateway = `http://${config.host}:${config.gatewayPort}`;
    const s: Session = {
      base: gateway,
      builder: await login(gateway, 'builder@demo.tubwright.test'),
      keeper: await login(gateway, 'keeper@demo.tubwright.test'),
    };
    log(`Records on ${databaseUrl.startsWith('postgres') ? 'PostgreSQL' : 'SQLite'}. Stack on ports ${base}00..${base}26, ${seconds} s per phase; ${os.cpus().length} cores shared with whatever else runs, so figures are noisy.`);
    const racks = await makeRacks(s);

    log(`\n-- 1. Rack plan (geometry, no nesting) through the gateway, ${CALC_CONNECTIONS} connections, ${seconds} s --`);
    const calculator = await calculatorLoad(s, seconds);
    log(calcLine(calculator));

    log(`\n-- 2. Records: ${KEEPERS} keepers entering feeding days of ${TUBS_PER_RACK} tubs, ${seconds} s --`);
    const records = await recordsLoad(s, racks, seconds, config.databaseUrl);
    log(recordsLine(records));

    log(`\n-- 3. Mixed: both at once while a batch cutting plan (time limit ${CUTTING_TIME_LIMIT_MS} ms) runs again and again, ${seconds} s --`);
    const [mixedCalc, mixedRecords, cutting] = await Promise.all([calculatorLoad(s, seconds), recordsLoad(s, racks, seconds, config.databaseUrl), cuttingLoop(s, seconds)]);
    log(`rack plan (geometry): ${calcLine(mixedCalc)}`);
    log(`records:              ${recordsLine(mixedRecords)}`);
    log(`cutting:              ${cutting.runs} plans of ${cutting.pieces} pieces, median ${cutting.medianMs} ms, non-2xx ${cutting.non2xx}, errors ${cutting.errors}`);
    const pass = mixedCalc.requests > 0 && mixedCalc.p99Ms < MIXED_P99_LIMIT_MS && mixedCalc.errors === 0 && mixedCalc.non2xx === 0;
    log(`${pass ? 'PASS' : 'FAIL'}: rack plan p99 under load ${mixedCalc.p99Ms} ms (limit ${MIXED_P99_LIMIT_MS} ms), errors ${mixedCalc.errors}, non-2xx ${mixedCalc.non2xx}`);
    const zeroLost = [records, mixedRecords].every((r) => r.acknowledged > 0 && r.lost === 0 && r.eventsInDatabase === r.eventsAcknowledged && r.errors === 0 && r.non2xx === 0);
    const calcClean = calculator.requests > 0 && calculator.errors === 0 && calculator.non2xx === 0;
    log(`${zeroLost ? 'PASS' : 'FAIL'}: records, zero errors and zero lost events in both phases`);
    log(`${calcClean ? 'PASS' : 'FAIL'}: calculator alone, zero errors and non-2xx`);
    return {
      seconds,
      calculator,
      records,
      mixed: { calculator: mixedCalc, records: mixedRecords, cutting, rackPlanP99LimitMs: MIXED_P99_LIMIT_MS, pass },
    };
  } finally {
    await stack.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}
