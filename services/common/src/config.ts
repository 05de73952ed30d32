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
  /** The console's address as people reach it, for links in e-mail. */
  publicUrl: string;
  /** The records database: `sqlite:<file>` (the default, from DATABASE_FILE) or a `postgres://` URL. */
  databaseUrl: string;
  /** Connection pool bounds for the records database; null leaves the driver's default. */
  databasePoolMin: number | null;
  databasePoolMax: number | null;
  /** How many calculator copies `npm start` runs, and the ports they listen on (the first is CALCULATOR_PORT). */
  calculatorCopies: number;
  calculatorPorts: number[];
  /** Where the gateway (and the records service, the first) reaches the calculator copies. */
  calculatorUrls: string[];
  /** How many recent calculator answers the gateway keeps to answer an identical request again; 0 keeps none. */
  calculationMemoEntries: number;
}

/** Extra calculator copies listen from CALCULATOR_PORT + 30 upwards (4331, 4332, …), clear of the other defaults. */
export const CALCULATOR_COPY_PORT_OFFSET = 30;

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

function wholeNumber(env: Env, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0) throw new Error(`${name} must be a whole number (0 or more), got "${raw}"`);
  return value;
}

function optionalPositiveInt(env: Env, name: string): number | null {
  return env[name] === undefined || env[name] === '' ? null : positiveInt(env, name, 1);
}

function httpUrls(env: Env, name: string): string[] | null {
  const raw = env[name];
  if (raw === undefined || raw.trim() === '') return null;
  return raw.split(',').map((entry) => {
    const url = entry.trim().replace(/\/+$/, '');
    let parsed: URL | null = null;
    try {
      parsed = new URL(url);
    } catch {
      // reported below
    }
    if (!parsed || !/^https?:$/.test(parsed.protocol)) throw new Error(`${name} must be a comma-separated list of http(s) URLs, got "${entry.trim()}"`);
    return url;
  });
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
    publicUrl: env.PUBLIC_URL || `http://${host}:${gatewayPort}`,
    ...databaseSettings(env, root, dataDir),
    ...calculatorSettings(env, host),
    calculationMemoEntries: wholeNumber(env, 'CALCULATION_MEMO_ENTRIES', 1000),
  };
}

function databaseSettings(env: Env, root: string, dataDir: string) {
  const databaseFile = path.resolve(root, env.DATABASE_FILE || path.join(dataDir, 'tubwright.sqlite'));
  const databaseUrl = env.DATABASE_URL || `sqlite:${databaseFile}`;
  if (!/^(sqlite:|postgres(ql)?:\/\/)/i.test(databaseUrl)) throw new Error(`DATABASE_URL must start with sqlite: or postgres://, got "${databaseUrl}"`);
  const databasePoolMin = optionalPositiveInt(env, 'DATABASE_POOL_MIN');
  const databasePoolMax = optionalPositiveInt(env, 'DATABASE_POOL_MAX');
  if (databasePoolMin !== null && databasePoolMax !== null && databasePoolMin > databasePoolMax) {
    throw new Error(`DATABASE_POOL_MIN (${databasePoolMin}) must not exceed DATABASE_POOL_MAX (${databasePoolMax})`);
  }
  return { databaseUrl, databasePoolMin, databasePoolMax };
}

function calculatorSettings(env: Env, host: string) {
  const calculatorPort = port(env, 'CALCULATOR_PORT', 4301);
  const calculatorCopies = positiveInt(env, 'CALCULATOR_COPIES', 1);
  if (calculatorCopies > 32) throw new Error(`CALCULATOR_COPIES must be at most 32, got ${calculatorCopies}`);
  if (calculatorCopies > 1 && calculatorPort === 0) throw new Error('CALCULATOR_COPIES above 1 needs a fixed CALCULATOR_PORT (not 0)');
  const calculatorPorts = Array.from({ length: calculatorCopies }, (_, i) => (i === 0 ? calculatorPort : calculatorPort + CALCULATOR_COPY_PORT_OFFSET + i - 1));
  if (calculatorPorts.some((p) => p > 65535)) throw new Error(`CALCULATOR_COPIES ${calculatorCopies} from CALCULATOR_PORT ${calculatorPort} runs past port 65535`);
  const calculatorUrls = httpUrls(env, 'CALCULATOR_URLS') ?? calculatorPorts.map((p) => `http://${host}:${p}`);
  return { calculatorCopies, calculatorPorts, calculatorUrls };
}
