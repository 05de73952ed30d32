import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { CHROMIUM, CHROMIUM_ARGS } from './chromium.js';

export const SCREENSHOTS = path.resolve('tests/e2e/screenshots');

/** A fresh headless Chromium profile per test file; every request is recorded so tests can check hosts. */
export async function openBrowser(): Promise<{ context: BrowserContext; page: Page; requests: string[]; close: () => Promise<void> }> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'tubwright-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width: 1366, height: 860 },
    acceptDownloads: true,
  });
  const requests: string[] = [];
  context.on('request', (r) => requests.push(r.url()));
  const page = context.pages()[0] ?? (await context.newPage());
  fs.mkdirSync(SCREENSHOTS, { recursive: true });
  return {
    context,
    page,
    requests,
    close: async () => {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signIn(page: Page, baseUrl: string, email: string, password = 'tubwright-demo'): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Modules' }).waitFor();
}

export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Account of/ }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByLabel('E-mail').waitFor();
}

export const navLabels = (page: Page) =>
  page.getByRole('navigation', { name: 'Modules' }).getByRole('link').allInnerTexts().then((t) => t.map((s) => s.replace(/^\S+\s+/, '').trim()));
