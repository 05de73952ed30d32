import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp as createCalculatorApp } from '../../services/calculator/src/app.js';
import { createApp as createMailApp } from '../../services/mail-catcher/src/app.js';
import { MailStore } from '../../services/mail-catcher/src/mail-store.js';
import { recordsTestApp } from '../../services/records/src/test-support.js';
import { gatewayTestStack } from '../../gateway/src/test-support.js';
import { openApiDocument } from '../../gateway/src/openapi/document.js';
import { routes } from '../../gateway/src/openapi/route-catalog.js';
import { listRoutes } from './express-routes.js';

const documented = () => new Set(routes.map((r) => `${r.method.toUpperCase()} ${r.path}`));
const isPublic = (route: string) => route.split(' ')[1]!.startsWith('/api/v1/');

describe('the OpenAPI document covers every public route', () => {
  it('documents every /api/v1 route the services answer', async () => {
    const records = await recordsTestApp();
    const apps = [records.app, createCalculatorApp({ internalSecret: 's' }), createMailApp({ store: new MailStore(), internalSecret: 's' })];
    const served = apps.flatMap(listRoutes).filter(isPublic);
    const gateway = await gatewayTestStack();
    served.push(...listRoutes(gateway.app).filter(isPublic));
    await gateway.close();
    await records.close();
    const missing = served.filter((r) => !documented().has(r));
    expect(missing).toEqual([]);
    // and nothing documented that no service answers
    const extra = [...documented()].filter((r) => !served.includes(r));
    expect(extra).toEqual([]);
  });

  it('is OpenAPI 3.1 with both security schemes and a path per documented route', () => {
    const doc = openApiDocument();
    expect(doc.openapi).toBe('3.1.0');
    expect(Object.keys(doc.components?.securitySchemes ?? {})).toEqual(expect.arrayContaining(['bearer', 'apiKey']));
    for (const route of routes) {
      const path = route.path.replace(/:(\w+)/g, '{$1}');
      expect(doc.paths?.[path]?.[route.method], `${route.method} ${path}`).toBeDefined();
    }
  });
});

describe('live responses match their documented schemas', () => {
  let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
  let token = '';
  beforeAll(async () => {
    stack = await gatewayTestStack();
    token = (await request(stack.app).post('/api/v1/auth/login').send({ email: 'owner@demo.tubwright.test', password: 'tubwright-demo' })).body.accessToken;
  });
  afterAll(() => stack.close());

  it('every documented GET without path parameters answers its success schema for the owner', async () => {
    const gets = routes.filter((r) => r.method === 'get' && !r.path.includes(':') && r.success.schema && r.path !== '/api/v1/health');
    expect(gets.length).toBeGreaterThan(4);
    for (const route of gets) {
      const res = await request(stack.app).get(route.path).set('authorization', `Bearer ${token}`);
      expect(res.status, route.path).toBe(route.success.status);
      const parsed = route.success.schema!.safeParse(res.body);
      expect(parsed.success, `${route.path}: ${parsed.error?.message}`).toBe(true);
    }
  });

  it('every documented GET by id answers its schema for the first listed row', async () => {
    for (const route of routes.filter((r) => r.method === 'get' && r.path.endsWith('/:id') && !r.path.includes('/mail/'))) {
      const list = await request(stack.app).get(route.path.replace('/:id', '')).set('authorization', `Bearer ${token}`);
      expect(list.body.items?.length, `${route.path}: the demo data should hold at least one row`).toBeGreaterThan(0);
      const id = list.body.items[0].id;
      const res = await request(stack.app).get(route.path.replace(':id', String(id))).set('authorization', `Bearer ${token}`);
      const parsed = route.success.schema!.safeParse(res.body);
      expect(parsed.success, `${route.path}: ${parsed.error?.message}`).toBe(true);
    }
  });

  it('serves the document and the docs page from the gateway', async () => {
    const json = await request(stack.app).get('/api/openapi.json');
    expect(json.status).toBe(200);
    expect(json.body.paths['/api/v1/animals'].get).toBeDefined();
    const docs = await request(stack.app).get('/api/docs/');
    expect(docs.status).toBe(200);
    expect(docs.text).toContain('swagger-ui');
    // assets come from the gateway itself, never a CDN
    expect(docs.text).not.toMatch(/(src|href)=["']https?:/i);
  });
});
