import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gatewayTestStack } from './test-support.js';

let stack: Awaited<ReturnType<typeof gatewayTestStack>>;
let webDir: string;

beforeAll(async () => {
  // A stand-in build: the headers are the gateway's business, not the bundle's.
  webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-web-'));
  fs.mkdirSync(path.join(webDir, 'shell'));
  fs.mkdirSync(path.join(webDir, 'rack-sizer'));
  fs.writeFileSync(path.join(webDir, 'shell', 'index.html'), '<!doctype html><title>console</title>');
  fs.writeFileSync(path.join(webDir, 'rack-sizer', 'main.js'), 'export {};');
  stack = await gatewayTestStack({ webDir });
});
afterAll(async () => {
  await stack.close();
  fs.rmSync(webDir, { recursive: true, force: true });
});

describe('security headers', () => {
  it('give the console a strict content security policy and forbid framing', async () => {
    const res = await request(stack.app).get('/planning/plans');
    expect(res.status).toBe(200);
    const csp = res.headers['content-security-policy'] as string;
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('let any website load the widget script, and nothing else of ours', async () => {
    const widget = await request(stack.app).get('/widget/tw-rack-sizer.js');
    expect(widget.status).toBe(200);
    expect(widget.headers['cross-origin-resource-policy']).toBe('cross-origin');
    const console = await request(stack.app).get('/');
    expect(console.headers['cross-origin-resource-policy']).toBe('same-origin');
  });

  it('put the same headers on API answers, errors included', async () => {
    const res = await request(stack.app).get('/api/v1/animals');
    expect(res.status).toBe(401);
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });

  it('refuse an oversized body at the gateway, before any service sees it', async () => {
    const res = await request(stack.app).post('/api/v1/calc/rack-plan').set('content-type', 'application/json').send(`{"note":"${'x'.repeat(1_100_000)}"}`);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
  });
});
