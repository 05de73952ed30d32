import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';

export const API_KEY_KINDS = ['publishable', 'secret'] as const;
export const API_SCOPES = ['calculations', 'quote-requests', 'order-status'] as const;
/** A publishable key lives in a web page, so it may only calculate and ask for quotes. */
export const PUBLISHABLE_SCOPES = ['calculations', 'quote-requests'] as const;

const Origin = z
  .string()
  .trim()
  .max(200)
  .refine((o) => {
    try {
      const url = new URL(o);
      return (url.protocol === 'https:' || url.protocol === 'http:') && url.origin === o;
    } catch {
      return false;
    }
  }, 'must be a web origin such as https://shop.example (scheme, host and port only, no path)')
  .describe('A website origin allowed to call with this key from a browser.');

export const ApiKey = z.object({
  id: z.number().int(),
  name: z.string(),
  kind: z.enum(API_KEY_KINDS),
  prefix: z.string().describe('The first characters of the key, to tell keys apart; the key itself is shown only once.'),
  scopes: z.array(z.enum(API_SCOPES)),
  origins: z.array(z.string()),
  lastUsedAt: IsoDateTime.nullable(),
  revokedAt: IsoDateTime.nullable(),
  createdAt: IsoDateTime,
});

export const CreatedApiKey = ApiKey.extend({
  key: z.string().describe('The key. Shown in this answer only: store it now; it cannot be shown again.'),
});

export const CreateApiKeyRequest = z
  .object({
    name: z.string().trim().min(1, 'is required').max(120),
    kind: z.enum(API_KEY_KINDS).describe('publishable: for the website widget, locked to origins; secret: for a partner\'s server.'),
    origins: z.array(Origin).max(20).default([]),
    scopes: z.array(z.enum(API_SCOPES)).min(1, 'choose at least one scope').max(API_SCOPES.length),
  })
  .strict()
  .superRefine((req, ctx) => {
    if (req.kind === 'publishable') {
      if (req.origins.length === 0) ctx.addIssue({ code: 'custom', path: ['origins'], message: 'a publishable key needs at least one website origin' });
      req.scopes.forEach((scope, i) => {
        if (!(PUBLISHABLE_SCOPES as readonly string[]).includes(scope)) {
          ctx.addIssue({ code: 'custom', path: ['scopes', i], message: `a publishable key may only have ${PUBLISHABLE_SCOPES.join(' and ')}` });
        }
      });
    }
  });

export const ApiKeyListQuery = listQuery(['name', 'createdAt', 'lastUsedAt']);
export const ApiKeyPage = page(ApiKey);

/** Internal: what the gateway learns about a presented key. */
export const VerifiedApiKey = z.object({
  id: z.number().int(),
  kind: z.enum(API_KEY_KINDS),
  scopes: z.array(z.enum(API_SCOPES)),
  origins: z.array(z.string()),
});
