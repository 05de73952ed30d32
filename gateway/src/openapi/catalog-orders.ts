import { CustomerQuote, QuoteLinkAcceptRequest, QuoteLinkCheckout, QuoteLinkParams } from '../../../shared/api/quote-links.js';
import { IdParams } from '../../../shared/api/common.js';
import {
  AcceptQuoteRequest,
  ConfirmPaymentRequest,
  CreateOrderRequest,
  CreatePaymentRequest,
  CreateQuoteRequest,
  CreateRefundRequest,
  RefundList,
  InvoiceDetail,
  InvoiceListQuery,
  InvoicePage,
  MailLogPage,
  MailLogQuery,
  Order,
  OrderListQuery,
  OrderPage,
  OrderSettings,
  Payment,
  PaymentList,
  Quote,
  QUOTE_EXAMPLE,
  QuoteListQuery,
  QuotePage,
  StageChangeRequest,
  UpdateOrderRequest,
  UpdateOrderSettingsRequest,
  UpdateQuoteRequest,
  WebhookAck,
} from '../../../shared/api/orders.js';
import { documentRoutes } from './route-catalog.js';

const SALES = ['owner', 'sales'];
const ORDER_READERS = ['owner', 'sales', 'builder'];
const IDEMPOTENT = 'Send an `Idempotency-Key` header to retry safely: the same key and body answer the first result again; the same key with another body answers 422.';

// Routes of the orders area: quotes, orders and production, payments, invoices, mail log.
documentRoutes(
  { method: 'get', path: '/api/v1/order-settings', tag: 'orders', summary: 'Tax, deposit, delivery fee and validity settings', roles: SALES, success: { status: 200, schema: OrderSettings, description: 'Settings' } },
  { method: 'patch', path: '/api/v1/order-settings', tag: 'orders', summary: 'Change the order settings', roles: ['owner'], body: UpdateOrderSettingsRequest, bodyExample: { taxRatePercent: 6.5, depositPercent: 50 }, success: { status: 200, schema: OrderSettings, description: 'Changed' } },

  { method: 'get', path: '/api/v1/quotes', tag: 'quotes', summary: 'List quotes', roles: SALES, query: QuoteListQuery, success: { status: 200, schema: QuotePage, description: 'One page' } },
  {
    method: 'post', path: '/api/v1/quotes', tag: 'quotes', summary: 'Create a quote from lines (saved plans, rack specs, items)', roles: SALES, body: CreateQuoteRequest, bodyExample: QUOTE_EXAMPLE,
    success: { status: 201, schema: Quote, description: 'Created as a draft' }, errors: [422, 502],
    description: `Rack lines are priced by the calculator's cost model (a saved plan's last result, or the spec given). Totals are integer cents; tax and deposit are rounded half-up to the cent. ${IDEMPOTENT}`,
  },
  { method: 'get', path: '/api/v1/quotes/:id', tag: 'quotes', summary: 'Read one quote with its lines', roles: SALES, params: IdParams, success: { status: 200, schema: Quote, description: 'The quote' }, errors: [404] },
  { method: 'patch', path: '/api/v1/quotes/:id', tag: 'quotes', summary: 'Change a draft quote', roles: SALES, params: IdParams, body: UpdateQuoteRequest, success: { status: 200, schema: Quote, description: 'Changed' }, errors: [404, 409, 422] },
  { method: 'get', path: '/api/v1/quotes/:id/pdf', tag: 'quotes', summary: 'The quote as a PDF', roles: SALES, params: IdParams, success: { status: 200, description: 'application/pdf' }, errors: [404] },
  { method: 'post', path: '/api/v1/quotes/:id/send', tag: 'quotes', summary: 'E-mail the quote (text, HTML and PDF) to its customer', roles: SALES, params: IdParams, success: { status: 200, schema: Quote, description: 'Sent' }, errors: [404, 409, 502] },
  { method: 'post', path: '/api/v1/quotes/:id/accept', tag: 'quotes', summary: 'Accept a sent quote: makes its order', roles: SALES, params: IdParams, body: AcceptQuoteRequest, success: { status: 201, schema: Order, description: 'The new order, waiting for the deposit' }, errors: [404, 409] },
  { method: 'post', path: '/api/v1/quotes/:id/decline', tag: 'quotes', summary: 'Record that the customer declined', roles: SALES, params: IdParams, success: { status: 200, schema: Quote, description: 'Declined' }, errors: [404, 409] },

  { method: 'get', path: '/api/v1/orders', tag: 'orders', summary: 'List orders (the production board filters by status)', roles: ORDER_READERS, query: OrderListQuery, success: { status: 200, schema: OrderPage, description: 'One page' } },
  { method: 'post', path: '/api/v1/orders', tag: 'orders', summary: 'Make an order from a sent quote', roles: SALES, body: CreateOrderRequest, bodyExample: { quoteId: 2, deliveryMethod: 'delivery', deliveryDate: '2026-12-20', deliveryAddress: '12 Elm Row' }, success: { status: 201, schema: Order, description: 'Created' }, errors: [404, 409, 422], description: IDEMPOTENT },
  { method: 'get', path: '/api/v1/orders/:id', tag: 'orders', summary: 'Read one order with its stage timeline', roles: ORDER_READERS, params: IdParams, success: { status: 200, schema: Order, description: 'The order' }, errors: [404] },
  { method: 'patch', path: '/api/v1/orders/:id', tag: 'orders', summary: 'Change delivery details and notes', roles: SALES, params: IdParams, body: UpdateOrderRequest, success: { status: 200, schema: Order, description: 'Changed' }, errors: [404] },
  {
    method: 'post', path: '/api/v1/orders/:id/stage', tag: 'orders', summary: 'Move an order to its next stage', roles: ORDER_READERS, params: IdParams, body: StageChangeRequest, bodyExample: { stage: 'cutting', note: 'Sheets from batch 12' },
    success: { status: 200, schema: Order, description: 'Moved' }, errors: [404, 409],
    description: 'Builders enter the production stages (cutting, assembly, wiring, testing, ready); owner and sales also hand over, close and cancel. Out of order: 409 with details.allowed. Ready and hand-over e-mail the customer.',
  },

  { method: 'get', path: '/api/v1/orders/:id/payments', tag: 'payments', summary: 'Payments of an order', roles: SALES, params: IdParams, success: { status: 200, schema: PaymentList, description: 'Oldest first' }, errors: [404] },
  {
    method: 'post', path: '/api/v1/orders/:id/payments', tag: 'payments', summary: 'Ask for the deposit or the balance through the payment provider', roles: SALES, params: IdParams, body: CreatePaymentRequest, bodyExample: { kind: 'deposit' },
    success: { status: 201, schema: Payment, description: 'A pending payment: with `checkoutUrl` (via checkout) or the client secret (via card)' }, errors: [404, 409, 422, 502],
    description: `With \`via: "checkout"\` creates a hosted checkout session with the provider's SDK and answers its page (\`checkoutUrl\`) for the customer, who comes back to their quote page afterwards; with \`via: "card"\` creates a payment intent for a card taken in the shop. Either way the payment turns succeeded only when the provider's signed event arrives, never from a browser's redirect. ${IDEMPOTENT}`,
  },
  {
    method: 'post', path: '/api/v1/payments/:id/cancel', tag: 'payments', summary: 'Withdraw a payment that is not paid', roles: SALES, params: IdParams,
    success: { status: 200, schema: Payment, description: 'The payment as the provider\'s events left it (canceled)' }, errors: [404, 409, 502],
    description: 'Closes the checkout page (via checkout) or cancels the payment intent (via card) at the provider, so the order can be paid another way. 409 for a payment that succeeded or is already canceled.',
  },
  { method: 'get', path: '/api/v1/orders/:id/refunds', tag: 'payments', summary: 'Refunds of an order', roles: SALES, params: IdParams, success: { status: 200, schema: RefundList, description: 'Oldest first' }, errors: [404] },
  {
    method: 'post', path: '/api/v1/orders/:id/refunds', tag: 'payments', summary: 'Give money back through the payment provider', roles: SALES, params: IdParams, body: CreateRefundRequest,
    bodyExample: { reason: 'Order cancelled by the customer' }, success: { status: 201, schema: RefundList, description: 'The refunds asked of the provider (one per payment drawn on)' }, errors: [404, 409, 422, 502],
    description: `Spread over the order's paid payments, newest first; everything still refundable when \`amountCents\` is absent (409 naming \`amountCents\` when more is asked than is left). A refund counts on the order (paid, refunded) only when the provider's signed event says it succeeded; the customer is e-mailed then. ${IDEMPOTENT}`,
  },
  { method: 'post', path: '/api/v1/payments/:id/confirm', tag: 'payments', summary: 'Confirm a payment with a test payment method (demo)', roles: SALES, params: IdParams, body: ConfirmPaymentRequest, bodyExample: { paymentMethod: 'pm_card_visa' }, success: { status: 200, schema: Payment, description: 'The payment as the provider\'s events left it' }, errors: [404, 409, 422, 502] },
  {
    method: 'post', path: '/api/v1/payments/webhook', tag: 'payments', summary: 'The payment provider\'s signed events', roles: [],
    success: { status: 200, schema: WebhookAck, description: 'Applied, or already applied before' },
    description: 'Verified with the `stripe-signature` header over the raw body; a bad signature answers 400 and changes nothing. Each event applies once (by event id).',
  },

  { method: 'get', path: '/api/v1/invoices', tag: 'invoices', summary: 'List invoices', roles: SALES, query: InvoiceListQuery, success: { status: 200, schema: InvoicePage, description: 'One page' } },
  { method: 'get', path: '/api/v1/invoices/:id', tag: 'invoices', summary: 'Read one invoice with lines and payments', roles: SALES, params: IdParams, success: { status: 200, schema: InvoiceDetail, description: 'The invoice' }, errors: [404] },
  { method: 'get', path: '/api/v1/invoices/:id/pdf', tag: 'invoices', summary: 'The invoice as a PDF', roles: SALES, params: IdParams, success: { status: 200, description: 'application/pdf' }, errors: [404] },
  { method: 'post', path: '/api/v1/orders/:id/invoices', tag: 'invoices', summary: 'Issue the invoice of an order and e-mail it', roles: SALES, params: IdParams, success: { status: 201, schema: InvoiceDetail, description: 'Issued' }, errors: [404, 409] },

  { method: 'get', path: '/api/v1/mail-log', tag: 'mail', summary: 'What was e-mailed to customers', roles: SALES, query: MailLogQuery, success: { status: 200, schema: MailLogPage, description: 'One page' } },
);

documentRoutes(
  {
    method: 'get', path: '/api/v1/quote-links/:token', tag: 'quotes', summary: "The customer's view of a sent quote, by the link in its e-mail", roles: [], params: QuoteLinkParams,
    success: { status: 200, schema: CustomerQuote, description: 'The quote as the customer sees it' }, errors: [404],
    description: 'No account needed: the token in the link is signed by the shop and replaced when the quote is sent again.',
  },
  {
    method: 'post', path: '/api/v1/quote-links/:token/accept', tag: 'quotes', summary: 'The customer accepts the quote (makes the order)', roles: [], params: QuoteLinkParams, body: QuoteLinkAcceptRequest,
    bodyExample: { deliveryMethod: 'pickup' }, success: { status: 201, schema: CustomerQuote, description: 'Accepted; orderNumber names the new order' }, errors: [404, 409],
  },
  {
    method: 'post', path: '/api/v1/quote-links/:token/decline', tag: 'quotes', summary: 'The customer declines the quote', roles: [], params: QuoteLinkParams,
    success: { status: 200, schema: CustomerQuote, description: 'Declined' }, errors: [404, 409],
  },
  {
    method: 'post', path: '/api/v1/quote-links/:token/pay', tag: 'quotes', summary: 'The customer opens the payment page for the deposit still due', roles: [], params: QuoteLinkParams,
    success: { status: 200, schema: QuoteLinkCheckout, description: 'Where to send the customer' }, errors: [404, 409, 502],
    description: 'A hosted checkout session at the payment provider; pressing again reuses the page already opened. The deposit counts when the provider\'s signed event arrives.',
  },
);
