import fs from 'node:fs';
import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, SCREENSHOTS, signIn } from './browser.js';

/*
 * The keeper's feeding day in the collection module, with the demo data: PR-001 lives in R1-1A
 * and PR-002 in R1-1B (services/records/src/seed/demo-data.ts places the first animals in
 * reading order).
 */

const baseUrl = inject('baseUrl');
const ONE_PIXEL_PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, `collection-${name}.png`), fullPage: true });
const collection = () => page.locator('tw-collection');
/** Uncaught errors in the page, and console errors to explain a failure. */
const pageErrors: string[] = [];

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
  page.on('pageerror', (error) => pageErrors.push(error.message));
  page.on('console', (message) => {
    if (message.type() !== 'error') return;
    console.log(`[browser] ${message.text()}`);
    // Angular's ErrorHandler reports what went wrong inside a component this way.
    if (message.text().startsWith('ERROR')) pageErrors.push(message.text());
  });
  await signIn(page, baseUrl, 'keeper@demo.tubwright.test');
  await page.waitForURL(/\/collection/);
});
afterAll(() => browser.close());

async function openAnimal(code: string): Promise<void> {
  await collection().getByRole('link', { name: 'Animals', exact: true }).click();
  await collection().getByLabel(/^Search/).fill(code);
  // Wait for the filter to land (it is debounced) so it cannot replace the page the click opens.
  await page.waitForURL(new RegExp(`q=${code}`));
  const table = collection().getByRole('table', { name: 'Animals' });
  await expect.poll(() => table.locator('tbody tr').count()).toBe(1);
  await table.getByRole('link', { name: code, exact: true }).click();
  await collection().getByRole('heading', { level: 1, name: new RegExp(code) }).waitFor();
}

/** The history's rows recorded on feeding day, newest first. */
const feedingDayRows = (): Locator => collection().getByRole('table', { name: 'Events, newest first' }).locator('tbody tr').filter({ hasText: 'feeding day' });

describe('the collection module, as the keeper', () => {
  it('lists the animals with filters and opens one with its history', async () => {
    const table = collection().getByRole('table', { name: 'Animals' });
    await table.getByRole('link', { name: 'PR-001', exact: true }).or(table.getByRole('link', { name: 'AC-036' })).first().waitFor();

    // The status filter goes to the API and into the address.
    await collection().getByLabel('Status').selectOption('sold');
    await page.waitForURL(/status=sold/);
    await expect.poll(() => table.locator('tbody tr').count()).toBe(1);
    await shot('animals-sold');
    await collection().getByLabel('Status').selectOption('');

    // The export is a signed-in request saved as a file.
    const [download] = await Promise.all([page.waitForEvent('download'), collection().getByRole('button', { name: 'Animals CSV' }).click()]);
    expect(download.suggestedFilename()).toBe('animals.csv');
    const csv = fs.readFileSync(await download.path(), 'utf8');
    expect(csv.split(/\r?\n/)[0]).toMatch(/^code,/);
    expect(csv).toContain('PR-001');

    await openAnimal('PR-001');
    await collection().getByRole('link', { name: /Tub R1-1A/ }).waitFor();
    await collection().getByRole('img', { name: 'Weights of PR-001 over time' }).waitFor();
    await expect.poll(() => collection().getByRole('table', { name: 'Events, newest first' }).locator('tbody tr').count()).toBeGreaterThan(2);

    // A photo goes up and comes back through the signed-in API (an <img src> alone could not).
    await collection().getByRole('region', { name: 'Photos' }).locator('input[type=file]').setInputFiles({ name: 'pr-001.png', mimeType: 'image/png', buffer: ONE_PIXEL_PNG });
    const photo = collection().getByRole('img', { name: /^Photo of PR-001, / });
    await photo.waitFor();
    await expect.poll(() => photo.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(1);

    // Genes are picked from the shop's trait list (invented demo names).
    const genes = collection().getByRole('region', { name: 'Genes' });
    await genes.getByRole('button', { name: 'Edit genes' }).click();
    await genes.getByRole('button', { name: 'Add a trait' }).click();
    await genes.getByLabel('Trait').selectOption({ label: 'amber (recessive)' });
    await genes.getByLabel('State').selectOption('possible-het');
    await genes.getByLabel('Chance het (%)').fill('50');
    await genes.getByRole('button', { name: 'Save genes' }).click();
    await genes.getByText('50 % possible het amber').waitFor();
    await shot('animal');
  });

  it('records an accepted and a refused on feeding day with the keyboard', async () => {
    await collection().getByRole('navigation', { name: 'Collection' }).getByRole('link', { name: 'Feeding day' }).click();
    await collection().getByRole('heading', { name: /^Rack R\d · \d+ due$/ }).first().waitFor();
    await shot('due-list');
    await collection().getByRole('link', { name: 'Feed R1' }).click();

    const grid = collection().getByRole('grid');
    await grid.waitFor();
    const first = grid.getByRole('gridcell', { name: /^R1-1A, PR-001/ });
    await first.click();
    await expect.poll(() => first.evaluate((el) => el === document.activeElement)).toBe(true);

    // A on R1-1A moves on to R1-1B; R refuses it; O on R1-1C, then U takes that back.
    await page.keyboard.press('a');
    await page.keyboard.press('r');
    await page.keyboard.press('o');
    await expect.poll(() => grid.getByRole('gridcell', { name: /^R1-1C, .*Offered$/ }).count()).toBe(1);
    await page.keyboard.press('u');
    await expect.poll(() => grid.getByRole('gridcell', { name: /^R1-1A, PR-001, .*Accepted$/ }).count()).toBe(1);
    await expect.poll(() => grid.getByRole('gridcell', { name: /^R1-1B, PR-002, .*Refused$/ }).count()).toBe(1);
    await expect.poll(() => grid.getByRole('gridcell', { name: /^R1-1C, .*not marked$/ }).count()).toBe(1);
    // Arrows move the cursor without marking.
    await page.keyboard.press('ArrowDown');
    await expect.poll(() => grid.getByRole('gridcell', { name: /^R1-2C, / }).evaluate((el) => el === document.activeElement)).toBe(true);
    await collection().getByText(/1 accepted · 1 refused · 0 offered/).waitFor();
    await shot('feeding-marked');

    await collection().getByRole('button', { name: 'Save 2 results' }).click();
    await collection().getByRole('status').filter({ hasText: /Saved 2 results for rack R1: (1 accepted, 1 refused|1 refused, 1 accepted)\./ }).waitFor();
    await shot('feeding-saved');
  });

  it('shows both results in the animals\' histories, and undoes one', async () => {
    await openAnimal('PR-001');
    await expect.poll(() => feedingDayRows().first().innerText()).toMatch(/Accepted · rat/);

    await openAnimal('PR-002');
    const refused = feedingDayRows().filter({ hasText: 'Refused · rat' });
    await refused.first().waitFor();
    const before = await feedingDayRows().count();
    await refused.first().getByRole('button', { name: /^Undo feeding of/ }).click();
    await collection().getByText(/^Undone: feeding of .*Refused · rat/).waitFor();
    await collection().getByRole('heading', { name: 'History' }).scrollIntoViewIfNeeded();
    await expect.poll(() => feedingDayRows().count()).toBe(before - 1);
    await expect.poll(() => feedingDayRows().filter({ hasText: 'Refused · rat' }).count()).toBe(0);
    await shot('history-undone');
  });

  it('moves an animal on the rack map and prints the rack\'s tub labels', async () => {
    await collection().getByRole('navigation', { name: 'Collection' }).getByRole('link', { name: 'Racks' }).click();
    await collection().getByRole('region', { name: 'Empty tubs' }).getByRole('link').first().waitFor();
    await shot('racks');
    await collection().getByRole('link', { name: /^R1\s/ }).first().click();
    await collection().getByRole('heading', { level: 1, name: 'Rack R1' }).waitFor();
    const rackMap = collection().getByRole('group', { name: /^Tubs of rack R1/ });
    await rackMap.getByRole('button', { name: /^R1-1A: PR-001/ }).click();
    await collection().getByLabel('Move PR-001 to').selectOption({ label: 'R1-3B' });
    await collection().getByRole('button', { name: 'Move', exact: true }).click();
    await collection().getByText('Moved PR-001 from R1-1A to R1-3B.').waitFor();
    await rackMap.getByRole('button', { name: 'R1-1A: empty' }).waitFor();
    await rackMap.getByRole('button', { name: /^R1-3B: PR-001/ }).waitFor();
    await shot('rack-map');

    await collection().getByRole('link', { name: 'Tub labels' }).click();
    await collection().getByRole('img', { name: /^QR code for .*\/collection\/animals\/\d+$/ }).first().waitFor();
    await expect.poll(() => collection().locator('.tw-label').filter({ hasText: 'R1-3B' }).filter({ hasText: 'PR-001' }).count()).toBe(1);
    await shot('labels');
  });

  it('opens a pairing with its outcome table and records a clutch', async () => {
    await collection().getByRole('navigation', { name: 'Collection' }).getByRole('link', { name: 'Breeding' }).click();
    await collection().getByRole('table', { name: 'Pairings, newest first' }).getByRole('link').first().click();
    const looks = collection().getByRole('table', { name: 'Offspring by what they look like' });
    await looks.waitFor();
    await expect.poll(() => looks.locator('tbody tr').count()).toBeGreaterThan(1);
    await collection().getByRole('heading', { level: 1 }).scrollIntoViewIfNeeded();
    await shot('pairing');
    await collection().getByLabel('Fertile eggs').fill('5');
    await collection().getByRole('button', { name: 'Record the clutch' }).click();
    await collection().getByRole('status').filter({ hasText: /^Clutch recorded: expected to hatch / }).waitFor();
    await shot('clutch');
  });

  it('shows a rack\'s readings against the ranges, with a caution when out of range', async () => {
    await collection().getByRole('navigation', { name: 'Collection' }).getByRole('link', { name: 'Environment' }).click();
    await collection().getByLabel('Rack', { exact: true }).selectOption({ label: 'R2 · snake room, north wall' });
    await page.waitForURL(/environment\?rackId=\d+/);
    // The demo's R2 warm side ran at 93.5 °F one evening.
    await collection().getByRole('alert').filter({ hasText: /1 reading is out of range on rack R2/ }).waitFor();
    await collection().getByRole('note').filter({ hasText: /calibrated thermometer/ }).waitFor();
    await shot('environment');
    expect(pageErrors).toEqual([]);
  });
});
