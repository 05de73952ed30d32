import path from 'node:path';
import { loadConfig } from '../../common/src/config.js';
import { listen } from '../../common/src/listen.js';
import { createApp } from './app.js';
import { migrateLatest, openDatabase } from './db/knex.js';
import { CalculatorClient } from './lib/calculator-client.js';
import { Mailer } from './lib/mailer.js';
import { createPaymentsClient } from './lib/payments.js';

const config = loadConfig();
const db = openDatabase(config.databaseUrl, { poolMin: config.databasePoolMin, poolMax: config.databasePoolMax });
await migrateLatest(db);
const app = createApp({
  db,
  internalSecret: config.internalSecret,
  uploadsDir: path.join(config.dataDir, 'uploads'),
  sessionTtlS: config.refreshTokenTtlS,
  publicUrl: config.publicUrl,
  calculator: new CalculatorClient(config.calculatorUrls[0]!, config.internalSecret),
  mailer: new Mailer({ host: config.host, port: config.smtpPort }, config.mailFrom),
  payments: {
    client: createPaymentsClient({ secretKey: config.stripeSecretKey, webhookSecret: config.stripeWebhookSecret, host: config.host, port: config.paymentsPort }),
    webhookSecret: config.stripeWebhookSecret,
  },
});
const server = await listen(app, config.host, config.recordsPort, 'records');
server.on('close', () => void db.destroy());
