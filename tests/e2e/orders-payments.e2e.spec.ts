import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, SCREENSHOTS, signIn, signOut } from './browser.js';

/*
 * The money and stock side of an order, on a demo quote no other browser test uses (Declan's,
 * sent and waiting): a payment link the customer pays on the provider's page, the doorway on the
 * order, stock set aside and counted by batch cutting, and cancelling with a refund.
 */
const baseUrl = inject('baseUrl');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;
let orders: Locator;
let orderPath = '';

/** The console scrolls inside its own frame, so a tall window shows the whole page. */
async function shot(name: string): Promise<void> {
  const size = page.viewportSize()!;
  await page.setViewportSize({ width: size.width, height: 1800 });
  await page.screenshot({ path: path.join(SCREENSHOTS, `orders-${name}.png`) });
  await page.setViewportSize(size);
}

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
  orders = page.locator('tw-orders');
});
afterAll(() => browser.close());

describe('payments, refunds and stock in the orders module', () => {
  it('keeps a customer’s address and how they found the shop, and finds them by street', async () => {
    await signIn(page, baseUrl, 'sales@demo.tubwright.test');
    await page.goto(`${baseUrl}/orders/customers?q=declan`);
    await orders.getByRole('link', { name: 'Declan Whitcombe' }).click();
    await orders.getByRole('link', { name: 'Edit' }).click();
    await orders.getByLabel('Address').fill('  41 Quarry Lane \n\n Stonebridge, PA 17000 ');
    await orders.getByLabel('How they found the shop').selectOption({ label: 'Referred by someone' });
    await shot('customer-form');
    await orders.getByRole('button', { name: 'Save changes' }).click();
    const contact = orders.getByRole('region', { name: 'Contact' });
    await contact.getByText('Referred by someone').waitFor();
    expect(await contact.locator('dd.notes').first().innerText()).toBe('41 Quarry Lane\nStonebridge, PA 17000');

    await page.goto(`${baseUrl}/orders/customers`);
    await orders.getByLabel('Filter by name, e-mail, place or address').fill('quarry lane');
    const rows = orders.getByRole('table', { name: 'Customers' }).locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(1);
    await rows.first().getByText('Referred by someone').waitFor();
  });

  it('sends a payment link that the customer pays on the provider’s page, and stores the doorway', async () => {
    await page.goto(`${baseUrl}/orders/quotes?status=sent&q=declan`);
    await orders.getByRole('link', { name: /^Q-\d{4}-\d{4}$/ }).first().click();
    await orders.getByRole('button', { name: 'Record acceptance' }).click();
    await orders.getByRole('button', { name: 'Make the order' }).click();
    await orders.getByRole('heading', { name: /^Order O-\d{4}-\d{4}$/ }).waitFor();
    orderPath = new URL(page.url()).pathname;

    await orders.getByRole('button', { name: 'Enter the doorway height' }).click();
    await orders.getByLabel('Customer’s doorway height').fill(`6' 8"`);
    await orders.getByText('Reads as 80 in (2032 mm)').waitFor();
    await orders.getByRole('button', { name: 'Save', exact: true }).click();
    await orders.getByText('Customer’s doorway:').waitFor();
    await orders.locator('tw-doorway-check').getByText(/through a doorway of 80 in/).first().waitFor();

    await orders.getByRole('button', { name: 'Send payment link' }).click();
    const link = orders.getByLabel('Payment page for the customer');
    await expect.poll(() => link.inputValue()).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/checkout\/cs_/);
    const payments = orders.getByRole('table', { name: 'Payments' });
    await payments.getByText('Payment link').waitFor();
    await payments.getByText('Pending').waitFor();
    await shot('payment-link');

    // The customer's side: the provider's page in a tab of its own, the test card that pays.
    const [tab] = await Promise.all([browser.context.waitForEvent('page'), orders.getByRole('link', { name: 'Open payment page' }).click()]);
    await tab.getByRole('button', { name: /^Pay \$/ }).click();
    await tab.waitForURL(/payment=received/);
    await tab.close();

    // The payment counts when the provider's signed event has arrived; the page looks again on its own or when asked.
    await orders.getByRole('button', { name: 'Check again' }).click();
    await payments.getByText('Paid', { exact: true }).waitFor({ timeout: 20_000 });
    await orders.locator('tw-page-header').getByText('Deposit paid').waitFor();
    await shot('payment-link-paid');
    await signOut(page);
  });

  it('lets the builder set stock aside for the order and plan its cutting from stock on hand', async () => {
    await signIn(page, baseUrl, 'builder@demo.tubwright.test');
    await page.goto(`${baseUrl}/orders/stock`);
    const sheets = orders.getByRole('table', { name: 'Sheets' });
    await sheets.getByText('Offcut strips').waitFor();
    await orders.getByRole('link', { name: 'Record an offcut' }).click();
    await orders.getByLabel('Length').fill('30');
    await orders.getByLabel('Width').fill('610 mm');
    await orders.getByLabel('Location').fill('offcut bin');
    await shot('stock-offcut-form');
    await orders.getByRole('button', { name: 'Record offcut' }).click();
    await sheets.getByText('30 x 24 in').waitFor();
    await shot('stock');

    await page.goto(`${baseUrl}${orderPath}`);
    const held = orders.getByRole('region', { name: 'Stock set aside' });
    await held.getByLabel('Stock item').selectOption({ label: (await held.locator('option', { hasText: 'Rigid PVC, 96 x 48 in —' }).first().innerText()).trim() });
    await held.getByLabel('Pieces for this order').fill('2');
    await held.getByRole('button', { name: 'Set aside' }).click();
    await held.getByRole('table', { name: 'Stock set aside for this order' }).getByText('Rigid PVC, 96 x 48 in').waitFor();

    const orderId = orderPath.split('/').pop();
    await page.goto(`${baseUrl}/orders/cutting?orders=${orderId}`);
    await orders.getByRole('button', { name: 'Plan cutting for 1 order' }).click();
    const plan = orders.getByRole('table', { name: 'Cutting plan' });
    await plan.waitFor({ timeout: 45_000 });
    const header = await plan.locator('thead th').allInnerTexts();
    expect(header.slice(0, 3)).toEqual(['Material', 'Used', 'Lower bound']);
    expect(header).toEqual(expect.arrayContaining(['From offcuts', 'From stock', 'To buy']));
    // Every sheet material: offcuts + stock on hand + to buy add up to what the plan uses.
    for (const row of await plan.locator('tbody tr').all()) {
      const cells = (await row.locator('td').allInnerTexts()).map((t) => t.trim());
      const n = (i: number) => (cells[i] === '—' ? 0 : Number(cells[i]));
      expect(n(4) + n(5) + n(6)).toBe(n(1));
    }
    await orders.getByRole('heading', { name: 'From stock' }).waitFor();
    await shot('batch-stock');
    await signOut(page);
  });

  it('lets sales cancel the order and refund the deposit in one go', async () => {
    await signIn(page, baseUrl, 'sales@demo.tubwright.test');
    await page.goto(`${baseUrl}${orderPath}`);
    await orders.getByRole('button', { name: 'Cancel order…' }).click();
    const dialog = orders.getByRole('group', { name: /^Cancel order O-/ });
    await dialog.getByRole('button', { name: /^Refund \$[\d,.]+ and cancel$/ }).click();
    await dialog.getByText('Give a reason for the refund').waitFor();
    await shot('refund-dialog');
    await dialog.getByLabel('Reason').fill('Customer moved away');
    await dialog.getByRole('button', { name: /^Refund \$[\d,.]+ and cancel$/ }).click();
    // Asked of the provider, then confirmed by its signed event: the notice follows.
    await orders.getByRole('status').getByText(/is cancelled\. The payment provider confirmed the refund of \$[\d,.]+\./).waitFor({ timeout: 20_000 });
    const refunds = orders.getByRole('table', { name: 'Refunds' });
    await refunds.getByText('Customer moved away').waitFor();
    await refunds.getByText('Refunded', { exact: true }).waitFor({ timeout: 20_000 });
    await orders.getByText('Paid, less refunds').waitFor();
    await orders.locator('tw-page-header').getByText('Cancelled').waitFor();
    await shot('refunded');
  });
});
