import fs from 'node:fs';
import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { pdfText } from '../../services/records/src/plans/pdf-text.js';
import { openBrowser, SCREENSHOTS, signIn } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
let planning: Locator;

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
  planning = page.locator('tw-planning');
});
afterAll(() => browser.close());

const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, `planning-${name}.png`) });
const dimension = (key: string) => planning.locator(`[data-dimension="${key}"] dd`);
/** A form field by its label; the fields live in the element's light DOM. */
const field = (label: string) => planning.getByLabel(label, { exact: true });
const fieldError = (label: string) => planning.locator('mat-form-field', { has: page.getByLabel(label, { exact: true }) }).locator('mat-error');

describe('planning a rack', () => {
  it('sizes a rack around a typed tub as the builder types', async () => {
    await signIn(page, baseUrl, 'builder@demo.tubwright.test');
    await page.getByRole('navigation', { name: 'Modules' }).getByRole('link', { name: 'Planning' }).click();
    await planning.getByRole('button', { name: 'New plan' }).click();
    await page.waitForURL(/\/planning\/plans\/new$/);

    await field('Tub length').fill('23');
    await field('Tub width').fill('16.25');
    await field('Tub height').fill('6.5');
    await field('Levels').fill('9');
    await field('Columns').fill('3');

    // Common practice: opening = tub height + 1/8 in lid gap = 6 5/8 in; interior = 3 x 16 1/4
    // + 1/2 play + 2 x 1/2 support blocks = 50 1/4 in; outside adds two 1/2 in sides = 51 1/4 in.
    await expect.poll(() => dimension('levelOpening').textContent(), { timeout: 15_000 }).toBe('6 5/8 in');
    await expect.poll(() => dimension('interiorShelfLength').textContent()).toBe('50 1/4 in');
    await expect.poll(() => dimension('outerShelfLength').textContent()).toBe('51 1/4 in');
    // The top panel is 1 in longer than the interior shelf: two 1/2 in side panels.

    const elevation = planning.locator('svg.elevation');
    await elevation.waitFor();
    await expect.poll(() => elevation.locator('rect.tub').count()).toBe(27);
    const diagrams = planning.locator('img.cutting-diagram');
    await expect.poll(() => diagrams.count()).toBeGreaterThan(0);
    // Diagrams load lazily: scrolled into view, the API's drawing decodes as an image.
    await diagrams.first().scrollIntoViewIfNeeded();
    await expect.poll(() => diagrams.first().evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
    await planning.getByText(/optimal|above the best possible/).first().waitFor();
    await shot('editor');
    await planning.locator('section[aria-labelledby="p-front"]').screenshot({ path: path.join(SCREENSHOTS, 'planning-front-view.png') });
    await planning.locator('section[aria-labelledby="p-cutting"]').screenshot({ path: path.join(SCREENSHOTS, 'planning-cutting.png') });
  });

  it('redraws the rack when the levels change', async () => {
    const sheetsBefore = await planning.locator('.summary').textContent();
    await field('Levels').fill('12');
    await expect.poll(() => planning.locator('svg.elevation rect.tub').count(), { timeout: 15_000 }).toBe(36);
    await expect.poll(() => planning.locator('.summary').textContent()).not.toBe(sheetsBefore);
    await expect.poll(() => planning.locator('.summary').textContent()).toMatch(/^12 levels × 3 columns/);
    await field('Levels').fill('9');
    await expect.poll(() => planning.locator('svg.elevation rect.tub').count(), { timeout: 15_000 }).toBe(27);
  });

  it('shows a typed bad value on its field and sends nothing', async () => {
    const calcCalls = () => browser.requests.filter((u) => u.endsWith('/api/v1/calc/rack-plan')).length;
    await page.waitForTimeout(600);
    const before = calcCalls();
    await field('Levels').fill('0');
    await expect.poll(() => fieldError('Levels').textContent(), { timeout: 5_000 }).toContain('Levels must be from 1 to 30');
    await expect.poll(() => field('Levels').getAttribute('aria-invalid')).toBe('true');
    await planning.locator('p.stale').waitFor();
    await page.waitForTimeout(600);
    expect(calcCalls()).toBe(before);
    await shot('bad-levels');
    await field('Levels').fill('9');
    await expect.poll(() => fieldError('Levels').count()).toBe(0);
  });

  it('saves the plan and finds it in the saved plans', async () => {
    const name = `E2E rack ${Date.now()}`;
    await field('Plan name').fill(name);
    await planning.getByRole('button', { name: 'Save plan' }).click();
    await page.waitForURL(/\/planning\/plans\/\d+$/);
    await expect.poll(() => planning.getByRole('heading', { level: 1 }).textContent()).toBe(name);
    await planning.getByText('Saved “' + name + '”.').waitFor();
    await expect.poll(() => dimension('levelOpening').textContent()).toBe('6 5/8 in');

    // The build sheet is a PDF with the cut list in it.
    const [download] = await Promise.all([page.waitForEvent('download'), planning.getByRole('button', { name: 'Build sheet' }).click()]);
    const file = await download.path();
    const pdf = fs.readFileSync(file!);
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = pdfText(pdf);
    expect(text).toContain('Parts (cut list)');
    expect(text).toContain('side panel');

    await planning.getByRole('navigation', { name: 'Planning' }).getByRole('link', { name: 'Saved plans' }).click();
    await page.waitForURL(/\/planning\/plans$/);
    await planning.getByRole('searchbox').fill(name);
    const row = planning.getByRole('row', { name: new RegExp(name) });
    // The search narrows the list to the new plan (a header row and one plan).
    await expect.poll(() => planning.getByRole('row').count()).toBe(2);
    await expect.poll(() => row.textContent()).toContain('9 × 3 tubs');
    await expect.poll(() => row.textContent()).toContain('51 1/4 in wide × 71 5/8 in tall');
    await shot('saved-list');

    await row.getByRole('link', { name }).click();
    await page.waitForURL(/\/planning\/plans\/\d+$/);
    await expect.poll(() => field('Tub width').inputValue()).toBe('16 1/4');
  });
});
