import { Router, type Request } from 'express';
import type { Knex } from 'knex';
import { IdParams } from '../../../../shared/api/common.js';
import { AcceptQuoteRequest, CreateQuoteRequest, QuoteListQuery, UpdateQuoteRequest, type QuoteLineInput } from '../../../../shared/api/orders.js';
import { json } from '../../../common/src/async-handler.js';
import { ApiError, ConflictError, UnprocessableError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { nowIso } from '../db/knex.js';
import { listPage } from '../lib/list.js';
import { renderPdf } from './document-pdf.js';
import { idempotent } from './idempotency.js';
import { notifyOrder, quoteMail, sendLogged, shopName } from './mail-notices.js';
import { readOrderSettings } from './order-settings.js';
import { findOrder, orderFromQuote, type DeliveryInput } from './orders-store.js';
import { priceRack } from './rack-pricing.js';
import { quoteLinkToken, quoteLinkUrl } from './quote-link-token.js';
import { findQuote, insertQuote, isoDatePlusDays, QUOTE_COLUMNS, quotesQuery, toQuoteSummary, updateDraftQuote, type QuoteItem, type ResolvedLine } from './quotes-store.js';
import { percentToBp } from './quote-totals.js';

export const QUOTE_ROLES = ['owner', 'sales'] as const;

export function actorOf(req: Request): string {
  const who = req.identity;
  return who ? who.email ?? `${who.kind}:${who.sub}` : 'system';
}

/** An animal may be sold on a quote only while the keepers offer it for sale. */
async function assertForSale(db: Knex, animalId: number, field: string): Promise<void> {
  const animal = (await db('animals').where({ id: animalId }).whereNull('deleted_at').first('code', 'status', 'for_sale')) as { code: string; status: string; for_sale: unknown } | undefined;
  if (!animal) throw new UnprocessableError(`No animal with id ${animalId} in the collection.`, field);
  if (!animal.for_sale || animal.status === 'sold' || animal.status === 'deceased') throw new UnprocessableError(`${animal.code} is not offered for sale.`, field);
}

/** Prices every line: rack lines through the saved plan or the calculator, delivery from the settings. */
async function resolveLines(deps: RecordsDeps, req: Request, lines: QuoteLineInput[], deliveryFeeCents: number): Promise<ResolvedLine[]> {
  const resolved: ResolvedLine[] = [];
  for (const [i, line] of lines.entries()) {
    if (line.kind === 'rack') {
      const priced = await priceRack(deps.db, deps.calculator, req.identity, line, `lines[${i}]`);
      resolved.push({ kind: 'rack', description: line.description ?? priced.description, planId: line.planId ?? null, spec: priced.spec, quantity: line.quantity, unitPriceCents: line.unitPriceCents ?? priced.unitPriceCents });
    } else {
      if (line.animalId !== undefined) await assertForSale(deps.db, line.animalId, `lines[${i}].animalId`);
      resolved.push({ kind: line.kind, description: line.description!, planId: null, spec: null, animalId: line.animalId ?? null, quantity: line.quantity, unitPriceCents: line.unitPriceCents ?? deliveryFeeCents });
    }
  }
  return resolved;
}

export async function acceptQuote(deps: RecordsDeps, req: Request, quoteId: number, delivery: DeliveryInput) {
  const orderId = await orderFromQuote(deps.db, quoteId, delivery, actorOf(req));
  await audit(deps.db, req.identity, 'accept', 'quote', quoteId, { orderId });
  const order = await findOrder(deps.db, orderId);
  await notifyOrder(deps.db, deps.mailer, 'order_accepted', order);
  return order;
}

async function quotePdf(deps: RecordsDeps, quote: QuoteItem): Promise<Buffer> {
  return renderPdf({
    title: `Quote ${quote.number}`,
    shop: await shopName(deps.db),
    customerName: quote.customerName,
    facts: [['Valid until', quote.validUntil], ['Status', quote.status]],
    currency: quote.currency,
    lines: quote.lines,
    totals: [
      ['Items', quote.itemsCents],
      ['Discount', -quote.discountCents],
      [`Tax (${quote.taxRatePercent} %)`, quote.taxCents],
      ['Total', quote.totalCents],
      [`Deposit (${quote.depositPercent} %)`, quote.depositCents],
    ],
    footer: quote.notes || undefined,
  });
}

export function quotesRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();
  const base = '/api/v1/quotes';

  router.get(
    base,
    allow(...QUOTE_ROLES),
    json(async (req) => {
      const query = parseOrThrow(QuoteListQuery, req.query, 'query');
      let rows = quotesQuery(db);
      if (query.status) rows = rows.where('quotes.status', query.status);
      if (query.customerId) rows = rows.where('quotes.customer_id', query.customerId);
      return listPage(rows, query, { columns: QUOTE_COLUMNS, searchColumns: ['quotes.number', 'customers.name'], defaultSort: '-createdAt', toItem: toQuoteSummary });
    }),
  );

  router.post(
    base,
    allow(...QUOTE_ROLES),
    json(async (req, res) =>
      idempotent(db, req, res, async () => {
        const body = parseOrThrow(CreateQuoteRequest, req.body);
        const customer = await db('customers').where({ id: body.customerId }).whereNull('deleted_at').first();
        if (!customer) throw new UnprocessableError(`No customer with id ${body.customerId}.`, 'customerId');
        const settings = await readOrderSettings(db);
        const lines = await resolveLines(deps, req, body.lines, settings.deliveryFeeCents);
        const id = await insertQuote(
          db,
          body.customerId,
          {
            validUntil: body.validUntil ?? isoDatePlusDays(settings.quoteValidDays),
            currency: settings.currency,
            notes: body.notes,
            rates: { taxRateBp: percentToBp(settings.taxRatePercent), discountBp: percentToBp(body.discountPercent), depositBp: percentToBp(settings.depositPercent) },
          },
          lines,
          actorOf(req),
        );
        await audit(db, req.identity, 'create', 'quote', id, { customerId: body.customerId, lines: lines.length });
        return { status: 201, body: await findQuote(db, id) };
      }),
    ),
  );

  router.get(
    `${base}/:id`,
    allow(...QUOTE_ROLES),
    json(async (req) => findQuote(db, parseOrThrow(IdParams, req.params).id)),
  );

  router.patch(
    `${base}/:id`,
    allow(...QUOTE_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdateQuoteRequest, req.body);
      const quote = await findQuote(db, id);
      if (quote.status !== 'draft') throw new ConflictError(`Quote ${quote.number} is ${quote.status}; only drafts change. Copy it into a new quote instead.`);
      const settings = await readOrderSettings(db);
      const lines: ResolvedLine[] = body.lines
        ? await resolveLines(deps, req, body.lines, settings.deliveryFeeCents)
        : quote.lines.map((l) => ({ kind: l.kind, description: l.description, planId: l.planId, spec: l.spec, quantity: l.quantity, unitPriceCents: l.unitPriceCents }));
      await updateDraftQuote(db, id, {
        validUntil: body.validUntil ?? quote.validUntil,
        currency: quote.currency,
        notes: body.notes ?? quote.notes,
        rates: {
          // The shop's current rates apply while the quote is still a draft.
          taxRateBp: percentToBp(settings.taxRatePercent),
          discountBp: percentToBp(body.discountPercent ?? quote.discountPercent),
          depositBp: percentToBp(settings.depositPercent),
        },
      }, lines);
      await audit(db, req.identity, 'update', 'quote', id, { fields: Object.keys(body) });
      return findQuote(db, id);
    }),
  );

  router.get(`${base}/:id/pdf`, allow(...QUOTE_ROLES), async (req, res) => {
    const quote = await findQuote(db, parseOrThrow(IdParams, req.params).id);
    res.type('application/pdf').setHeader('content-disposition', `inline; filename="${quote.number}.pdf"`);
    res.send(await quotePdf(deps, quote));
  });

  router.post(
    `${base}/:id/send`,
    allow(...QUOTE_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const quote = await findQuote(db, id);
      // Sending again (a lost message) is allowed until the customer decides.
      if (quote.status !== 'draft' && quote.status !== 'sent') throw new ConflictError(`Quote ${quote.number} is ${quote.status}; it cannot be sent.`);
      const customer = (await db('customers').where({ id: quote.customerId }).first()) as { email: string };
      // The link is signed over this sending's time: a newer e-mail replaces older links.
      const now = nowIso();
      const link = quoteLinkUrl(deps.publicUrl ?? 'http://127.0.0.1:4300', quoteLinkToken(deps.internalSecret, quote, now));
      const mail = quoteMail(quote, customer.email, await shopName(db), await quotePdf(deps, quote), link);
      const outcome = await sendLogged(db, deps.mailer, mail, { kind: 'quote_sent', customerId: quote.customerId, entity: 'quote', entityId: id });
      if (!outcome.sent) throw new ApiError(502, 'mail_failed', `The quote could not be e-mailed (${outcome.error}); it stays ${quote.status}.`);
      await db('quotes').where({ id }).update({ status: 'sent', sent_at: now, updated_at: now });
      await audit(db, req.identity, 'send', 'quote', id, { to: customer.email });
      return findQuote(db, id);
    }),
  );

  router.post(
    `${base}/:id/accept`,
    allow(...QUOTE_ROLES),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(AcceptQuoteRequest, req.body ?? {});
      await findQuote(db, id);
      const order = await acceptQuote(deps, req, id, body);
      res.status(201);
      return order;
    }),
  );

  router.post(
    `${base}/:id/decline`,
    allow(...QUOTE_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const quote = await findQuote(db, id);
      if (quote.status !== 'draft' && quote.status !== 'sent') throw new ConflictError(`Quote ${quote.number} is ${quote.status}; it cannot be declined.`);
      await db('quotes').where({ id }).update({ status: 'declined', decided_at: nowIso(), updated_at: nowIso() });
      await audit(db, req.identity, 'decline', 'quote', id);
      return findQuote(db, id);
    }),
  );

  return router;
}
