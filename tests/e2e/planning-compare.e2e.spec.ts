import path from 'node:path';
import zlib from 'node:zlib';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, SCREENSHOTS, signIn, signOut } from './browser.js';

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

const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, `planning-${name}.png`), fullPage: true });

/** CRC-32 as PNG chunks need it (PNG spec, 5.5: polynomial 0xEDB88320). */
function crc32(bytes: Buffer): number {
  let crc = ~0;
  for (const byte of bytes) {
    crc ^= byte;
    for (let k = 0; k < 8; k++) crc = (crc >>> 1) ^ (0xedb88320 & -(crc & 1));
  }
  return ~crc >>> 0;
}

/** A real, decodable 480 x 360 PNG of a tub in front of a wall, so the browser can draw its thumbnail. */
function tubPicture(): Buffer {
  const [width, height] = [480, 360];
  const raw = Buffer.alloc((width * 3 + 1) * height);
  for (let y = 0; y < height; y++) {
    raw[y * (width * 3 + 1)] = 0; // filter: none
    for (let x = 0; x < width; x++) {
      const inTub = x > 70 && x < 410 && y > 120 && y < 300;
      const rim = inTub && y < 135;
      const [r, g, b] = rim ? [40, 90, 120] : inTub ? [120, 180, 210] : y > 300 ? [150, 130, 110] : [235, 232, 220];
      raw.set([r, g, b], y * (width * 3 + 1) + 1 + x * 3);
    }
  }
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8); // 8-bit RGB
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', header), chunk('IDAT', zlib.deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}

describe('planning: compare, tub photos and materials', () => {
  it('lets a builder compare two saved plans side by side', async () => {
    await signIn(page, baseUrl, 'builder@demo.tubwright.test');
    await page.goto(`${baseUrl}/planning/plans`);
    // Demo plans (services/records/src/seed/plans-demo.ts).
    await planning.getByLabel('Compare Longhold 28, 9 high x 3 wide').check();
    await planning.getByLabel('Compare Nestbox 15 hatchling rack, 10 x 4').check();
    await shot('compare-pick');
    await planning.getByRole('button', { name: 'Compare', exact: true }).click();
    await page.waitForURL(/\/planning\/compare\/\d+\/\d+$/);

    const table = planning.getByRole('table', { name: 'Two plans side by side' });
    await table.waitFor();
    const heads = table.locator('thead th.plan-head');
    await expect.poll(() => heads.allInnerTexts()).toEqual([expect.stringContaining('Longhold 28, 9 high x 3 wide'), expect.stringContaining('Nestbox 15 hatchling rack, 10 x 4')]);
    // 9 x 3 against 10 x 4: levels and overall height differ and are marked; lengths read in sixteenths.
    const levels = table.locator('tr[data-row="levels"]');
    await expect.poll(() => levels.locator('td').allInnerTexts()).toEqual(['9', '10', '+1']);
    await expect.poll(() => levels.getAttribute('class')).toContain('differs');
    const height = table.locator('tr[data-row="overallHeight"] td');
    await expect.poll(() => height.nth(0).innerText()).toMatch(/^\d+( \d+\/\d+)? in$/);
    await expect.poll(() => table.locator('tr[data-row="total"] td').count()).toBe(3);
    await shot('compare');
    await table.locator('tr[data-row="total"]').scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SCREENSHOTS, 'planning-compare-cost.png') });

    await planning.getByRole('button', { name: 'Swap A and B' }).click();
    await expect.poll(() => heads.first().innerText()).toContain('Nestbox 15');
    await expect.poll(() => levels.locator('td').allInnerTexts()).toEqual(['10', '9', '\u22121']);
  });

  it('lets a builder add a photo to a tub model, see its thumbnail in the list and remove it', async () => {
    await page.goto(`${baseUrl}/planning/tub-models`);
    await planning.getByRole('link', { name: 'Longhold 28', exact: true }).click();
    await page.waitForURL(/\/planning\/tub-models\/\d+$/);
    await planning.getByText('No photo yet.').waitFor();

    const uploaded = page.waitForResponse((r) => /\/api\/v1\/tub-models\/\d+\/photo$/.test(r.url()) && r.request().method() === 'POST');
    await planning.locator('input[type="file"]').setInputFiles({ name: 'longhold-28.png', mimeType: 'image/png', buffer: tubPicture() });
    const answer = await (await uploaded).json();
    // The browser drew a thumbnail and sent it beside the original.
    expect(answer).toMatchObject({ contentType: 'image/png', hasThumbnail: true });
    const picture = planning.locator('tw-tub-model-photo-panel img');
    await expect.poll(() => picture.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(480);
    await planning.getByRole('button', { name: 'Replace photo' }).waitFor();
    await shot('tub-photo');

    await planning.getByRole('link', { name: 'Tub models' }).first().click();
    await page.waitForURL(/\/planning\/tub-models$/);
    const thumb = planning.getByRole('row', { name: /Longhold 28/ }).getByRole('img', { name: 'Photo of Longhold 28' });
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
    await shot('tub-models-thumbnails');

    // Leave the demo tub as it was for the other browser tests.
    await planning.getByRole('link', { name: 'Longhold 28', exact: true }).click();
    await planning.getByRole('button', { name: 'Remove photo…' }).click();
    await planning.getByRole('button', { name: 'Remove', exact: true }).click();
    await planning.getByText('No photo yet.').waitFor();
  });

  it('lets the owner edit a material, with bad values shown on their field', async () => {
    await signOut(page);
    await signIn(page, baseUrl, 'owner@demo.tubwright.test');
    await page.goto(`${baseUrl}/planning/materials`);
    const table = planning.getByRole('table', { name: 'Materials' });
    await table.locator('tr[data-material="pvc-rigid"]').waitFor();
    await table.locator('tr[data-material="pvc-rigid"]').getByRole('button', { name: /^Edit/ }).click();

    const density = planning.getByLabel('Density', { exact: true });
    const original = await density.inputValue();
    await density.fill('0');
    await density.blur();
    const densityError = planning.locator('mat-form-field', { has: page.getByLabel('Density', { exact: true }) }).locator('mat-error');
    await expect.poll(() => densityError.textContent()).toBe('Density must be greater than zero');
    await shot('materials-error');
    await density.fill(original);
    const source = planning.getByLabel('Source of density and modulus');
    // Added to the demo source, which stays as it was: the browser tests share one database.
    const note = `Checked against the sheet on hand, ${new Date().getFullYear()}.`;
    await source.fill(`${await source.inputValue()} ${note}`);
    await planning.getByRole('button', { name: 'Save material' }).click();
    await planning.getByRole('status').filter({ hasText: /^Saved / }).waitFor();
    await expect.poll(() => table.locator('tr[data-material="pvc-rigid"] .source').innerText()).toContain(note);
    await shot('materials');
  });
});
