import http from 'node:http';
import https from 'node:https';

export interface CalculatorPoolOptions {
  /** How often every copy's /health is asked; 0 checks only when a request finds a copy down. */
  healthIntervalMs?: number;
  healthTimeoutMs?: number;
  /** A copy that was taken out is asked again at most this often while requests arrive. */
  recheckMs?: number;
  /** Told when a copy is taken out or comes back. */
  log?: (line: string) => void;
}

export interface CalculatorCopy {
  readonly url: string;
  readonly target: URL;
  readonly agent: http.Agent;
  up: boolean;
  lastError?: string;
  lastCheckAt: number;
  /** Requests this copy answered (for the status page and the tests). */
  served: number;
}

/**
 * The calculator copies behind the gateway. The calculator keeps no state, so any copy may answer
 * any request: requests go round the copies that are up, each over keep-alive connections; a copy
 * whose connection fails is taken out at once, and its /health brings it back.
 */
export class CalculatorPool {
  readonly copies: CalculatorCopy[];
  private next = 0;
  private timer: NodeJS.Timeout | undefined;
  private readonly healthTimeoutMs: number;
  private readonly recheckMs: number;
  private readonly log: (line: string) => void;

  constructor(urls: string[], options: CalculatorPoolOptions = {}) {
    if (urls.length === 0) throw new Error('The calculator pool needs at least one URL.');
    this.healthTimeoutMs = options.healthTimeoutMs ?? 1000;
    this.recheckMs = options.recheckMs ?? 1000;
    this.log = options.log ?? ((line) => console.warn(line));
    this.copies = urls.map((url) => {
      const target = new URL(url);
      const Agent = target.protocol === 'https:' ? https.Agent : http.Agent;
      // Up until shown otherwise, so the first requests need not wait for a health check.
      return { url, target, agent: new Agent({ keepAlive: true, maxSockets: 64 }), up: true, lastCheckAt: 0, served: 0 };
    });
    const interval = options.healthIntervalMs ?? 0;
    if (interval > 0) {
      this.timer = setInterval(() => void this.checkHealth(), interval);
      this.timer.unref();
    }
  }

  /**
   * The next copy that is up, round-robin, other than `except`. When every copy is out, the one
   * out longest is tried anyway: a refused connection costs a millisecond, and waiting for the
   * next health check would turn a copy's short stumble into seconds of 503s for everyone.
   */
  pick(except?: CalculatorCopy): CalculatorCopy | undefined {
    this.recheckDownCopies();
    for (let i = 0; i < this.copies.length; i++) {
      const copy = this.copies[(this.next + i) % this.copies.length]!;
      if (copy.up && copy !== except) {
        this.next = (this.next + i + 1) % this.copies.length;
        return copy;
      }
    }
    return this.copies.filter((c) => c !== except).sort((a, b) => a.lastCheckAt - b.lastCheckAt)[0];
  }

  /** Takes a copy out after a failed connection; requests go to the others until /health answers again. */
  markDown(copy: CalculatorCopy, reason: string): void {
    copy.lastError = reason;
    copy.lastCheckAt = Date.now();
    if (!copy.up) return;
    copy.up = false;
    this.log(`calculator ${copy.url} taken out: ${reason}`);
  }

  /** Asks every copy's /health once; answers when all have replied or timed out. */
  async checkHealth(): Promise<void> {
    await Promise.all(this.copies.map((copy) => this.checkOne(copy)));
  }

  /** One entry of the gateway's health report: ok while at least one copy answers. */
  async health(): Promise<{ status: 'ok' | 'down'; latencyMs?: number; error?: string }> {
    const started = performance.now();
    await this.checkHealth();
    const down = this.copies.filter((c) => !c.up);
    const latencyMs = Math.round((performance.now() - started) * 10) / 10;
    const detail = down.length ? `${down.length} of ${this.copies.length} copies down: ${down.map((c) => `${c.url} (${c.lastError ?? 'no answer'})`).join(', ')}` : undefined;
    if (down.length === this.copies.length) return { status: 'down', error: detail };
    return { status: 'ok', latencyMs, ...(detail && { error: detail }) };
  }

  stop(): void {
    if (this.timer) clearInterval(this.timer);
    for (const copy of this.copies) copy.agent.destroy();
  }

  private recheckDownCopies(): void {
    const now = Date.now();
    for (const copy of this.copies) {
      if (!copy.up && now - copy.lastCheckAt >= this.recheckMs) void this.checkOne(copy);
    }
  }

  private async checkOne(copy: CalculatorCopy): Promise<void> {
    copy.lastCheckAt = Date.now();
    let problem: string | undefined;
    try {
      const res = await fetch(`${copy.url}/health`, { signal: AbortSignal.timeout(this.healthTimeoutMs) });
      await res.body?.cancel();
      if (!res.ok) problem = `health answered ${res.status}`;
    } catch (err) {
      // A copy too busy to answer its health check in time is alive and working through its
      // queue; taking it out would only pile its load on the others (or leave none at all).
      if ((err as Error).name === 'TimeoutError') return;
      const cause = (err as { cause?: { code?: string } }).cause;
      problem = cause?.code ?? (err as Error).name ?? 'no answer';
    }
    if (problem) {
      this.markDown(copy, problem);
    } else if (!copy.up) {
      copy.up = true;
      copy.lastError = undefined;
      this.log(`calculator ${copy.url} is back`);
    }
  }
}
