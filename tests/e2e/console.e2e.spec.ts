import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { navLabels, openBrowser, SCREENSHOTS, signIn, signOut } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;

const refused: string[] = [];
beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
  // The browser reports what the content security policy blocked on the console.
  page.on('console', (m) => /Content Security Policy|Refused to/i.test(m.text()) && refused.push(m.text()));
});
afterAll(() => browser.close());

const elementScripts = () => browser.requests.filter((u) => /\/elements\/[^/]+\/main\.js/.test(u));

describe('the console', () => {
  it('shows a keeper only the collection, with its animals from the API', async () => {
    await signIn(page, baseUrl, 'keeper@demo.tubwright.test');
    expect(await navLabels(page)).toEqual(['Collection']);
    await page.waitForURL(/\/collection/);
    await page.locator('tw-collection').getByRole('table').waitFor();
    // the demo collection's first code in code order
    await page.locator('tw-collection').getByText('AC-036').or(page.locator('tw-collection').getByText('MS-029')).first().waitFor();
    // a module the role may not use is refused by the console too
    await page.goto(`${baseUrl}/orders`);
    await page.getByText(/not available/i).first().waitFor();
    expect(elementScripts().filter((u) => u.includes('/orders/'))).toEqual([]);
    await page.goto(`${baseUrl}/collection`);
    await signOut(page);
  });

  it('lets the owner switch among the three modules, fetching each bundle once', async () => {
    const before = elementScripts().length;
    await signIn(page, baseUrl, 'owner@demo.tubwright.test');
    expect(await navLabels(page)).toEqual(['Planning', 'Collection', 'Orders', 'Users', 'API keys', 'Activity', 'Outbox']);
    const modules = [
      { label: 'Planning', tag: 'tw-planning', text: 'Longhold 28' },
      { label: 'Collection', tag: 'tw-collection', text: 'PR-001' },
      { label: 'Orders', tag: 'tw-orders', text: 'Priya Venkataraman' },
    ];
    for (let round = 0; round < 2; round++) {
      for (const m of modules) {
        await page.getByRole('navigation', { name: 'Modules' }).getByRole('link', { name: m.label }).click();
        await page.locator(m.tag).getByText(m.text).first().waitFor();
      }
    }
    await page.screenshot({ path: path.join(SCREENSHOTS, 'owner-orders.png'), fullPage: true });
    const fetched = elementScripts().slice(before);
    for (const name of ['planning', 'collection', 'orders']) {
      expect(fetched.filter((u) => u.includes(`/elements/${name}/`)), name).toHaveLength(1);
    }
  });

  it('deep links and reloads into a module, and talks to no host but its own', async () => {
    await page.goto(`${baseUrl}/planning`);
    await page.reload();
    await page.locator('tw-planning').getByText('Longhold 28').first().waitFor();
    const foreign = browser.requests.filter((u) => !u.startsWith(baseUrl) && !u.startsWith('data:') && !u.startsWith('blob:'));
    expect(foreign).toEqual([]);
    expect(refused).toEqual([]);
    await signOut(page);
  });

  it("shows the owner the shop's activity, newest first", async () => {
    // A change of our own to find, whatever ran before.
    const made = await fetch(`${baseUrl}/api/v1/users`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${await ownerToken()}` },
      body: JSON.stringify({ email: 'new.builder@demo.tubwright.test', name: 'New Builder', role: 'builder', password: 'new-builder-password' }),
    });
    expect(made.status).toBe(201);
    await signIn(page, baseUrl, 'owner@demo.tubwright.test');
    await page.getByRole('navigation', { name: 'Modules' }).getByRole('link', { name: /Activity/ }).click();
    await page.getByRole('table', { name: 'Changes' }).waitFor();
    await page.getByRole('cell', { name: /new\.builder@demo\.tubwright\.test/ }).first().waitFor();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'console-activity.png') });
    await signOut(page);
  });

  it('lets a customer accept a quote from the link in its e-mail, with no account', async () => {
    const auth = { 'content-type': 'application/json', authorization: `Bearer ${await ownerToken()}` };
    const made = await fetch(`${baseUrl}/api/v1/quotes`, {
      method: 'POST',
      headers: auth,
      body: JSON.stringify({ customerId: 2, lines: [{ kind: 'item', description: 'Thermostat, 500 W', quantity: 1, unitPriceCents: 4500 }] }),
    });
    const quote = (await made.json()) as { id: number; number: string };
    expect((await fetch(`${baseUrl}/api/v1/quotes/${quote.id}/send`, { method: 'POST', headers: auth })).status).toBe(200);
    const link = await linkFromCatcher(new RegExp(quote.number), /https?:\/\/\S+\/quote\/\S+/);
    await page.goto(link);
    await page.getByRole('heading', { name: new RegExp(`Quote ${quote.number}`) }).waitFor();
    await page.getByLabel('Please deliver it').check();
    await page.getByLabel('Delivery address').fill('12 Fern Lane, Millbrook');
    await page.screenshot({ path: path.join(SCREENSHOTS, 'customer-quote.png') });
    await page.getByRole('button', { name: 'Accept this quote' }).click();
    await page.getByRole('status').getByText(/Your order is O-\d{4}-\d{4}/).waitFor();
    expect(refused).toEqual([]);

    // The deposit, on the payment stand-in's own page; only its signed event marks the order paid.
    const orderNumber = (await page.getByRole('status').getByText(/Your order is/).textContent())!.match(/O-\d{4}-\d{4}/)![0];
    await page.getByRole('button', { name: 'Pay the deposit' }).click();
    await page.getByRole('heading', { name: `Deposit for order ${orderNumber}` }).waitFor();
    expect(new URL(page.url()).pathname).toMatch(/^\/checkout\/cs_test_/);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'checkout-page.png') });
    await page.getByRole('button', { name: /^Pay / }).click();
    await page.getByRole('status').getByText('Deposit received, thank you').waitFor();
    expect(page.url()).toContain('payment=received');
    const orders = (await (await fetch(`${baseUrl}/api/v1/orders?limit=100&sort=-createdAt`, { headers: auth })).json()) as { items: { number: string; status: string }[] };
    expect(orders.items.find((o) => o.number === orderNumber)?.status).toBe('deposit_paid');
    await linkFromCatcher(new RegExp(`deposit received for ${orderNumber}`), /order/);
  });

  it('lets someone who forgot a password choose a new one from the e-mailed link', async () => {
    // A user of its own: the other browser tests sign in with the demo passwords on the same stack.
    const email = 'forgetful.keeper@demo.tubwright.test';
    const made = await fetch(`${baseUrl}/api/v1/users`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${await ownerToken()}` },
      body: JSON.stringify({ email, name: 'Forgetful Keeper', role: 'keeper', password: 'first-password-1' }),
    });
    expect(made.status).toBe(201);
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: 'Send the link' }).click();
    await page.getByRole('status').getByText(/reset link is on its way/).waitFor();
    const link = await resetLinkFromCatcher(email);
    await page.goto(link);
    await page.getByLabel('New password', { exact: true }).fill('keeper-fresh-password');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.getByRole('status').getByText(/Password changed/).waitFor();
    await page.getByRole('link', { name: 'Back to sign-in' }).click();
    await signIn(page, baseUrl, email, 'keeper-fresh-password');
    await signOut(page);
    expect(refused).toEqual([]);
  });
});

async function ownerToken(): Promise<string> {
  const login = await fetch(`${baseUrl}/api/v1/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'owner@demo.tubwright.test', password: 'tubwright-demo' }),
  });
  return ((await login.json()) as { accessToken: string }).accessToken;
}

/** The newest reset link mailed to this address, read from the mail catcher through the gateway as the owner. */
const resetLinkFromCatcher = (email: string) => linkFromCatcher(/reset your password/, /https?:\/\/\S+token=\S+/, email);

async function linkFromCatcher(subject: RegExp, pattern: RegExp, email?: string): Promise<string> {
  const accessToken = await ownerToken();
  for (let attempt = 0; attempt < 20; attempt++) {
    const auth = { authorization: `Bearer ${accessToken}` };
    const list = (await (await fetch(`${baseUrl}/api/v1/mail/messages?limit=50`, { headers: auth })).json()) as { items?: { id: number; to: string[]; subject: string }[] };
    const summary = (list.items ?? []).find((m) => (!email || m.to.includes(email)) && subject.test(m.subject));
    const mail = summary && ((await (await fetch(`${baseUrl}/api/v1/mail/messages/${summary.id}`, { headers: auth })).json()) as { text: string });
    const link = mail?.text.match(pattern)?.[0];
    if (link) return link;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no mail matching ${subject}`);
}
