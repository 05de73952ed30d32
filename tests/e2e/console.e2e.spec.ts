import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { navLabels, openBrowser, SCREENSHOTS, signIn, signOut } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
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
    await expect(page.locator('tw-collection').getByText('AC-036').or(page.locator('tw-collection').getByText('MS-029')).first().isVisible()).resolves.toBe(true);
    // a module the role may not use is refused by the console too
    await page.goto(`${baseUrl}/orders`);
    await expect(page.getByText(/not available/i).first().isVisible()).resolves.toBe(true);
    expect(elementScripts().filter((u) => u.includes('/orders/'))).toEqual([]);
    await page.goto(`${baseUrl}/collection`);
    await signOut(page);
  });

  it('lets the owner switch among the three modules, fetching each bundle once', async () => {
    const before = elementScripts().length;
    await signIn(page, baseUrl, 'owner@demo.tubwright.test');
    expect(await navLabels(page)).toEqual(['Planning', 'Collection', 'Orders', 'Users', 'Outbox']);
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
  });
});
