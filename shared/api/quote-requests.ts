import { z } from 'zod';
import { IsoDateTime } from './common.js';
import { ORDER_STATUSES, QUOTE_STATUSES } from './orders.js';
import { LENGTH_UNITS, RACK_PLAN_EXAMPLE, RackPlanRequest } from './rack-plan.js';

// A visitor of the shop's website (through the widget) or a partner's system asks for a quote.

export const QuoteRequestBody = z
  .object({
    name: z.string().trim().min(1, 'is required').max(160).describe('Who asks.'),
    email: z.string().trim().toLowerCase().email('must be an e-mail address').max(200).describe('Where the shop answers; an existing customer with this address gets the quote.'),
    phone: z.string().trim().max(40).default(''),
    note: z.string().trim().max(2000).default('').describe('Anything the visitor wants the shop to know.'),
    consent: z
      .literal(true, { error: 'must be true: the visitor agrees to be contacted about this request' })
      .describe('Must be literally true: the visitor agrees to be contacted about this request.'),
    spec: RackPlanRequest.describe('The rack to quote, as for POST /api/v1/calc/rack-plan.'),
    source: z.string().trim().max(300).default('').describe('Where the request came from, e.g. the page URL or the partner\'s name.'),
    unit: z.enum(LENGTH_UNITS).optional().describe('Unit of the spec when spec.unit is absent; must agree with spec.unit when both are given.'),
  })
  .strict();
export type QuoteRequestBody = z.output<typeof QuoteRequestBody>;

export const QUOTE_REQUEST_EXAMPLE = {
  name: 'Wren Talbot',
  email: 'wren.talbot@example.test',
  phone: '555-0142',
  note: 'Ball python hatchlings; I would pick up on a Saturday.',
  consent: true,
  spec: { ...RACK_PLAN_EXAMPLE, layout: { levels: 6, columns: 2, dividers: 0 } },
  source: 'https://shop.example/rack-sizer',
};

export const QuoteRequestReceipt = z
  .object({
    reference: z.string().describe('The quote number (Q-YYYY-NNNN); ask GET /api/v1/order-status/{reference} later.'),
    status: z.literal('received'),
    customerId: z.number().int().optional().describe('Only for signed-in staff; API keys do not see internal ids.'),
    quoteId: z.number().int().optional().describe('Only for signed-in staff; API keys do not see internal ids.'),
    estimate: z
      .object({
        totalCents: z.number().int().describe('Quote total with tax, in cents of the currency.'),
        currency: z.string().describe('ISO 4217, lower case.'),
      })
      .nullable()
      .describe('Null when the shop does not show prices (widget settings).'),
    dimensions: z.object({
      overallWidth: z.number(),
      overallHeight: z.number(),
      overallDepth: z.number(),
      unit: z.enum(LENGTH_UNITS),
    }).describe("The rack's outside size, in the spec's unit."),
  })
  .describe('The request is in the shop\'s order book as a draft quote; the shop and the visitor were e-mailed.');

// ---------------------------------------------------------------------------------------------
// Order status by reference (no personal data)

export const OrderStatusParams = z.object({
  reference: z
    .string()
    .regex(/^[QO]-\d{4}-\d{4,}$/, 'must be a quote or order number like Q-2026-0007 or O-2026-0003')
    .describe('A quote (Q-…) or order (O-…) number.'),
});

export const OrderStatus = z.object({
  reference: z.string(),
  kind: z.enum(['quote', 'order']),
  status: z.enum([...QUOTE_STATUSES, ...ORDER_STATUSES]).describe('Quote: draft, sent, accepted, declined, expired. Order: awaiting_deposit, then the production stages, then delivered or picked_up, closed, cancelled.'),
  updatedAt: IsoDateTime,
  orderReference: z.string().optional().describe('For an accepted quote: the order made from it.'),
  stages: z.array(z.object({ stage: z.enum(ORDER_STATUSES), at: IsoDateTime })).optional().describe('Orders: the stages entered, oldest first.'),
  deposit: z
    .object({
      dueCents: z.number().int().describe('Deposit asked, cents.'),
      paidCents: z.number().int().describe('Paid toward the order so far, cents; the deposit is in when this reaches dueCents.'),
    })
    .optional()
    .describe('Orders only.'),
});

// ---------------------------------------------------------------------------------------------
// What the widget may show

export const WidgetSettings = z
  .object({
    showPrices: z.boolean().describe('Show the estimate to website visitors and partners (default true).'),
  })
  .strict()
  .describe('Shop settings for the website widget and quote requests.');
export type WidgetSettings = z.output<typeof WidgetSettings>;
