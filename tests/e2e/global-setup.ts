import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { loadConfig } from '../../services/common/src/config.js';
import { buildWeb } from '../../scripts/build-web.js';
import { prepareDatabase } from '../../scripts/lib/database.js';
import { startAll, type Running } from '../../scripts/lib/processes.js';
import { ensureChromium } from './chromium.js';

let running: Running | undefined;
let dataDir = '';

/** The whole product on its own ports and a throw-away database, as `npm start` runs it. */
export async function setup(project: TestProject): Promise<void> {
  ensureChromium();
  buildWeb();
  dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-e2e-'));
  const env = {
    ...process.env,
    DATA_DIR: dataDir,
    PORT: '4400',
    CALCULATOR_PORT: '4401',
    RECORDS_PORT: '4402',
    SMTP_PORT: '4425',
    MAIL_HTTP_PORT: '4426',
    PAYMENTS_PORT: '4410',
    JWT_SECRET: 'e2e-jwt-secret',
    INTERNAL_SECRET: 'e2e-internal-secret',
  };
  const config = loadConfig(env);
  await prepareDatabase(config.databaseFile, { seed: true });
  running = await startAll(config, env, { quiet: true });
  project.provide('baseUrl', `http://${config.host}:${config.gatewayPort}`);
}

export async function teardown(): Promise<void> {
  await running?.stop();
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}
