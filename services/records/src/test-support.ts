import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import type { Knex } from 'knex';
import { IDENTITY_HEADER, signIdentity, type Identity } from '../../common/src/internal-identity.js';
import { createApp as createCalculatorApp } from '../../calculator/src/app.js';
import { MailStore } from '../../mail-catcher/src/mail-store.js';
import { createSmtpServer } from '../../mail-catcher/src/smtp.js';
import { createApp as createPaymentsStandin } from '../../payments-standin/src/app.js';
import { createApp } from './app.js';
import { migrateLatest } from './db/knex.js';
import { openTestDatabase } from './db/test-database.js';
import { CalculatorClient } from './lib/calculator-client.js';
import { Mailer } from './lib/mailer.js';
import { createPaymentsClient } from './lib/payments.js';
import { seedDemoData } from './seed/demo-seed.js';

export const TEST_INTERNAL_SECRET = 'records-test-secret';
const STRIPE_KEY = 'sk_test_records_spec';
const STRIPE_WEBHOOK_SECRET = 'whsec_records_spec';

function serve(listener: http.RequestListener): Promise<{ port: number; server: http.Server }> {
  const server = http.createServer(listener);
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve({ port: (server.address() as AddressInfo).port, server })));
}

/**
 * A records app on a fresh database (in-memory SQLite, or a schema of its own on the PostgreSQL
 * server TEST_POSTGRES_URL names), with its real neighbours on loopback: the
 * calculator over HTTP, an SMTP mail catcher and the payments stand-in driven by the provider SDK.
 * `webhookUrl` lets a test receive the stand-in's signed events.
 */
export async function recordsTestApp(options: { seed?: boolean; webhookUrl?: string } = {}) {
  const database = await openTestDatabase();
  const db: Knex = database.db;
  await migrateLatest(db);
  if (options.seed) await seedDemoData(db);
  const calculator = await serve(createCalculatorApp({ internalSecret: TEST_INTERNAL_SECRET }));
  const mailStore = new MailStore();
  const smtp = createSmtpServer(mailStore);
  const smtpPort = await new Promise<number>((resolve) => smtp.listen(0, '127.0.0.1', () => resolve((smtp.server.address() as AddressInfo).port)));
  const payments = await serve(createPaymentsStandin({ secretKey: STRIPE_KEY, webhookSecret: STRIPE_WEBHOOK_SECRET, webhookUrl: options.webhookUrl }));
  const app = createApp({
    db,
    internalSecret: TEST_INTERNAL_SECRET,
    uploadsDir: fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-uploads-')),
    calculator: new CalculatorClient(`http://127.0.0.1:${calculator.port}`, TEST_INTERNAL_SECRET),
    mailer: new Mailer({ host: '127.0.0.1', port: smtpPort }, 'Test shop <shop@example.test>'),
    payments: {
      client: createPaymentsClient({ secretKey: STRIPE_KEY, webhookSecret: STRIPE_WEBHOOK_SECRET, host: '127.0.0.1', port: payments.port }),
      webhookSecret: STRIPE_WEBHOOK_SECRET,
    },
  });
  const close = async () => {
    for (const s of [calculator.server, payments.server]) await new Promise((r) => s.close(r));
    await new Promise<void>((r) => smtp.close(() => r()));
    await database.dispose();
  };
  return { app, db, dbKind: database.kind, mailStore, stripeWebhookSecret: STRIPE_WEBHOOK_SECRET, paymentsUrl: `http://127.0.0.1:${payments.port}`, close };
}

/** The header the gateway would add for a signed-in user of this role. */
export function asRole(role: Identity['role'], sub = '1'): Record<string, string> {
  return { [IDENTITY_HEADER]: signIdentity({ kind: 'user', sub, role, email: `${role}@example.test` }, TEST_INTERNAL_SECRET) };
}
