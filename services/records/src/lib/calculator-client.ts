import { ApiError, type ErrorBody } from '../../../common/src/errors.js';
import { IDENTITY_HEADER, signIdentity, type Identity } from '../../../common/src/internal-identity.js';

/**
 * The records service asks the calculator over HTTP (it keeps no copy of the calculations), on
 * behalf of the caller: the caller's identity is re-signed so the calculator checks the same role.
 */
export class CalculatorClient {
  constructor(
    private readonly baseUrl: string,
    private readonly internalSecret: string,
  ) {}

  async post<T>(path: string, body: unknown, identity: Identity | undefined): Promise<T> {
    const who = identity ?? { kind: 'gateway' as const, sub: 'records', role: 'system' as const };
    let res: Response;
    try {
      res = await fetch(this.baseUrl + path, {
        method: 'POST',
        headers: { 'content-type': 'application/json', [IDENTITY_HEADER]: signIdentity({ kind: who.kind, sub: who.sub, role: who.role, ...('email' in who && { email: who.email }) }, this.internalSecret) },
        body: JSON.stringify(body),
        signal: AbortSignal.timeout(30_000),
      });
    } catch {
      throw new ApiError(502, 'calculator_unavailable', 'The calculator did not answer; try again in a moment.');
    }
    const payload = (await res.json().catch(() => ({}))) as T & Partial<ErrorBody>;
    if (!res.ok) {
      const e = payload.error;
      // The calculator's 400/422 name a field of the spec; pass them on unchanged.
      throw new ApiError(res.status, e?.code ?? 'calculator_error', e?.message ?? `Calculator answered ${res.status}.`, e?.field);
    }
    return payload;
  }
}
