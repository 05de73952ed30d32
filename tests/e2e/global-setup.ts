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
  // E2E_SKIP_BUILD serves dist/web as it is (a developer who just built one project); E2E_PORT_BASE moves the stack (two runs side by side).
  if (!process.env['E2E_SKIP_BUILD']) buildWeb();
  const base = Number(process.env['E2E_PORT_BASE'] ?? 44);
  dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-e2e-'));
  const env = {
    ...process.env,
    DATA_DIR: dataDir,
    PORT: `${base}00`,
    CALCULATOR_PORT: `${base}01`,
    RECORDS_PORT: `${base}02`,
    SMTP_PORT: `${base}25`,
    MAIL_HTTP_PORT: `${base}26`,
    PAYMENTS_PORT: `${base}10`,
    JWT_SECRET: 'e2e-jwt-secret',
    INTERNAL_SECRET: 'e2e-internal-secret',
    // Every browser test signs in, several as the owner within one minute; the limit itself is tested in gateway/src.
    LOGIN_RATE_LIMIT_PER_MINUTE: '1000',
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
