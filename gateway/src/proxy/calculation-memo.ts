import { createHash } from 'node:crypto';
import type http from 'node:http';
import { LRUCache } from 'lru-cache';

export interface RememberedAnswer {
  headers: http.OutgoingHttpHeaders;
  body: Buffer;
}

export interface CalculationMemoOptions {
  /** Total bytes of the answers kept (default 64 MiB). */
  maxBytes?: number;
  /** An answer larger than this is not kept (default 1 MiB). */
  maxAnswerBytes?: number;
  /** How long an answer is reused (default 15 minutes). */
  ttlMs?: number;
}

/** Who asks, as far as a calculator answer can depend on it: its role and an API key's scopes. */
export interface Asker {
  role: string;
  scopes?: string[];
}

// Headers that belong to one answer, not to what was computed.
const NOT_KEPT = new Set(['date', 'connection', 'keep-alive', 'transfer-encoding', 'content-length']);

/**
 * Recent calculator answers, reused for an identical request. Every calculator route computes its
 * answer from the body alone and refuses by the caller's role, so the key is the method, the path,
 * the role and scopes, and a digest of the body; only 200 answers are kept. The website widget's
 * first request is the same default spec for every visitor, and the plan editor sends a spec
 * again whenever a field goes back to an earlier value.
 */
export class CalculationMemo {
  private readonly cache: LRUCache<string, RememberedAnswer>;
  private readonly maxAnswerBytes: number;
  hits = 0;
  misses = 0;

  constructor(maxEntries: number, options: CalculationMemoOptions = {}) {
    this.maxAnswerBytes = options.maxAnswerBytes ?? 1024 * 1024;
    this.cache = new LRUCache<string, RememberedAnswer>({
      max: maxEntries,
      maxSize: options.maxBytes ?? 64 * 1024 * 1024,
      sizeCalculation: (answer) => answer.body.length + 256,
      ttl: options.ttlMs ?? 15 * 60_000,
    });
  }

  keyFor(method: string, url: string, asker: Asker | undefined, body: Buffer): string {
    const scopes = asker?.scopes ? [...asker.scopes].sort().join(',') : '';
    const digest = createHash('sha256').update(body).digest('base64url');
    return `${method} ${url} ${asker?.role ?? '-'} ${scopes} ${digest}`;
  }

  recall(key: string): RememberedAnswer | undefined {
    const answer = this.cache.get(key);
    if (answer) this.hits++;
    else this.misses++;
    return answer;
  }

  remember(key: string, headers: http.IncomingHttpHeaders, body: Buffer): void {
    if (body.length > this.maxAnswerBytes) return;
    const kept: http.OutgoingHttpHeaders = {};
    for (const [name, value] of Object.entries(headers)) if (!NOT_KEPT.has(name) && value !== undefined) kept[name] = value;
    this.cache.set(key, { headers: kept, body });
  }

  get size(): number {
    return this.cache.size;
  }
}
