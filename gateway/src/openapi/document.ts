import { OpenApiGeneratorV31, OpenAPIRegistry } from '@asteasolutions/zod-to-openapi';
import type { OpenAPIV3_1 } from 'openapi-types';
import { ErrorResponse } from '../../../shared/api/common.js';
import './catalog-foundation.js';
import './catalog-calculator.js';
import './catalog-genetics.js';
import './catalog-plans.js';
import './catalog-collection.js';
import './catalog-orders.js';
import './catalog-api-keys.js';
import './catalog-quote-requests.js';
import './catalog-stock.js';
import { routes, type RouteDoc } from './route-catalog.js';

const STATUS_TEXT: Record<number, string> = {
  400: 'Invalid input; `error.field` names the field',
  401: 'No valid access token or API key',
  403: 'The role may not use this route',
  404: 'Not found',
  409: 'Conflicts with an existing record',
  413: 'The request is too large',
  422: 'Valid input that cannot be carried out; the message says why',
  429: 'Too many requests; retry later',
};

export const toOpenApiPath = (path: string) => path.replace(/:(\w+)/g, '{$1}');

function register(registry: OpenAPIRegistry, route: RouteDoc, bearer: { name: string }): void {
  const errorStatuses = new Set<number>([400, ...(route.roles.length ? [401, 403] : []), ...(route.errors ?? [])]);
  const responses: Record<string, { description: string; content?: Record<string, { schema: never }> }> = {
    [route.success.status]: {
      description: route.success.description,
      ...(route.success.schema && { content: { 'application/json': { schema: route.success.schema as never } } }),
    },
  };
  for (const status of errorStatuses) {
    responses[status] = { description: STATUS_TEXT[status] ?? 'Error', content: { 'application/json': { schema: ErrorResponse as never } } };
  }
  const roleText = route.roles.length ? `Roles: ${route.roles.join(', ')}.` : 'Public: no sign-in needed.';
  registry.registerPath({
    method: route.method,
    path: toOpenApiPath(route.path),
    tags: [route.tag],
    summary: route.summary,
    description: [route.description, roleText].filter(Boolean).join('\n\n'),
    security: route.roles.length ? [{ [bearer.name]: [] }, ...(route.roles.includes('integrator') ? [{ apiKey: [] }] : [])] : [],
    request: {
      ...(route.params && { params: route.params }),
      ...(route.query && { query: route.query }),
      ...(route.body && {
        body: {
          required: true,
          content: { 'application/json': { schema: route.body as never, ...(route.bodyExample !== undefined && { example: route.bodyExample }) } },
        },
      }),
    },
    responses: responses as never,
  });
}

let cached: OpenAPIV3_1.Document | undefined;

/** The one OpenAPI 3.1 document, built from the same zod schemas that validate the requests. */
export function openApiDocument(): OpenAPIV3_1.Document {
  if (cached) return cached;
  const registry = new OpenAPIRegistry();
  const bearer = registry.registerComponent('securitySchemes', 'bearer', {
    type: 'http',
    scheme: 'bearer',
    bearerFormat: 'JWT',
    description: 'Access token from POST /api/v1/auth/login.',
  });
  registry.registerComponent('securitySchemes', 'apiKey', {
    type: 'apiKey',
    in: 'header',
    name: 'X-Api-Key',
    description: 'A key the shop owner issues to an integrator.',
  });
  for (const route of routes) register(registry, route, bearer);
  const generator = new OpenApiGeneratorV31(registry.definitions);
  cached = generator.generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'Tubwright API',
      version: '1.0.0',
      description:
        'Plan tub racks, keep the collection and run the shop\'s orders. JSON in and out; lengths in the request\'s `unit` (`in` or `mm`); errors as `{ "error": { "code", "message", "field" } }`.',
    },
    servers: [{ url: '/' }],
  }) as unknown as OpenAPIV3_1.Document;
  return cached;
}
