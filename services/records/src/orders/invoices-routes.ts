import { Router } from 'express';
import type { Knex } from 'knex';
import type { z } from 'zod';
import { IdParams } from '../../../../shared/api/common.js';
import type { Invoice, InvoiceDetail } from '../../../../shared/api/orders.js';
import { InvoiceListQuery } from '../../../../shared/api/orders.js';
import { json } from '../../../common/src/async-handler.js';
import { ConflictError, NotFoundError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { insertId, nowIso } from '../db/knex.js';
import { listPage } from '../lib/list.js';
import { renderPdf } from './document-pdf.js';
import { escapeHtml, formatCents, sendLogged, shopName } from './mail-notices.js';
import { nextNumber } from './numbering.js';
import { readOrderSettings } from './order-settings.js';
import { findOrder, orderPayments } from './orders-store.js';
import { isoDatePlusDays, quoteLines, todayIso } from './quotes-store.js';

export const INVOICE_ROLES = ['owner', 'sales'] as const;
type InvoiceItem = z.output<typeof Invoice>;
type InvoiceDetailItem = z.output<typeof InvoiceDetail>;

const COLUMNS: Record<string, string> = {
  number: 'invoices.number',
  issuedOn: 'invoices.issued_on',
  dueOn: 'invoices.due_on',
  totalCents: 'invoices.total_cents',
  status: 'invoices.status',
};

function invoicesQuery(db: Knex): Knex.QueryBuilder {
  return db('invoices')
    .join('orders', 'orders.id', 'invoices.order_id')
    .join('customers', 'customers.id', 'orders.customer_id')
    .select('invoices.*', 'orders.number as order_number', 'customers.name as customer_name');
}

function toInvoice(row: Record<string, any>): InvoiceItem {
  return {
    id: row.id,
    number: row.number,
    orderId: row.order_id,
    orderNumber: row.order_number,
    customerName: row.customer_name,
    issuedOn: row.issued_on,
    dueOn: row.due_on,
    currency: row.currency,
    itemsCents: row.items_cents,
    discountCents: row.discount_cents,
    taxCents: row.tax_cents,
    totalCents: row.total_cents,
    paidCents: row.paid_cents,
    balanceCents: row.balance_cents,
    status: row.status,
    createdAt: row.created_at,
  };
}

async function findInvoice(db: Knex, id: number): Promise<InvoiceDetailItem> {
  const row = await invoicesQuery(db).where('invoices.id', id).first();
  if (!row) throw new NotFoundError(`No invoice with id ${id}.`);
  const order = await db('orders').where({ id: row.order_id }).first();
  return { ...toInvoice(row), lines: await quoteLines(db, order.quote_id), payments: (await orderPayments(db, row.order_id)).filter((p) => p.status === 'succeeded') };
}

async function invoicePdf(db: Knex, invoice: InvoiceDetailItem): Promise<Buffer> {
  return renderPdf({
    title: `Invoice ${invoice.number}`,
    shop: await shopName(db),
    customerName: invoice.customerName,
    facts: [['Order', invoice.orderNumber], ['Issued', invoice.issuedOn], ['Due', invoice.dueOn]],
    currency: invoice.currency,
    lines: invoice.lines,
    totals: [
      ['Items', invoice.itemsCents],
      ['Discount', -invoice.discountCents],
      ['Tax', invoice.taxCents],
      ['Total', invoice.totalCents],
      ['Paid', -invoice.paidCents],
      ['Balance due', invoice.balanceCents],
    ],
  });
}

/** Invoices: numbered without gaps per year, with the balance after the deposit. */
export function invoicesRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();

  router.get(
    '/api/v1/invoices',
    allow(...INVOICE_ROLES),
    json(async (req) => {
      const query = parseOrThrow(InvoiceListQuery, req.query, 'query');
      let rows = invoicesQuery(db);
      if (query.status) rows = rows.where('invoices.status', query.status);
      if (query.orderId) rows = rows.where('invoices.order_id', query.orderId);
      return listPage(rows, query, { columns: COLUMNS, searchColumns: ['invoices.number', 'orders.number', 'customers.name'], defaultSort: '-number', toItem: toInvoice });
    }),
  );

  router.get(
    '/api/v1/invoices/:id',
    allow(...INVOICE_ROLES),
    json(async (req) => findInvoice(db, parseOrThrow(IdParams, req.params).id)),
  );

  router.get('/api/v1/invoices/:id/pdf', allow(...INVOICE_ROLES), async (req, res) => {
    const invoice = await findInvoice(db, parseOrThrow(IdParams, req.params).id);
    res.type('application/pdf').setHeader('content-disposition', `inline; filename="${invoice.number}.pdf"`);
    res.send(await invoicePdf(db, invoice));
  });

  router.post(
    '/api/v1/orders/:id/invoices',
    allow(...INVOICE_ROLES),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const order = await findOrder(db, id);
      if (order.status === 'cancelled') throw new ConflictError(`Order ${order.number} is cancelled.`);
      const settings = await readOrderSettings(db);
      const invoiceId = await db.transaction(async (trx) => {
        const existing = await trx('invoices').where({ order_id: id }).whereNot({ status: 'void' }).first();
        if (existing) throw new ConflictError(`Order ${order.number} already has invoice ${existing.number}.`);
        const quote = await trx('quotes').where({ id: order.quoteId }).first();
        const now = nowIso();
        const number = await nextNumber(trx, 'invoices', 'INV', new Date(now).getUTCFullYear());
        const newId = await insertId(trx('invoices'), {
          number,
          order_id: id,
          issued_on: todayIso(),
          due_on: isoDatePlusDays(settings.invoiceDueDays),
          currency: order.currency,
          items_cents: quote.items_cents,
          discount_cents: quote.discount_cents,
          tax_cents: quote.tax_cents,
          total_cents: order.totalCents,
          paid_cents: order.paidCents,
          balance_cents: order.balanceCents,
          status: order.balanceCents === 0 ? 'paid' : 'open',
          created_at: now,
          updated_at: now,
        });
        return newId!;
      });
      await audit(db, req.identity, 'create', 'invoice', invoiceId, { orderId: id });
      const invoice = await findInvoice(db, invoiceId);
      const customer = (await db('customers').where({ id: order.customerId }).first()) as { email: string };
      const shop = await shopName(db);
      const body = `Invoice ${invoice.number} for order ${order.number}: total ${formatCents(invoice.totalCents, invoice.currency)}, paid ${formatCents(invoice.paidCents, invoice.currency)}, balance due ${formatCents(invoice.balanceCents, invoice.currency)} by ${invoice.dueOn}.`;
      await sendLogged(
        db,
        deps.mailer,
        { to: customer.email, subject: `${shop}: invoice ${invoice.number}`, text: `Hello ${order.customerName},\n\n${body}\n\n${shop}`, html: `<p>Hello ${escapeHtml(order.customerName)},</p><p>${escapeHtml(body)}</p>`, attachments: [{ filename: `${invoice.number}.pdf`, content: await invoicePdf(db, invoice), contentType: 'application/pdf' }] },
        { kind: 'invoice_issued', customerId: order.customerId, entity: 'invoice', entityId: invoiceId },
      );
      res.status(201);
      return invoice;
    }),
  );

  return router;
}
