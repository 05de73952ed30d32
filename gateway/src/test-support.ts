import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp as createCalculatorApp } from '../../services/calculator/src/app.js';
import { createApp as createMailApp } from '../../services/mail-catcher/src/app.js';
import { MailStore } from '../../services/mail-catcher/src/mail-store.js';
import { recordsTestApp, TEST_INTERNAL_SECRET } from '../../services/records/src/test-support.js';
import { createGatewayApp, type GatewayDeps } from './app.js';

export const TEST_JWT_SECRET = 'gateway-test-jwt-secret';

function serve(app: http.RequestListener): Promise<{ url: string; server: http.Server }> {
  const server = http.createServer(app);
  return new Promise((resolve) =>
    server.listen(0, '127.0.0.1', () => resolve({ url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, server })),
  );
}

/** The gateway in-process, in front of real services listening on loopback (real HTTP between them). */
export async function gatewayTestStack(overrides: Partial<GatewayDeps> = {}) {
  const records = await recordsTestApp({ seed: true });
  const recordsHttp = await serve(records.app);
  const calculatorHttp = await serve(createCalculatorApp({ internalSecret: TEST_INTERNAL_SECRET }));
  const mailStore = new MailStore();
  const mailHttp = await serve(createMailApp({ store: mailStore, internalSecret: TEST_INTERNAL_SECRET }));
  const app = createGatewayApp({
    calculatorUrl: calculatorHttp.url,
    recordsUrl: recordsHttp.url,
    mailUrl: mailHttp.url,
    paymentsUrl: 'http://127.0.0.1:9',
    webDir: '/nonexistent',
    jwtSecret: TEST_JWT_SECRET,
    internalSecret: TEST_INTERNAL_SECRET,
    accessTokenTtlS: 900,
    refreshTokenTtlS: 3600,
    loginRateLimitPerMinute: 1000,
    ...overrides,
  });
  const close = async () => {
    for (const s of [recordsHttp, calculatorHttp, mailHttp]) await new Promise((r) => s.server.close(r));
    await records.close();
  };
  return { app, db: records.db, mailStore, recordsMail: records.mailStore, close };
}
