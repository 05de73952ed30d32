import { z } from 'zod';
import { IsoDate, IsoDateTime, listQuery, page } from './common.js';

// Money is integer cents everywhere; rates are percentages with at most two decimals.

const Cents = (what: string) => z.number().int().describe(`${what}, in cents of the quote's currency.`);
const Percent = (what: string) =>
  z
    .number()
    .min(0, 'must be 0 or more')
    .max(100, 'must be 100 or less')
    .refine((v) => Number.isInteger(Math.round(v * 100 * 1e6) / 1e6), 'at most two decimals')
    .describe(`${what}, percent (at most two decimals).`);

// ---------------------------------------------------------------------------------------------
// Settings

export const OrderSettings = z
  .object({
    currency: z.string().regex(/^[a-z]{3}$/, 'must be a three-letter currency code in lower case, e.g. usd').describe('ISO 4217 code, lower case.'),
    taxRatePercent: Percent('Sales tax on the taxable amount; rounded half-up to the cent (common practice)'),
    depositPercent: Percent('Deposit asked on acceptance (common practice: 50)'),
    deliveryFeeCents: z.number().int().min(0).max(10_000_000).describe('Default price of a delivery line, cents.'),
    quoteValidDays: z.number().int().min(1).max(365).describe('Days a quote stays valid by default.'),
    invoiceDueDays: z.number().int().min(0).max(365).describe('Days from issue to the due date of an invoice.'),
  })
  .strict()
  .describe('Shop settings for quotes, deposits and invoices.');
export type OrderSettings = z.output<typeof OrderSettings>;
export const UpdateOrderSettingsRequest = OrderSettings.partial().strict();

// ---------------------------------------------------------------------------------------------
// Quotes

export const QUOTE_STATUSES = ['draft', 'sent', 'accepted', 'declined', 'expired'] as const;
export const QUOTE_LINE_KINDS = ['rack', 'item', 'labor', 'delivery', 'discount'] as const;

export const QuoteLineInput = z
  .object({
    kind: z.enum(QUOTE_LINE_KINDS).describe('rack (from planId or spec), item, labor (quantity in hours), delivery, discount (subtracted).'),
    description: z.string().trim().min(1, 'is required').max(300).optional().describe('Text on the quote; a rack line describes itself when omitted.'),
    planId: z.number().int().positive().optional().describe('A saved plan to price (rack lines).'),
    spec: z.record(z.string(), z.unknown()).optional().describe('A rack-plan request to price through the calculator (rack lines); see POST /api/v1/calc/rack-plan.'),
    animalId: z.number().int().positive().optional().describe('Item lines: an animal from the collection offered for sale (quantity 1); handing the order over marks it sold.'),
    quantity: z.number().int('must be a whole number').min(1, 'must be at least 1').max(10_000).default(1).describe('How many (hours for labor).'),
    unitPriceCents: z
      .number()
      .int('must be whole cents')
      .min(0, 'must be 0 or more')
      .max(100_000_000)
      .optional()
      .describe("Price of one, cents. Rack lines default to the calculator's cost total; delivery to the shop's delivery fee."),
  })
  .strict()
  .superRefine((line, ctx) => {
    if (line.kind === 'rack') {
      if ((line.planId === undefined) === (line.spec === undefined)) ctx.addIssue({ code: 'custom', path: ['planId'], message: 'a rack line needs either planId or spec' });
      return;
    }
    if (line.planId !== undefined || line.spec !== undefined) ctx.addIssue({ code: 'custom', path: ['kind'], message: 'only rack lines take planId or spec' });
    if (line.animalId !== undefined && line.kind !== 'item') ctx.addIssue({ code: 'custom', path: ['animalId'], message: 'only item lines sell an animal' });
    if (line.animalId !== undefined && line.quantity !== 1) ctx.addIssue({ code: 'custom', path: ['quantity'], message: 'must be 1 for an animal' });
    if (line.description === undefined) ctx.addIssue({ code: 'custom', path: ['description'], message: 'is required' });
    if (line.unitPriceCents === undefined && line.kind !== 'delivery') ctx.addIssue({ code: 'custom', path: ['unitPriceCents'], message: 'is required' });
  });
export type QuoteLineInput = z.output<typeof QuoteLineInput>;

export const CreateQuoteRequest = z
  .object({
    customerId: z.number().int().positive().describe('An existing customer.'),
    lines: z.array(QuoteLineInput).min(1, 'needs at least one line').max(100),
    validUntil: IsoDate.optional().describe("Last day the quote may be accepted; defaults to today + the shop's quoteValidDays."),
    discountPercent: Percent('Discount on the items before tax').default(0),
    notes: z.string().max(4000).default(''),
  })
  .strict();
export const UpdateQuoteRequest = CreateQuoteRequest.omit({ customerId: true }).partial().strict().describe('Only draft quotes change; lines, when given, replace all lines.');

export const QUOTE_EXAMPLE = {
  customerId: 1,
  lines: [
    { kind: 'rack', planId: 1, quantity: 1 },
    { kind: 'item', description: 'Spare thermostat', quantity: 1, unitPriceCents: 4500 },
    { kind: 'delivery', description: 'Delivery within 40 miles', quantity: 1 },
  ],
  discountPercent: 0,
  notes: 'Natural PVC sides.',
};

export const QuoteLine = z.object({
  id: z.number().int(),
  position: z.number().int().describe('Order on the quote, from 1.'),
  kind: z.enum(QUOTE_LINE_KINDS),
  description: z.string(),
  planId: z.number().int().nullable(),
  spec: z.record(z.string(), z.unknown()).nullable().describe('The rack-plan request this line was priced from.'),
  animalId: z.number().int().nullable().describe('The animal this line sells, if any.'),
  quantity: z.number().int(),
  unitPriceCents: Cents('Price of one'),
  amountCents: Cents('quantity x unit price; negative for discounts'),
});

export const QuoteTotals = z.object({
  itemsCents: Cents('Sum of every line except discounts'),
  discountCents: Cents('Discount lines plus the percentage discount, capped at the items'),
  taxCents: Cents('Tax on items - discount, half-up to the cent'),
  totalCents: Cents('items - discount + tax'),
  depositCents: Cents('Deposit asked: total x deposit percent, half-up'),
});

export const QuoteSummary = z
  .object({
    id: z.number().int(),
    number: z.string().describe('Q-YYYY-NNNN'),
    customerId: z.number().int(),
    customerName: z.string(),
    status: z.enum(QUOTE_STATUSES),
    validUntil: IsoDate,
    currency: z.string(),
    taxRatePercent: z.number(),
    discountPercent: z.number(),
    depositPercent: z.number(),
    notes: z.string(),
    sentAt: IsoDateTime.nullable(),
    orderId: z.number().int().nullable().describe('The order made when the quote was accepted.'),
    createdAt: IsoDateTime,
  })
  .extend(QuoteTotals.shape);
export const Quote = QuoteSummary.extend({ lines: z.array(QuoteLine) });
export const QuotePage = page(QuoteSummary);
export const QuoteListQuery = listQuery(['number', 'status', 'validUntil', 'totalCents', 'createdAt']).extend({
  status: z.enum(QUOTE_STATUSES).optional(),
  customerId: z.coerce.number().int().positive().optional(),
});

// ---------------------------------------------------------------------------------------------
// Orders and production

/** awaiting_deposit, then the shop's stages in order; delivered or picked_up, then closed. */
export const ORDER_STATUSES = ['awaiting_deposit', 'deposit_paid', 'cutting', 'assembly', 'wiring', 'testing', 'ready', 'delivered', 'picked_up', 'closed', 'cancelled'] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];
/** Stages a builder may enter; the rest belong to owner and sales. */
export const PRODUCTION_STAGES = ['cutting', 'assembly', 'wiring', 'testing', 'ready'] as const satisfies readonly OrderStatus[];
export const DELIVERY_METHODS = ['pickup', 'delivery'] as const;

export const OrderStage = z.object({
  id: z.number().int(),
  stage: z.enum(ORDER_STATUSES),
  startedAt: IsoDateTime,
  finishedAt: IsoDateTime.nullable().describe('When the next stage began; null for the current one.'),
  by: z.string().describe('Who moved the order into this stage.'),
  note: z.string(),
});

export const OrderSummary = z.object({
  id: z.number().int(),
  number: z.string().describe('O-YYYY-NNNN'),
  quoteId: z.number().int(),
  customerId: z.number().int(),
  customerName: z.string(),
  status: z.enum(ORDER_STATUSES),
  currency: z.string(),
  totalCents: Cents('Order total'),
  depositDueCents: Cents('Deposit asked'),
  paidCents: Cents('Sum of succeeded payments'),
  balanceCents: Cents('total - paid'),
  deliveryMethod: z.enum(DELIVERY_METHODS),
  deliveryDate: IsoDate.nullable(),
  deliveryAddress: z.string(),
  doorwayHeightIn: z.number().nullable().describe('The lowest doorway on the way to the rack\'s room, in inches (25.4 mm each), as the customer measured it; the delivery check compares the tallest section with it.'),
  refundedCents: Cents('Sum of succeeded refunds'),
  notes: z.string(),
  createdAt: IsoDateTime,
  updatedAt: IsoDateTime,
});
export const OrderRack = z
  .object({
    description: z.string(),
    planId: z.number().int().nullable().describe('The saved plan the line was priced from, if any.'),
    spec: z.record(z.string(), z.unknown()).nullable().describe('The rack-plan request the line was priced from.'),
    quantity: z.number().int(),
  })
  .describe('A rack line of the accepted quote: what the shop builds.');
export const Order = OrderSummary.extend({
  stages: z.array(OrderStage).describe('Status timeline, oldest first.'),
  nextStages: z.array(z.enum(ORDER_STATUSES)).describe('Stages the order may move to now.'),
  racks: z.array(OrderRack).describe('Racks to build, from the quote (builders cannot read quotes): for batch cutting and the doorway check.'),
});
export const OrderPage = page(OrderSummary);
export const OrderListQuery = listQuery(['number', 'status', 'deliveryDate', 'totalCents', 'createdAt', 'updatedAt']).extend({
  status: z.enum(ORDER_STATUSES).optional().describe('Filter; the production board asks one stage at a time.'),
  customerId: z.coerce.number().int().positive().optional(),
});

const DoorwayHeightIn = z.number().positive('must be above 0').max(240, 'must be at most 240 in (20 ft)').nullable();
const OrderDelivery = {
  deliveryMethod: z.enum(DELIVERY_METHODS).default('pickup'),
  deliveryDate: IsoDate.nullable().optional(),
  deliveryAddress: z.string().trim().max(500).default(''),
  doorwayHeightIn: DoorwayHeightIn.optional(),
  notes: z.string().max(4000).default(''),
};
export const CreateOrderRequest = z
  .object({ quoteId: z.number().int().positive().describe('A sent quote, still valid; accepting it makes the order.'), ...OrderDelivery })
  .strict();
export const AcceptQuoteRequest = z.object(OrderDelivery).strict();
export const UpdateOrderRequest = z
  .object({
    deliveryMethod: z.enum(DELIVERY_METHODS),
    deliveryDate: IsoDate.nullable(),
    deliveryAddress: z.string().trim().max(500),
    doorwayHeightIn: DoorwayHeightIn,
    notes: z.string().max(4000),
  })
  .partial()
  .strict();
export const StageChangeRequest = z
  .object({
    stage: z.enum(ORDER_STATUSES).describe('The stage to enter; 409 lists the allowed ones when it is out of order.'),
    note: z.string().max(1000).default(''),
  })
  .strict();

// ---------------------------------------------------------------------------------------------
// Payments

export const PAYMENT_KINDS = ['deposit', 'balance'] as const;
export const PAYMENT_STATUSES = ['pending', 'succeeded', 'failed', 'canceled'] as const;
/** checkout: a payment page of the provider's that the customer opens from a link; card: a card taken in the shop. */
export const PAYMENT_VIAS = ['checkout', 'card'] as const;

export const Payment = z.object({
  id: z.number().int(),
  orderId: z.number().int(),
  kind: z.enum(PAYMENT_KINDS),
  amountCents: Cents('Amount'),
  currency: z.string(),
  status: z.enum(PAYMENT_STATUSES).describe('Changed only by the provider\'s signed events (never by a browser redirect).'),
  via: z.enum(PAYMENT_VIAS),
  providerId: z.string().nullable().describe('The provider\'s checkout session id (via checkout) or payment intent id (via card).'),
  checkoutUrl: z.string().nullable().describe('The provider\'s payment page for the customer (via checkout).'),
  refundedCents: Cents('Refunded from this payment so far'),
  clientSecret: z.string().nullable().optional().describe('For the provider\'s browser SDK; only in the answer that created the payment.'),
  failureMessage: z.string().nullable(),
  paidAt: IsoDateTime.nullable(),
  createdAt: IsoDateTime,
});
export const PaymentList = z.object({ items: z.array(Payment) });
export const CreatePaymentRequest = z
  .object({
    kind: z.enum(PAYMENT_KINDS).default('deposit').describe('deposit: the deposit still due; balance: everything still owed.'),
    via: z
      .enum(PAYMENT_VIAS)
      .default('card')
      .describe('checkout: the answer carries `checkoutUrl`, the provider\'s page where the customer pays; card: confirm with `POST /api/v1/payments/{id}/confirm`.'),
  })
  .strict();
export const ConfirmPaymentRequest = z
  .object({
    paymentMethod: z
      .string()
      .regex(/^pm_[A-Za-z0-9_]+$/, 'must be a payment method id like pm_card_visa')
      .default('pm_card_visa')
      .describe('Test method for the demo: pm_card_visa succeeds, pm_card_chargeDeclined is declined.'),
  })
  .strict();
export const REFUND_STATUSES = ['pending', 'succeeded', 'failed'] as const;
export const Refund = z.object({
  id: z.number().int(),
  orderId: z.number().int(),
  paymentId: z.number().int(),
  amountCents: Cents('Amount returned to the customer'),
  currency: z.string(),
  status: z.enum(REFUND_STATUSES).describe('Set by the provider\'s signed events.'),
  providerId: z.string().nullable(),
  reason: z.string(),
  refundedAt: IsoDateTime.nullable(),
  createdBy: z.string(),
  createdAt: IsoDateTime,
});
export const RefundList = z.object({ items: z.array(Refund) });
export const CreateRefundRequest = z
  .object({
    amountCents: z
      .number()
      .int('must be whole cents')
      .positive('must be above 0')
      .optional()
      .describe('How much to return; everything paid and not yet refunded when absent.'),
    reason: z.string().trim().min(1, 'is required').max(500),
  })
  .strict();
export const WebhookAck = z.object({ received: z.literal(true), duplicate: z.boolean().describe('True when this event had already been applied.') });

// ---------------------------------------------------------------------------------------------
// Invoices

export const INVOICE_STATUSES = ['open', 'paid', 'void'] as const;
export const Invoice = z.object({
  id: z.number().int(),
  number: z.string().describe('INV-YYYY-NNNN, without gaps within a year.'),
  orderId: z.number().int(),
  orderNumber: z.string(),
  customerName: z.string(),
  issuedOn: IsoDate,
  dueOn: IsoDate,
  currency: z.string(),
  itemsCents: Cents('Items'),
  discountCents: Cents('Discount'),
  taxCents: Cents('Tax'),
  totalCents: Cents('Total'),
  paidCents: Cents('Paid when issued (deposit)'),
  balanceCents: Cents('Balance due when issued'),
  status: z.enum(INVOICE_STATUSES),
  createdAt: IsoDateTime,
});
export const InvoiceDetail = Invoice.extend({ lines: z.array(QuoteLine), payments: z.array(Payment) });
export const InvoicePage = page(Invoice);
export const InvoiceListQuery = listQuery(['number', 'issuedOn', 'dueOn', 'totalCents', 'status']).extend({
  status: z.enum(INVOICE_STATUSES).optional(),
  orderId: z.coerce.number().int().positive().optional(),
});

// ---------------------------------------------------------------------------------------------
// Mail log

export const MAIL_KINDS = ['quote_sent', 'order_accepted', 'deposit_received', 'order_ready', 'order_delivered', 'refund_issued', 'invoice_issued', 'quote_request_received', 'quote_request_confirmation'] as const;
export const MailLogEntry = z.object({
  id: z.number().int(),
  to: z.string(),
  subject: z.string(),
  kind: z.enum(MAIL_KINDS),
  customerId: z.number().int().nullable(),
  entity: z.string().describe('quote, order or invoice.'),
  entityId: z.number().int(),
  messageId: z.string().nullable(),
  sentAt: IsoDateTime,
  status: z.enum(['sent', 'failed']),
  error: z.string().nullable(),
});
export const MailLogPage = page(MailLogEntry);
export const MailLogQuery = listQuery(['sentAt', 'kind', 'to']).extend({
  customerId: z.coerce.number().int().positive().optional(),
  entity: z.enum(['quote', 'order', 'invoice']).optional(),
  entityId: z.coerce.number().int().positive().optional(),
});
