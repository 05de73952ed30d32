/**
 * Sessions signed out here, remembered until their last access token would have expired anyway,
 * so a copied access token stops working at sign-out rather than at expiry. Kept in memory: with
 * several gateway copies, the others still honour the token until it expires (minutes).
 */
export class EndedSessions {
  private readonly until = new Map<string, number>();

  end(sessionId: string, accessTtlS: number, now = Date.now()): void {
    this.until.set(sessionId, now + accessTtlS * 1000);
    if (this.until.size > 10_000) this.sweep(now);
  }

  has(sessionId: string | undefined, now = Date.now()): boolean {
    if (!sessionId) return false;
    const until = this.until.get(sessionId);
    if (until === undefined) return false;
    if (until > now) return true;
    this.until.delete(sessionId);
    return false;
  }

  private sweep(now: number): void {
    for (const [id, until] of this.until) if (until <= now) this.until.delete(id);
  }
}
