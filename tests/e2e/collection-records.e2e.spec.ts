import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, SCREENSHOTS, signIn, signOut } from './browser.js';

/*
 * The collection's records in the browser: a keeper adds an animal, edits it, imports a CSV after
 * fixing a bad row, and records the hatch of the demo clutch (services/records/src/seed/collection-demo.ts
 * lays one clutch of six fertile eggs from a het amber, single dusk sire and a het amber dam).
 * The owner builds a rack from a saved plan.
 */

const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, `collection-records-${name}.png`), fullPage: true });
const collection = () => page.locator('tw-collection');
const pageErrors: string[] = [];
const tomorrow = () => new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
  // Tall enough that each page's screenshot shows its whole form (the console scrolls inside its frame).
  await page.setViewportSize({ width: 1366, height: 1300 });
  page.on('pageerror', (error) => pageErrors.push(error.message));
  page.on('console', (message) => {
    if (message.type() === 'error' && message.text().startsWith('ERROR')) pageErrors.push(message.text());
  });
  await signIn(page, baseUrl, 'keeper@demo.tubwright.test');
  await page.waitForURL(/\/collection/);
});
afterAll(() => browser.close());

const nav = (name: string) => collection().getByRole('navigation', { name: 'Collection' }).getByRole('link', { name, exact: true }).click();

describe('collection records, as the keeper', () => {
  it('adds an animal with the API\'s field errors shown on the field, then edits it', async () => {
    await collection().getByRole('link', { name: 'New animal' }).click();
    await collection().getByRole('heading', { level: 1, name: 'New animal' }).waitFor();
    const code = collection().getByLabel('Code');
    await code.fill('PR-001'); // taken by the demo data
    await collection().getByLabel('Name').fill('Clover');
    await collection().getByLabel('Sex').selectOption('female');
    await collection().getByLabel('Hatch date').fill(tomorrow());
    await collection().getByRole('button', { name: 'Add animal' }).click();
    await collection().getByText('A hatch date cannot be in the future').waitFor();

    await collection().getByLabel('Hatch date').fill('2025-05-10');
    await collection().getByRole('radio', { name: 'Acquired' }).check();
    await collection().getByLabel('Acquired from').fill('a spring show');
    await collection().getByRole('button', { name: 'Add animal' }).click();
    await collection().locator('mat-error').filter({ hasText: 'Code PR-001 is in use; pick another.' }).waitFor();
    await shot('animal-form');

    await code.fill('KR-900');
    await collection().getByRole('button', { name: 'Add animal' }).click();
    await collection().getByRole('heading', { level: 1, name: /KR-900/ }).waitFor();
    await collection().getByText('Acquired from a spring show').waitFor();

    await collection().getByRole('link', { name: 'Edit', exact: true }).click();
    await collection().getByRole('heading', { level: 1, name: 'Edit KR-900' }).waitFor();
    await expect.poll(() => collection().getByLabel('Name').inputValue()).toBe('Clover');
    await collection().getByLabel('Name').fill('Clover Bell');
    await collection().getByLabel('Feeding interval').fill('12');
    await shot('animal-edit');
    await collection().getByRole('button', { name: 'Save changes' }).click();
    await collection().getByRole('heading', { level: 1, name: /KR-900\s*Clover Bell/ }).waitFor();
    await collection().getByText('every 12 days').waitFor();
  });

  it('imports a two-row CSV only once its bad row is fixed', async () => {
    await nav('Animals');
    await collection().getByRole('link', { name: 'Import CSV' }).click();
    await collection().getByRole('heading', { level: 1, name: 'Import animals' }).waitFor();

    const [download] = await Promise.all([page.waitForEvent('download'), collection().getByRole('button', { name: 'Download the template' }).click()]);
    const header = fs.readFileSync(await download.path(), 'utf8').trim();
    expect(header.split(',')).toContain('feedingIntervalDays');
    const csv = (weight: string) => {
      const row = (cells: Record<string, string>) => header.split(',').map((c) => cells[c] ?? '').join(',');
      return [header, row({ code: 'KR-901', name: 'Juniper', species: 'Python regius', sex: 'male', weightG: '410' }), row({ code: 'KR-902', species: 'Python regius', weightG: weight })].join('\r\n');
    };
    const file = collection().locator('input[type=file]');
    await file.setInputFiles({ name: 'animals.csv', mimeType: 'text/csv', buffer: Buffer.from(csv('-3')) });
    await collection().getByRole('alert').filter({ hasText: '1 of 2 rows need fixing' }).waitFor();
    const rows = collection().getByRole('table', { name: 'Rows of the file' }).locator('tbody tr');
    await expect.poll(() => rows.nth(1).innerText()).toMatch(/KR-902[\s\S]*weightG/);
    expect(await collection().getByRole('button', { name: /^Import/ }).isDisabled()).toBe(true);
    await shot('import-bad-row');

    await file.setInputFiles({ name: 'animals-fixed.csv', mimeType: 'text/csv', buffer: Buffer.from(csv('280')) });
    await collection().getByText('All 2 rows are ready to import.').waitFor();
    await collection().getByRole('button', { name: 'Import 2 animals' }).click();
    await collection().getByRole('heading', { name: 'Imported 2 animals' }).waitFor();
    await shot('import-done');
    await collection().getByRole('link', { name: 'KR-902', exact: true }).click();
    await collection().getByRole('heading', { level: 1, name: /KR-902/ }).waitFor();
  });

  it('records the hatch of the demo clutch with what each hatchling shows', async () => {
    await nav('Breeding');
    await collection().getByRole('button', { name: /^Record the hatch of/ }).first().click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('table', { name: 'Hatchlings by looks' }).waitFor();
    await dialog.getByLabel('How many hatched').fill('2');
    await expect.poll(() => dialog.getByRole('table', { name: 'Hatchlings', exact: true }).locator('tbody tr').count()).toBe(2);
    await dialog.getByLabel('amber of hatchling 1').selectOption({ label: 'shows it' });
    await dialog.getByLabel('Sex of hatchling 1').selectOption('female');
    await dialog.getByLabel('Code of hatchling 2').fill('KR-H02');
    // het amber x het amber: a normal-looking hatchling is het with chance 2/3 (textbook Mendelian ratio).
    await expect.poll(() => dialog.locator('td.genes').allInnerTexts()).toEqual(['amber', '66.7 % possible het amber']);
    await shot('hatch-dialog');
    await dialog.getByRole('button', { name: 'Record 2 hatchlings' }).click();
    await dialog.getByRole('heading', { name: '2 hatchlings recorded' }).waitFor();
    await shot('hatch-done');

    await dialog.getByRole('link', { name: 'KR-H02' }).click();
    await collection().getByRole('heading', { level: 1, name: /KR-H02/ }).waitFor();
    await collection().getByText('Bred here').waitFor();
    await collection().getByRole('region', { name: 'Genes' }).getByText('66.7 % possible het amber').waitFor();
  });

  it('shows the trait list with what each mode means, and the species with their ranges', async () => {
    await nav('Traits');
    await collection().getByRole('table', { name: 'Traits' }).getByText('lattice').waitFor();
    await collection().getByText(/Het × het: about 1 in 4 young are visual/).waitFor();
    await collection().getByRole('button', { name: 'Edit lattice' }).click();
    await shot('traits');
    await collection().getByRole('button', { name: 'Cancel' }).click();

    await nav('Species');
    const ball = collection().getByRole('row', { name: /Python regius/ });
    await expect.poll(() => ball.innerText()).toMatch(/88 to 92 °F[\s\S]*76 to 80 °F[\s\S]*50 to 60 %/);
    await collection().getByText(/calibrated thermometer at tub level/).waitFor();
    await shot('species');

    // A keeper enters a new rack's size by hand: no saved plans offered (they may not read them).
    await nav('Racks');
    await collection().getByRole('button', { name: 'Add a rack' }).click();
    await collection().getByLabel('Levels').waitFor();
    expect(await collection().getByLabel('Built from a saved plan').count()).toBe(0);
    expect(pageErrors).toEqual([]);
  });
});

describe('a rack from a saved plan, as the owner', () => {
  it('fills levels and columns from the plan and builds its tubs', async () => {
    await signOut(page);
    await signIn(page, baseUrl, 'owner@demo.tubwright.test');
    await page.goto(`${baseUrl}/collection/racks`);
    await collection().getByRole('button', { name: 'Add a rack' }).click();
    const plan = collection().getByLabel('Built from a saved plan');
    await expect.poll(() => plan.locator('option').count()).toBeGreaterThan(1);
    const label = (await plan.locator('option').allInnerTexts()).find((t) => t.startsWith('Longhold 28, 9 high x 3 wide'));
    await plan.selectOption({ label: label! });
    await expect.poll(() => collection().getByLabel('Levels').inputValue()).toBe('9');
    expect(await collection().getByLabel('Tubs per level').inputValue()).toBe('3');
    await collection().getByLabel('Name (used on tub labels)').fill('R9');
    await shot('rack-from-plan');
    await collection().getByRole('button', { name: 'Build 27 tubs' }).click();
    await collection().getByRole('heading', { level: 1, name: 'Rack R9' }).waitFor();
    expect(pageErrors).toEqual([]);
  });
});
