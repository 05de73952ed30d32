import Stripe from 'stripe';

export interface PaymentsConfig {
  secretKey: string;
  webhookSecret: string;
  /** Local stand-in address; omit both to talk to the real provider. */
  host?: string;
  port?: number;
}

/** The payment provider's own SDK, pointed at the local stand-in in development and tests. */
export function createPaymentsClient(config: PaymentsConfig): Stripe {
  return new Stripe(config.secretKey, {
    ...(config.host && { host: config.host, port: config.port, protocol: 'http' as const }),
    maxNetworkRetries: 0,
    telemetry: false,
  });
}
