import type { Knex } from 'knex';
import type { MAIL_KINDS } from '../../../../shared/api/orders.js';
import { nowIso } from '../db/knex.js';
import type { Mailer, OutgoingMail } from '../lib/mailer.js';
import type { OrderItem } from './orders-store.js';
import type { QuoteItem } from './quotes-store.js';

type MailKind = (typeof MAIL_KINDS)[number];

export function formatCents(cents: number, currency: string): string {
  return new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase() }).format(cents / 100);
}

export const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export async function shopName(db: Knex): Promise<string> {
  const row = (await db('settings').where({ key: 'shop' }).first()) as { value_json: string } | undefined;
  const name = row ? (JSON.parse(row.value_json) as { name?: unknown }).name : undefined;
  return typeof name === 'string' && name ? name : 'Our rack shop';
}

export interface Notice {
  kind: MailKind;
  customerId: number | null;
  entity: 'quote' | 'order' | 'invoice';
  entityId: number;
}

/**
 * Sends through SMTP and writes mail_log either way. A failed send is logged, not thrown: the
 * business change it reports has already happened, and the log shows what to resend.
 */
export async function sendLogged(db: Knex, mailer: Mailer, mail: OutgoingMail, notice: Notice): Promise<{ sent: boolean; error?: string }> {
  let messageId: string | null = null;
  let error: string | null = null;
  try {
    messageId = (await mailer.send(mail)).messageId;
  } catch (err) {
    error = (err as Error).message.slice(0, 500);
  }
  const now = nowIso();
  await db('mail_log').insert({
    to: Array.isArray(mail.to) ? mail.to.join(', ') : mail.to,
    subject: mail.subject,
    kind: notice.kind,
    customer_id: notice.customerId,
    entity: notice.entity,
    entity_id: notice.entityId,
    message_id: messageId,
    sent_at: now,
    status: error ? 'failed' : 'sent',
    error,
    created_at: now,
    updated_at: now,
  });
  return error ? { sent: false, error } : { sent: true };
}

/** The quote as text and HTML: every line, the totals and the deposit asked. */
/** `link` is the customer's page to accept or decline without an account. */
export function quoteMail(quote: QuoteItem, to: string, shop: string, pdf: Buffer | null, link?: string): OutgoingMail {
  const money = (c: number) => formatCents(c, quote.currency);
  const subject = `${shop}: quote ${quote.number}`;
  const totals: [string, number][] = [
    ['Items', quote.itemsCents],
    ...(quote.discountCents ? ([['Discount', -quote.discountCents]] as [string, number][]) : []),
    [`Tax (${quote.taxRatePercent} %)`, quote.taxCents],
    ['Total', quote.totalCents],
    [`Deposit to start (${quote.depositPercent} %)`, quote.depositCents],
  ];
  const text = [
    `Hello ${quote.customerName},`,
    '',
    `Here is quote ${quote.number}, valid until ${quote.validUntil}.`,
    '',
    ...quote.lines.map((l) => `${l.quantity} x ${l.description}: ${money(l.amountCents)}`),
    '',
    ...totals.map(([label, c]) => `${label}: ${money(c)}`),
    ...(quote.notes ? ['', quote.notes] : []),
    '',
    ...(link ? [`Accept or decline it here: ${link}`, ''] : []),
    `Reply to this message to change anything.`,
    shop,
  ].join('\n');
  const row = (cells: string[], tag = 'td') => `<tr>${cells.map((c, i) => `<${tag}${i > 0 ? ' style="text-align:right"' : ''}>${c}</${tag}>`).join('')}</tr>`;
  const html = [
    `<p>Hello ${escapeHtml(quote.customerName)},</p>`,
    `<p>Here is quote <strong>${escapeHtml(quote.number)}</strong>, valid until ${escapeHtml(quote.validUntil)}.</p>`,
    '<table cellpadding="4" style="border-collapse:collapse">',
    row(['Item', 'Qty', 'Amount'], 'th'),
    ...quote.lines.map((l) => row([escapeHtml(l.description), String(l.quantity), money(l.amountCents)])),
    ...totals.map(([label, c]) => row([`<strong>${escapeHtml(label)}</strong>`, '', money(c)])),
    '</table>',
    ...(quote.notes ? [`<p>${escapeHtml(quote.notes)}</p>`] : []),
    ...(link ? [`<p><a href="${escapeHtml(link)}">Accept or decline the quote</a></p>`] : []),
    `<p>Reply to this message to change anything.</p><p>${escapeHtml(shop)}</p>`,
  ].join('\n');
  return {
    to,
    subject,
    text,
    html,
    ...(pdf && { attachments: [{ filename: `${quote.number}.pdf`, content: pdf, contentType: 'application/pdf' }] }),
  };
}

const ORDER_NOTICE_TEXT: Record<'order_accepted' | 'deposit_received' | 'order_ready' | 'order_delivered' | 'refund_issued', (o: OrderItem) => { subject: string; body: string }> = {
  order_accepted: (o) => ({
    subject: `order ${o.number} confirmed`,
    body: `Thank you: your order ${o.number} is confirmed. We start cutting once the deposit of ${formatCents(o.depositDueCents, o.currency)} is received.`,
  }),
  deposit_received: (o) => ({
    subject: `deposit received for ${o.number}`,
    body: `We received your deposit for order ${o.number}; it is now in our production queue. Balance still due: ${formatCents(o.balanceCents, o.currency)}.`,
  }),
  order_ready: (o) => ({
    subject: `order ${o.number} is ready`,
    body:
      o.deliveryMethod === 'delivery'
        ? `Your order ${o.number} is built and tested, ready for delivery${o.deliveryDate ? ` on ${o.deliveryDate}` : ''}. Balance due: ${formatCents(o.balanceCents, o.currency)}.`
        : `Your order ${o.number} is built and tested, ready for pickup. Balance due at pickup: ${formatCents(o.balanceCents, o.currency)}.`,
  }),
  order_delivered: (o) => ({
    subject: `order ${o.number} handed over`,
    body: `Your order ${o.number} has been handed over. Thank you for your business.`,
  }),
  refund_issued: (o) => ({
    subject: `refund for ${o.number}`,
    body: `We have refunded ${formatCents(o.refundedCents, o.currency)} in all for order ${o.number} to the card you paid with. Card issuers usually show it within 5 to 10 business days.`,
  }),
};

export function orderMail(kind: keyof typeof ORDER_NOTICE_TEXT, order: OrderItem, to: string, shop: string): OutgoingMail {
  const { subject, body } = ORDER_NOTICE_TEXT[kind](order);
  return {
    to,
    subject: `${shop}: ${subject}`,
    text: `Hello ${order.customerName},\n\n${body}\n\n${shop}`,
    html: `<p>Hello ${escapeHtml(order.customerName)},</p><p>${escapeHtml(body)}</p><p>${escapeHtml(shop)}</p>`,
  };
}

/** Sends one of the order notices to the order's customer. */
export async function notifyOrder(db: Knex, mailer: Mailer, kind: keyof typeof ORDER_NOTICE_TEXT, order: OrderItem) {
  const customer = (await db('customers').where({ id: order.customerId }).first()) as { email: string } | undefined;
  if (!customer) return { sent: false, error: 'customer not found' };
  return sendLogged(db, mailer, orderMail(kind, order, customer.email, await shopName(db)), { kind, customerId: order.customerId, entity: 'order', entityId: order.id });
}
