import { ApiKeyListQuery, ApiKeyPage, CreateApiKeyRequest, CreatedApiKey } from '../../../shared/api/api-keys.js';
import { IdParams } from '../../../shared/api/common.js';
import { documentRoutes } from './route-catalog.js';

const KEYS_TEXT = [
  'Publishable keys belong in the shop\'s own web pages (the rack sizer widget): scopes `calculations` and `quote-requests` only, usable only from the listed origins (CORS), rate-limited per key and per visitor address.',
  'Secret keys belong on a partner\'s server: scopes chosen from `calculations`, `quote-requests` and `order-status`.',
  'Send a key in the `X-API-Key` header. A revoked or unknown key: 401; a key without the route\'s scope, of the wrong kind or from an unlisted origin: 403; floods: 429 with `Retry-After`.',
].join('\n\n');

documentRoutes(
  { method: 'get', path: '/api/v1/api-keys', tag: 'api keys', summary: 'List API keys (never the keys themselves)', description: KEYS_TEXT, roles: ['owner'], query: ApiKeyListQuery, success: { status: 200, schema: ApiKeyPage, description: 'One page' } },
  {
    method: 'post', path: '/api/v1/api-keys', tag: 'api keys', summary: 'Issue a key; the answer is the only time it is shown', description: KEYS_TEXT, roles: ['owner'], body: CreateApiKeyRequest,
    bodyExample: { name: 'Shop website', kind: 'publishable', origins: ['https://racks.example'], scopes: ['calculations', 'quote-requests'] },
    success: { status: 201, schema: CreatedApiKey, description: 'The key, shown once' },
  },
  { method: 'delete', path: '/api/v1/api-keys/:id', tag: 'api keys', summary: 'Revoke a key at once', roles: ['owner'], params: IdParams, success: { status: 204, description: 'Revoked' }, errors: [404] },
);
