import path from 'node:path';

/**
 * Every port and path of every process, read once from the environment with the defaults of
 * README and .env.example. Nothing else in the code reads process.env.
 */
export interface Config {
  host: string;
  gatewayPort: number;
  calculatorPort: number;
  recordsPort: number;
  smtpPort: number;
  mailHttpPort: number;
  paymentsPort: number;
  dataDir: string;
  databaseFile: string;
  webDir: string;
  jwtSecret: string;
  internalSecret: string;
  accessTokenTtlS: number;
  refreshTokenTtlS: number;
  loginRateLimitPerMinute: number;
  apiKeyRateLimitPerMinute: number;
  widgetIpRateLimitPerMinute: number;
  stripeSecretKey: string;
  stripeWebhookSecret: string;
  /** Where the payments stand-in delivers its signed events. */
  paymentsWebhookUrl: string;
  /** Sender of the shop's e-mail. */
  mailFrom: string;
}

type Env = Record<string, string | undefined>;

function port(env: Env, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0 || value > 65535) {
    throw new Error(`${name} must be a port number (0 to 65535), got "${raw}"`);
  }
  return value;
}

function positiveInt(env: Env, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`${name} must be a positive whole number, got "${raw}"`);
  return value;
}

export function loadConfig(env: Env = process.env, root = process.cwd()): Config {
  const dataDir = path.resolve(root, env.DATA_DIR || 'data');
  const host = env.HOST || '127.0.0.1';
  const gatewayPort = port(env, 'PORT', 4300);
  return {
    host,
    gatewayPort,
    calculatorPort: port(env, 'CALCULATOR_PORT', 4301),
    recordsPort: port(env, 'RECORDS_PORT', 4302),
    smtpPort: port(env, 'SMTP_PORT', 4325),
    mailHttpPort: port(env, 'MAIL_HTTP_PORT', 4326),
    paymentsPort: port(env, 'PAYMENTS_PORT', 4310),
    dataDir,
    databaseFile: path.resolve(root, env.DATABASE_FILE || path.join(dataDir, 'tubwright.sqlite')),
    webDir: path.resolve(root, env.WEB_DIR || 'dist/web'),
    // Development defaults only; `npm start` replaces them with random secrets kept in data/secrets.json.
    jwtSecret: env.JWT_SECRET || 'dev-only-jwt-secret-change-me',
    internalSecret: env.INTERNAL_SECRET || 'dev-only-internal-secret-change-me',
    accessTokenTtlS: positiveInt(env, 'ACCESS_TOKEN_TTL_S', 15 * 60),
    refreshTokenTtlS: positiveInt(env, 'REFRESH_TOKEN_TTL_S', 7 * 24 * 3600),
    loginRateLimitPerMinute: positiveInt(env, 'LOGIN_RATE_LIMIT_PER_MINUTE', 10),
    apiKeyRateLimitPerMinute: positiveInt(env, 'API_KEY_RATE_LIMIT_PER_MINUTE', 300),
    widgetIpRateLimitPerMinute: positiveInt(env, 'WIDGET_IP_RATE_LIMIT_PER_MINUTE', 60),
    stripeSecretKey: env.STRIPE_SECRET_KEY || 'sk_test_tubwright_local',
    stripeWebhookSecret: env.STRIPE_WEBHOOK_SECRET || 'whsec_tubwright_local',
    mailFrom: env.MAIL_FROM || 'Tubwright shop <shop@demo.tubwright.test>',
    paymentsWebhookUrl: env.PAYMENTS_WEBHOOK_URL || `http://${host}:${gatewayPort}/api/v1/payments/webhook`,
  };
}
