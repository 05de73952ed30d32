import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, SCREENSHOTS, signIn } from './browser.js';

/*
 * The rack sizer as a shop's visitor meets it: examples/widget-host.html served from a second local
 * origin (another port is another origin), with hostile host CSS and another script on the page.
 */

const baseUrl = inject('baseUrl');
const portBase = Number(process.env['E2E_PORT_BASE'] ?? 44);
const ALLOWED_PORT = portBase * 100 + 40;
const REFUSED_PORT = portBase * 100 + 41;
const allowedOrigin = `http://127.0.0.1:${ALLOWED_PORT}`;
const refusedOrigin = `http://127.0.0.1:${REFUSED_PORT}`;

let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
let ownerToken = '';
let widgetKey = '';
const servers: http.Server[] = [];

async function api<T>(method: string, route: string, body?: unknown, headers: Record<string, string> = {}): Promise<{ status: number; body: T; headers: Headers }> {
  const res = await fetch(`${baseUrl}/api/v1${route}`, {
    method,
    headers: { authorization: `Bearer ${ownerToken}`, ...(body ? { 'content-type': 'application/json' } : {}), ...headers },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await res.text();
  return { status: res.status, body: (text ? JSON.parse(text) : null) as T, headers: res.headers };
}

/** The example page with this run's gateway and key filled in, on its own port. */
function serveHostPage(port: number): Promise<void> {
  const html = fs
    .readFileSync(path.resolve('examples/widget-host.html'), 'utf8')
    .replaceAll('TUBWRIGHT_GATEWAY', baseUrl)
    .replaceAll('TUBWRIGHT_KEY', widgetKey);
  const server = http.createServer((_req, res) => {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
    res.end(html);
  });
  servers.push(server);
  return new Promise((resolve) => server.listen(port, '127.0.0.1', () => resolve()));
}

beforeAll(async () => {
  const login = await fetch(`${baseUrl}/api/v1/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'owner@demo.tubwright.test', password: 'tubwright-demo' }),
  });
  ownerToken = ((await login.json()) as { accessToken: string }).accessToken;
  const created = await api<{ key: string }>('POST', '/api-keys', {
    name: 'Widget e2e host page',
    kind: 'publishable',
    origins: [allowedOrigin],
    scopes: ['calculations', 'quote-requests'],
  });
  expect(created.status).toBe(201);
  widgetKey = created.body.key;
  await serveHostPage(ALLOWED_PORT);
  await serveHostPage(REFUSED_PORT);
  browser = await openBrowser();
  page = browser.page;
});

afterAll(async () => {
  await browser?.close();
  for (const s of servers) await new Promise((r) => s.close(r));
});

async function fill(widget: Locator, values: Record<string, string>): Promise<void> {
  for (const [label, value] of Object.entries(values)) {
    await widget.getByLabel(label).fill(value);
    await widget.getByLabel(label).press('Tab');
  }
}

const TUB_IN = { 'Tub length': '23', 'Tub width': '16 1/4', 'Tub height': '6 1/2', Levels: '9', Columns: '3' };
const fontOf = (l: Locator) => l.evaluate((el) => ({ size: getComputedStyle(el).fontSize, family: getComputedStyle(el).fontFamily, display: getComputedStyle(el).display }));

describe('the rack sizer on a shop website', () => {
  it('sizes a rack like the calculator, unharmed by the host page and beside a second widget', async () => {
    await page.goto(`${allowedOrigin}/`);
    const inches = page.locator('#sizer-in');
    const metric = page.locator('#sizer-mm');
    await inches.getByLabel('Tub length').waitFor();
    await metric.getByLabel('Tub length').waitFor();

    await fill(inches, TUB_IN);
    // Outside width by the trade rules (common practice): 3 x 16 1/4 tubs + 1/2 side play
    // + 2 support-block columns x 1/2 + 2 side panels x 1/2 = 51 1/4 in.
    await expect.poll(() => inches.getByTestId('outside-width').textContent(), { timeout: 15_000 }).toBe('51 1/4 in');
    // ... and the same as the calculator answers the owner for that spec.
    const plan = await api<{ display: { dimensions: Record<string, string> } }>('POST', '/calc/rack-plan', {
      unit: 'in', tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 9, columns: 3 }, cutting: { include: false },
    });
    expect(`${plan.body.display.dimensions['overallWidth']} in`).toBe('51 1/4 in');
    await inches.getByText('Height with casters').waitFor();
    await inches.getByText(/sheets? of rigid PVC/).waitFor();
    await inches.getByText(/^Estimate/).waitFor();
    await inches.getByRole('img', { name: /Front view to scale: 9 levels of 3 tubs/ }).waitFor();

    // The other widget was not touched, and it has no prices (no show-prices attribute).
    await expect.poll(() => metric.getByLabel('Tub length').inputValue()).toBe('');
    await expect.poll(() => metric.getByTestId('outside-width').count()).toBe(0);

    // Host CSS applies to the host page (30px serif, buttons hidden) but not inside the widget.
    expect((await fontOf(page.locator('#host-banner'))).size).toBe('30px');
    const quoteButton = inches.getByRole('button', { name: 'Request a quote' });
    const buttonFont = await fontOf(quoteButton);
    expect(buttonFont.size).toBe('16px');
    expect(buttonFont.family).not.toMatch(/^serif$/);
    expect(buttonFont.display).not.toBe('none');
    const labelColour = await inches.getByText('Outside width').evaluate((el) => getComputedStyle(el).color);
    expect(labelColour).not.toBe('rgb(255, 0, 0)');
    // The "other framework" kept re-rendering its part of the page all along.
    expect(await page.evaluate(() => (window as unknown as { hostTicks(): number }).hostTicks())).toBeGreaterThan(3);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'widget-host-sized.png'), fullPage: true });

    // The second widget works on its own, in millimetres: 51 1/4 in = 1301.75 mm (25.4 mm per inch, exact).
    await fill(metric, { 'Tub length': '584.2', 'Tub width': '412.75', 'Tub height': '165.1', Levels: '9', Columns: '3' });
    await expect.poll(() => metric.getByTestId('outside-width').textContent(), { timeout: 15_000 }).toBe('1301.8 mm');
    await expect.poll(() => metric.getByText(/^Estimate/).count()).toBe(0);
    await expect.poll(() => inches.getByTestId('outside-width').textContent()).toBe('51 1/4 in');
  });

  it('turns a quote request into a lead with a draft quote and two e-mails', async () => {
    const inches = page.locator('#sizer-in');
    const email = `widget-visitor-${Date.now()}@example.test`;
    await inches.getByRole('button', { name: 'Request a quote' }).click();
    await expect.poll(() => inches.getByLabel('Name', { exact: true }).evaluate((el) => el === (el.getRootNode() as ShadowRoot).activeElement)).toBe(true);
    await inches.getByLabel('Name', { exact: true }).fill('Morgan Ashdown');
    await inches.getByLabel('E-mail', { exact: true }).fill(email);
    await inches.getByLabel(/^Note/).fill('Three ball python yearlings.');
    // Consent is required: without it nothing is sent.
    await inches.getByRole('button', { name: 'Send request' }).click();
    await inches.getByText('Tick the box so the shop may answer you').waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'widget-quote-consent.png'), fullPage: true });
    expect((await api<{ total: number }>('GET', `/customers?q=${encodeURIComponent(email)}`)).body.total).toBe(0);

    await inches.getByLabel(/may contact me/).check();
    await inches.getByRole('button', { name: 'Send request' }).click();
    const done = inches.getByRole('status').filter({ hasText: 'Thank you' });
    await done.waitFor({ timeout: 15_000 });
    const reference = (await done.locator('strong').first().textContent())!.trim();
    expect(reference).toMatch(/^Q-\d{4}-\d{4,}$/);
    await done.getByText(/Estimate with tax: \$/).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'widget-quote-sent.png'), fullPage: true });

    // The owner finds the lead and its draft quote for this very rack.
    const customers = await api<{ items: Array<{ id: number; name: string; email: string }> }>('GET', `/customers?q=${encodeURIComponent(email)}`);
    expect(customers.body.items).toEqual([expect.objectContaining({ name: 'Morgan Ashdown', email })]);
    const quotes = await api<{ items: Array<{ id: number; number: string; status: string; customerId: number }> }>('GET', `/quotes?q=${reference}`);
    expect(quotes.body.items).toEqual([expect.objectContaining({ number: reference, status: 'draft', customerId: customers.body.items[0]!.id })]);
    const quote = await api<{ lines: Array<{ description: string; spec: { tub: unknown; layout: unknown } }> }>('GET', `/quotes/${quotes.body.items[0]!.id}`);
    expect(quote.body.lines[0]!.spec).toMatchObject({ tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 9, columns: 3 } });

    // The mail catcher holds the shop's notice and the visitor's copy.
    await expect
      .poll(async () => (await api<{ items: Array<{ to: string[] }> }>('GET', `/mail/messages?q=${reference}`)).body.items.length, { timeout: 10_000 })
      .toBe(2);
    const mails = (await api<{ items: Array<{ to: string[]; subject: string }> }>('GET', `/mail/messages?q=${reference}`)).body.items;
    expect(mails.some((m) => m.to.some((t) => t.includes(email)))).toBe(true);
    expect(mails.some((m) => !m.to.some((t) => t.includes(email)))).toBe(true);
  });

  it('shows the lead in the orders module', async () => {
    const quotes = await api<{ items: Array<{ number: string; customerName: string }> }>('GET', '/quotes?q=Morgan%20Ashdown');
    const reference = quotes.body.items[0]!.number;
    await signIn(page, baseUrl, 'owner@demo.tubwright.test');
    await page.goto(`${baseUrl}/orders/quotes?q=${encodeURIComponent(reference)}`);
    await page.locator('tw-orders').getByText(reference).first().waitFor({ timeout: 30_000 });
    await page.locator('tw-orders').getByText('Morgan Ashdown').first().waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'widget-lead-in-orders.png'), fullPage: true });
  });

  it('gets no answer on a website whose origin is not on the key', async () => {
    await page.goto(`${refusedOrigin}/`);
    const inches = page.locator('#sizer-in');
    await inches.getByLabel('Tub length').waitFor();
    await fill(inches, TUB_IN);
    await inches.getByRole('alert').filter({ hasText: 'cannot reach the shop' }).waitFor({ timeout: 15_000 });
    await expect.poll(() => inches.getByTestId('outside-width').count()).toBe(0);
    await expect.poll(() => inches.getByRole('button', { name: 'Request a quote' }).count()).toBe(0);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'widget-refused-origin.png'), fullPage: true });

    // What the browser was told: the preflight is refused, and a direct call with that origin is 403.
    const preflight = await fetch(`${baseUrl}/api/v1/calc/rack-plan`, {
      method: 'OPTIONS',
      headers: { origin: refusedOrigin, 'access-control-request-method': 'POST', 'access-control-request-headers': 'content-type, x-api-key' },
    });
    expect(preflight.status).toBe(403);
    expect(preflight.headers.get('access-control-allow-origin')).toBeNull();
    const call = await fetch(`${baseUrl}/api/v1/calc/rack-plan`, {
      method: 'POST',
      headers: { origin: refusedOrigin, 'x-api-key': widgetKey, 'content-type': 'application/json' },
      body: JSON.stringify({ tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 9, columns: 3 }, cutting: { include: false } }),
    });
    expect(call.status).toBe(403);
  });
});

describe('API keys in the console', () => {
  it('lets the owner create a website key, copy it once, and revoke it after confirming', async () => {
    await page.goto(`${baseUrl}/`);
    await page.getByRole('navigation', { name: 'Modules' }).getByRole('link', { name: 'API keys' }).click();
    await page.getByRole('heading', { name: 'API keys', level: 1 }).waitFor();
    await page.getByRole('table', { name: 'API keys' }).getByText('Widget e2e host page').waitFor();

    await page.getByRole('button', { name: 'New key' }).click();
    await page.getByLabel('Name', { exact: true }).fill('Console e2e website');
    await page.getByLabel('Website origins').fill('https://racks.example/sizer');
    await expect.poll(() => page.getByRole('checkbox', { name: /Order status/ }).isDisabled()).toBe(true);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'api-keys-form.png'), fullPage: true });
    await page.getByRole('button', { name: 'Create key' }).click();

    const key = (await page.getByTestId('new-key').textContent())!.trim();
    expect(key).toMatch(/^tw_pk_/);
    await expect(page.getByTestId('new-key-snippet').textContent()).resolves.toBe(
      `<script type="module" src="${baseUrl}/widget/tw-rack-sizer.js"></script>\n<tw-rack-sizer key="${key}" show-prices></tw-rack-sizer>`,
    );
    await page.screenshot({ path: path.join(SCREENSHOTS, 'api-keys-created.png'), fullPage: true });
    await page.getByRole('button', { name: 'I have copied it' }).click();
    await expect.poll(() => page.getByTestId('new-key').count()).toBe(0);

    const row = page.getByRole('row').filter({ hasText: 'Console e2e website' });
    await row.waitFor();
    await expect.poll(() => row.textContent()).toContain('https://racks.example');
    await expect(row.textContent()).resolves.not.toContain(key);
    const listed = await api<{ items: Array<{ id: number; name: string; origins: string[]; revokedAt: string | null }> }>('GET', '/api-keys?q=Console%20e2e');
    expect(listed.body.items).toEqual([expect.objectContaining({ origins: ['https://racks.example'], revokedAt: null })]);

    await row.getByRole('button', { name: 'Revoke Console e2e website' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('This cannot be undone').waitFor();
    // Keeping it is the default: nothing happens.
    await dialog.getByRole('button', { name: 'Keep it' }).click();
    await page.getByRole('dialog').waitFor({ state: 'detached' });
    await row.getByText('Active', { exact: true }).waitFor();
    await row.getByRole('button', { name: 'Revoke Console e2e website' }).click();
    await page.getByRole('dialog').getByText('This cannot be undone').waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'api-keys-revoke-dialog.png'), fullPage: true, animations: 'disabled' });
    await page.getByRole('dialog').getByRole('button', { name: 'Revoke key' }).click();
    await row.getByText(/^Revoked/).waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'api-keys-revoked.png'), fullPage: true });

    const after = await api<{ items: Array<{ revokedAt: string | null }> }>('GET', '/api-keys?q=Console%20e2e');
    expect(after.body.items[0]!.revokedAt).not.toBeNull();
    const refused = await fetch(`${baseUrl}/api/v1/calc/rack-plan`, {
      method: 'POST',
      headers: { origin: 'https://racks.example', 'x-api-key': key, 'content-type': 'application/json' },
      body: JSON.stringify({ tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 1, columns: 1 }, cutting: { include: false } }),
    });
    expect(refused.status).toBe(401);
  });
});
