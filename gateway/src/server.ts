import { loadConfig } from '../../services/common/src/config.js';
import { listen } from '../../services/common/src/listen.js';
import { createGatewayApp } from './app.js';

const config = loadConfig();
const url = (port: number) => `http://${config.host}:${port}`;
await listen(
  createGatewayApp({
    calculatorUrl: config.calculatorUrls[0]!,
    calculatorUrls: config.calculatorUrls,
    calculatorHealthIntervalMs: 5000,
    recordsUrl: url(config.recordsPort),
    mailUrl: url(config.mailHttpPort),
    paymentsUrl: url(config.paymentsPort),
    webDir: config.webDir,
    jwtSecret: config.jwtSecret,
    internalSecret: config.internalSecret,
    accessTokenTtlS: config.accessTokenTtlS,
    refreshTokenTtlS: config.refreshTokenTtlS,
    loginRateLimitPerMinute: config.loginRateLimitPerMinute,
    publicUrl: config.publicUrl,
    apiKeyRateLimitPerMinute: config.apiKeyRateLimitPerMinute,
    widgetIpRateLimitPerMinute: config.widgetIpRateLimitPerMinute,
    calculationMemoEntries: config.calculationMemoEntries,
  }),
  config.host,
  config.gatewayPort,
  'gateway',
);
