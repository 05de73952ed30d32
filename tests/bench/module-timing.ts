import { ensureChromium } from '../e2e/chromium.js';
import { openBrowser, signIn } from '../e2e/browser.js';
import { median, round } from './stats.js';

export interface ModuleTiming {
  module: string;
  firstVisitMs: number;
  returnVisitMs: number;
}

const MODULES = [
  { label: 'Planning', tag: 'tw-planning' },
  { label: 'Collection', tag: 'tw-collection' },
  { label: 'Orders', tag: 'tw-orders' },
];

/**
 * Time from clicking a module in the navigation to its element showing its first table row,
 * in headless Chromium: on a freshly loaded console (bundle not yet fetched) and on a return
 * visit (bundle already defined). Median of 10 each.
 */
export async function moduleTimings(baseUrl: string, runs = 10): Promise<ModuleTiming[]> {
  ensureChromium();
  const browser = await openBrowser();
  const { page } = browser;
  try {
    await signIn(page, baseUrl, 'owner@demo.tubwright.test');
    const open = async (m: (typeof MODULES)[number]) => {
      const started = Date.now();
      await page.getByRole('navigation', { name: 'Modules' }).getByRole('link', { name: m.label }).click();
      await page.locator(m.tag).locator('tr').nth(1).waitFor();
      return Date.now() - started;
    };
    const out: ModuleTiming[] = [];
    for (const m of MODULES) {
      const first: number[] = [];
      const again: number[] = [];
      const other = MODULES.find((x) => x !== m)!;
      for (let i = 0; i < runs; i++) {
        await page.goto(`${baseUrl}/users`);
        await page.getByRole('table').first().waitFor();
        first.push(await open(m));
        await open(other);
        again.push(await open(m));
      }
      out.push({ module: m.label.toLowerCase(), firstVisitMs: round(median(first), 0), returnVisitMs: round(median(again), 0) });
    }
    return out;
  } finally {
    await browser.close();
  }
}
