import { createHmac, timingSafeEqual } from 'node:crypto';

/**
 * A customer's link to one sending of one quote: its number plus an HMAC over the quote's id and
 * the moment it was sent, under the service's secret. Nothing is stored; sending the quote again
 * makes a new link and the old one stops working.
 */
export function quoteLinkToken(secret: string, quote: { id: number; number: string }, sentAt: string): string {
  return `${quote.number}.${signature(secret, quote.id, sentAt)}`;
}

export function quoteLinkMatches(secret: string, token: string, quote: { id: number; sentAt: string | null }): boolean {
  if (!quote.sentAt) return false;
  const given = Buffer.from(token.slice(token.indexOf('.') + 1));
  const expected = Buffer.from(signature(secret, quote.id, quote.sentAt));
  return given.length === expected.length && timingSafeEqual(given, expected);
}

export function quoteLinkUrl(publicUrl: string, token: string): string {
  return new URL(`/quote/${encodeURIComponent(token)}`, publicUrl).href;
}

function signature(secret: string, id: number, sentAt: string): string {
  return createHmac('sha256', secret).update(`quote-link:${id}:${sentAt}`).digest('base64url').slice(0, 32);
}
