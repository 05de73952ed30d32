import type { z } from 'zod';
import type { ApiKey as ApiKeySchema, CreatedApiKey as CreatedApiKeySchema, API_SCOPES } from '@tubwright/shared/api/api-keys';

export type ApiKey = z.infer<typeof ApiKeySchema>;
export type CreatedApiKey = z.infer<typeof CreatedApiKeySchema>;
export type ApiScope = (typeof API_SCOPES)[number];
export type ApiKeyKind = ApiKey['kind'];

export const SCOPE_LABELS: Record<ApiScope, string> = {
  calculations: 'Calculations',
  'quote-requests': 'Quote requests',
  'order-status': 'Order status',
};

export const KIND_LABELS: Record<ApiKeyKind, string> = {
  publishable: 'Website key',
  secret: 'Partner key (secret)',
};
