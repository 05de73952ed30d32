import { createHash } from 'node:crypto';
import { ApiError } from '../../../services/common/src/errors.js';

/**
 * Answers from the records service kept for a short while. Fresh entries save a round trip per
 * API call; stale ones are used only while the records service is down, so partners and the
 * website widget keep calculating through a records restart. A revoked key stops working within
 * `freshMs`; nothing is cached when the service says no.
 */
export class FallbackCache<T> {
  private readonly entries = new Map<string, { value: T; at: number }>();

  constructor(
    private readonly freshMs: number,
    private readonly staleMs: number,
    private readonly maxEntries = 5000,
  ) {}

  /** Forgets everything, e.g. after an owner revoked a key or changed its websites. */
  clear(): void {
    this.entries.clear();
  }

  async get(key: string, load: () => Promise<T>, now = Date.now()): Promise<T> {
    const id = createHash('sha256').update(key).digest('base64url');
    const entry = this.entries.get(id);
    if (entry && now - entry.at < this.freshMs) return entry.value;
    try {
      const value = await load();
      if (this.entries.size >= this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
      this.entries.set(id, { value, at: now });
      return value;
    } catch (err) {
      const down = err instanceof ApiError && err.status >= 502;
      if (down && entry && now - entry.at < this.staleMs) return entry.value;
      if (!down) this.entries.delete(id);
      throw err;
    }
  }
}
