import { loadConfig } from '../../common/src/config.js';
import { listen } from '../../common/src/listen.js';
import { createApp } from './app.js';

const config = loadConfig();
await listen(
  createApp({
    secretKey: config.stripeSecretKey,
    webhookSecret: config.stripeWebhookSecret,
    webhookUrl: config.paymentsWebhookUrl,
  }),
  config.host,
  config.paymentsPort,
  'payments',
);
