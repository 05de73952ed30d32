import { ApiError, type ErrorBody } from '../../../services/common/src/errors.js';
import { IDENTITY_HEADER, signIdentity, type Identity } from '../../../services/common/src/internal-identity.js';

/** The gateway's own calls to a service (login checks, health), signed as the gateway itself. */
export class ServiceClient {
  constructor(
    readonly baseUrl: string,
    private readonly internalSecret: string,
    /** Named in the error when the service does not answer, e.g. "records". */
    readonly name = 'back-end',
    private readonly timeoutMs = 5000,
  ) {}

  async request<T>(method: string, path: string, body?: unknown, identity?: Omit<Identity, 'iat'>): Promise<T> {
    const signed = signIdentity(identity ?? { kind: 'gateway', sub: 'gateway', role: 'system' }, this.internalSecret);
    let res: Response;
    try {
      res = await fetch(this.baseUrl + path, {
        method,
        headers: { 'content-type': 'application/json', [IDENTITY_HEADER]: signed },
        body: body === undefined ? undefined : JSON.stringify(body),
        signal: AbortSignal.timeout(this.timeoutMs),
      });
    } catch (err) {
      if ((err as Error).name === 'TimeoutError') throw new ApiError(504, 'upstream_timeout', `The ${this.name} service took longer than ${this.timeoutMs / 1000} s to answer; try again in a moment.`);
      throw new ApiError(503, 'service_unavailable', `The ${this.name} service is not answering just now; try again in a moment.`);
    }
    const payload = (await res.json().catch(() => ({}))) as T & Partial<ErrorBody>;
    if (!res.ok) {
      const error = payload.error;
      throw new ApiError(res.status, error?.code ?? 'upstream_error', error?.message ?? `Service answered ${res.status}.`, error?.field);
    }
    return payload;
  }

  async health(): Promise<{ status: 'ok' | 'down'; latencyMs?: number; error?: string }> {
    const started = performance.now();
    try {
      const res = await fetch(this.baseUrl + '/health', { signal: AbortSignal.timeout(2000) });
      if (!res.ok) return { status: 'down', error: `HTTP ${res.status}` };
      return { status: 'ok', latencyMs: Math.round((performance.now() - started) * 10) / 10 };
    } catch (err) {
      return { status: 'down', error: (err as Error).message };
    }
  }
}
