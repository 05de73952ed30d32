import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, SCREENSHOTS, signIn, signOut } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
let orders: Locator;
/** Set as the story goes: the quote and the order made from it. */
let quoteNumber = '';
let orderPath = '';

const shot = (name: string) => page.screenshot({ path: path.join(SCREENSHOTS, `orders-${name}.png`), fullPage: true });

/** Picks the option of a native select whose text contains `text`. */
async function selectContaining(select: Locator, text: string): Promise<void> {
  // Options arrive with a request.
  await select.locator('option', { hasText: text }).first().waitFor({ state: 'attached' });
  const value = await select.evaluate((el, wanted) => {
    const option = [...(el as HTMLSelectElement).options].find((o) => o.text.includes(wanted));
    return option?.value ?? null;
  }, text);
  expect(value, `an option with “${text}”`).not.toBeNull();
  await select.selectOption(value!);
}

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
  orders = page.locator('tw-orders');
});
afterAll(() => browser.close());

describe('the orders module', () => {
  it('lets sales find a customer and quote a saved plan, totals with tax', async () => {
    await signIn(page, baseUrl, 'sales@demo.tubwright.test');
    await page.goto(`${baseUrl}/orders`);
    await orders.getByLabel('Filter by name, e-mail, place or address').fill('greta');
    await orders.getByRole('link', { name: 'Greta Lindqvist' }).click();
    await orders.getByRole('heading', { name: 'Greta Lindqvist' }).waitFor();
    await orders.getByText('No quotes yet.').waitFor();

    await orders.getByRole('link', { name: 'New quote' }).click();
    await orders.getByText('greta.l@example.test').waitFor();
    await selectContaining(orders.getByLabel('Saved plan'), 'Longhold 28');
    await orders.getByRole('button', { name: 'Add to quote' }).click();
    await orders.getByRole('button', { name: 'Delivery' }).click();
    await orders.getByLabel('Description', { exact: true }).fill('Delivery within 40 miles');
    await orders.getByRole('button', { name: 'Add to quote' }).click();
    const lines = orders.getByRole('table', { name: 'Lines' });
    await expect.poll(() => lines.getByRole('row').count()).toBe(3);
    // The preview counts the plan's price and the shop's delivery fee ($75.00 in the demo shop), taxed at 6.5 %.
    await orders.getByRole('complementary', { name: 'Totals' }).getByText('Tax (6.5 %)').waitFor();
    await shot('quote-form');

    await orders.getByRole('button', { name: 'Save draft' }).click();
    const heading = orders.getByRole('heading', { name: /^Quote Q-\d{4}-\d{4}$/ });
    await heading.waitFor();
    quoteNumber = (await heading.innerText()).replace('Quote ', '');
    await orders.getByText('Draft', { exact: true }).waitFor();
    const summary = orders.getByRole('region', { name: 'Summary' });
    const tax = await summary.getByText('Tax (6.5 %)').locator('xpath=following-sibling::dd[1]').innerText();
    expect(tax).toMatch(/^\$\d[\d,]*\.\d\d$/);
    expect(tax).not.toBe('$0.00');
  });

  it('sends the quote by e-mail and shows it in the mail log', async () => {
    await orders.getByRole('button', { name: 'Send by e-mail' }).click();
    await orders.getByRole('status').getByText(`Quote ${quoteNumber} was e-mailed to Greta Lindqvist`).waitFor();
    await orders.getByText('Sent', { exact: true }).first().waitFor();
    const mailLog = orders.getByRole('region', { name: 'Mail log' });
    await mailLog.getByText(quoteNumber).first().waitFor();
    await mailLog.getByText(/to greta\.l@example\.test · sent/).waitFor();
    await shot('quote-sent');

    // The PDF needs the bearer token: it is fetched, then shown in a new tab from a blob.
    const [tab, pdf] = await Promise.all([
      browser.context.waitForEvent('page'),
      page.waitForResponse((r) => /\/api\/v1\/quotes\/\d+\/pdf$/.test(r.url())),
      orders.getByRole('button', { name: 'PDF' }).click(),
    ]);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toMatch(/^application\/pdf/);
    expect((await pdf.body()).subarray(0, 5).toString()).toBe('%PDF-');
    await tab.waitForURL(/^blob:/);
    await tab.close();

    // The customer's page gathers the same message with the quote.
    await orders.getByRole('link', { name: 'Greta Lindqvist' }).click();
    await orders.getByRole('region', { name: 'Mail' }).getByText(quoteNumber).first().waitFor();
    await orders.getByRole('region', { name: 'Quotes' }).getByRole('link', { name: quoteNumber }).click();
  });

  it('records the acceptance and takes the deposit through the payment stand-in', async () => {
    await orders.getByRole('button', { name: 'Record acceptance' }).click();
    await orders.getByRole('button', { name: 'Make the order' }).click();
    await orders.getByRole('heading', { name: /^Order O-\d{4}-\d{4}$/ }).waitFor();
    orderPath = new URL(page.url()).pathname;
    await orders.getByText('Awaiting deposit', { exact: true }).first().waitFor();

    await orders.getByRole('button', { name: /^Take the deposit/ }).click();
    await orders.getByText('waits for the card payment').waitFor();
    await orders.getByRole('button', { name: 'Pay with test card' }).click();
    await orders.getByRole('status').getByText('The payment went through.').waitFor();
    const payments = orders.getByRole('table', { name: 'Payments' });
    await payments.getByText('Paid', { exact: true }).waitFor();
    await page.getByText('Deposit paid', { exact: true }).first().waitFor();
    await orders.getByText('payments-webhook').waitFor();
    await shot('deposit-paid');
  });

  it('takes the deposit of a second order too, so there are two to cut', async () => {
    await page.goto(`${baseUrl}/orders/orders?status=awaiting_deposit`);
    await orders.getByRole('link', { name: /^O-\d{4}-\d{4}$/ }).first().click();
    await orders.getByRole('button', { name: /^Take the deposit/ }).click();
    await orders.getByRole('button', { name: 'Pay with test card' }).click();
    await orders.getByRole('status').getByText('The payment went through.').waitFor();
    await signOut(page);
  });

  it('lets the builder plan the cutting of two orders and move an order to its next stage', async () => {
    await signIn(page, baseUrl, 'builder@demo.tubwright.test');
    await page.goto(`${baseUrl}/orders`);
    const toCut = orders.getByRole('region', { name: /^To cut/ });
    await toCut.getByRole('checkbox').first().waitFor();
    const boxes = toCut.getByRole('checkbox');
    // Other browser tests share the demo shop and may have an order of their own waiting to be cut.
    await expect.poll(() => boxes.count()).toBeGreaterThanOrEqual(2);
    await boxes.nth(0).check();
    await boxes.nth(1).check();
    await shot('production-board');
    await orders.getByRole('button', { name: 'Plan cutting for 2 orders' }).click();
    await orders.getByRole('heading', { name: 'Batch cutting' }).waitFor();
    await orders.getByRole('button', { name: 'Plan cutting for 2 orders' }).click();
    const plan = orders.getByRole('table', { name: 'Cutting plan' });
    await plan.waitFor({ timeout: 45_000 });
    // Every material reports the stock used against a lower bound no plan can beat.
    const rows = await plan.locator('tbody tr').all();
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) {
      const cells = await row.locator('td').allInnerTexts();
      expect(Number(cells[1])).toBeGreaterThanOrEqual(Number(cells[2]));
    }
    await shot('batch-cutting');
    const drawing = orders.locator('figure img').first();
    await drawing.scrollIntoViewIfNeeded();
    // The layout drawing decodes: an image the browser could not read has no natural width.
    await expect.poll(() => drawing.evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
    await shot('batch-layouts');

    await page.goto(`${baseUrl}${orderPath}`);
    await orders.getByRole('button', { name: 'Start cutting' }).click();
    await orders.getByRole('status').getByText(/is now cutting/).waitFor();
    const history = orders.locator('.timeline li').last();
    await expect.poll(() => history.innerText()).toMatch(/Cutting[\s\S]*builder@demo\.tubwright\.test/);
    // A builder sees no money: the payments area is the seller's.
    await expect.poll(() => orders.getByRole('region', { name: 'Payments' }).count()).toBe(0);
    await shot('builder-order');
    await signOut(page);
  });
});
