import { z } from 'zod';
import { IsoDate } from './common.js';
import { AcceptQuoteRequest, ORDER_STATUSES, QUOTE_STATUSES } from './orders.js';

/** The customer's link: the quote's number and a signature, so nobody reaches a quote by guessing. */
export const QuoteLinkParams = z.object({ token: z.string().regex(/^Q-\d{4}-\d{4,}\.[\w-]{20,64}$/, 'is not a quote link') }).strict();

const cents = () => z.number().int();

/** What the customer sees: the offer, not the shop's internal ids or notes. */
export const CustomerQuote = z.object({
  number: z.string(),
  shop: z.string(),
  customerName: z.string(),
  status: z.enum(QUOTE_STATUSES),
  validUntil: IsoDate,
  currency: z.string(),
  lines: z.array(z.object({ description: z.string(), quantity: z.number(), unitPriceCents: cents(), amountCents: cents() })),
  itemsCents: cents(),
  discountCents: cents(),
  taxCents: cents(),
  totalCents: cents(),
  depositCents: cents(),
  orderNumber: z.string().nullable().describe('Once accepted, the order it became.'),
  orderStatus: z.enum(ORDER_STATUSES).nullable(),
  paidCents: cents().describe('Paid on the order so far, as the provider\'s events have reported it.'),
  depositDueNowCents: cents().describe('The deposit still to pay before the shop starts; 0 when paid or before acceptance.'),
});

export const QuoteLinkCheckout = z.object({ checkoutUrl: z.string().describe('The provider\'s payment page for the deposit still due.') });

export const QuoteLinkAcceptRequest = AcceptQuoteRequest;
