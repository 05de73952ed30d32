import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { WIDGET_SCRIPT_PATH, staticWeb } from './static-web.js';

const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-web-'));
afterAll(() => fs.rmSync(webDir, { recursive: true, force: true }));

const appFor = (dir: string) => express().use(staticWeb(dir));

describe('the widget script', () => {
  it('is served at /widget/tw-rack-sizer.js as JavaScript any website may load as a module', async () => {
    fs.mkdirSync(path.join(webDir, 'rack-sizer'), { recursive: true });
    fs.writeFileSync(path.join(webDir, 'rack-sizer', 'main.js'), 'customElements.get("tw-rack-sizer");');
    const res = await request(appFor(webDir)).get(WIDGET_SCRIPT_PATH).set('origin', 'https://racks.example');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/javascript; charset=utf-8');
    expect(res.headers['access-control-allow-origin']).toBe('*');
    expect(res.headers['cross-origin-resource-policy']).toBe('cross-origin');
    expect(res.headers['cache-control']).toBe('public, max-age=300');
    expect(res.text).toContain('tw-rack-sizer');
  });

  it('answers 503 in words while the widget is not built, never the console page', async () => {
    const res = await request(appFor(path.join(webDir, 'missing'))).get(WIDGET_SCRIPT_PATH);
    expect(res.status).toBe(503);
    expect(res.text).toContain('not built');
  });
});
