import { OrderStatus, OrderStatusParams, QUOTE_REQUEST_EXAMPLE, QuoteRequestBody, QuoteRequestReceipt, WidgetSettings } from '../../../shared/api/quote-requests.js';
import { documentRoutes } from './route-catalog.js';

const REQUEST_TEXT = [
  'Turns a visitor\'s or partner\'s interest into a draft quote in the shop\'s order book: the customer is found by e-mail or created as a website lead, the rack is priced by the calculator (same spec and errors as POST /api/v1/calc/rack-plan, with fields named under `spec`, e.g. `spec.tub.height`), and the shop and the visitor are e-mailed.',
  '`consent` must be `true`. With an API key the key needs the `quote-requests` scope; the answer then carries no internal ids. `estimate` is null when the shop hides prices (widget settings).',
  'Send an `Idempotency-Key` header to retry safely: the same key and body answer the first result again (header `Idempotent-Replayed: true`) and make one lead; the same key with another body answers 422.',
].join('\n\n');

// Routes for the website widget and partners: quote requests and order status by reference.
documentRoutes(
  {
    method: 'post', path: '/api/v1/quote-requests', tag: 'quote requests', summary: 'Ask for a quote for a sized rack', description: REQUEST_TEXT,
    roles: ['integrator', 'owner', 'sales'], body: QuoteRequestBody, bodyExample: QUOTE_REQUEST_EXAMPLE,
    success: { status: 201, schema: QuoteRequestReceipt, description: 'Received: a draft quote and two e-mails' }, errors: [422, 429, 502],
  },
  {
    method: 'get', path: '/api/v1/order-status/:reference', tag: 'quote requests', summary: 'Status of a quote or order by its number',
    description: 'No names, addresses or prices beyond the deposit. With an API key (scope `order-status`) only quotes made with that key and the orders made from them are found; any other number answers 404.',
    roles: ['integrator', 'owner', 'sales'], params: OrderStatusParams,
    success: { status: 200, schema: OrderStatus, description: 'The status' }, errors: [404, 429],
  },
  {
    method: 'get', path: '/api/v1/quote-requests/settings', tag: 'quote requests', summary: 'What the widget may show visitors (for website keys)', roles: ['integrator', 'owner', 'sales'],
    success: { status: 200, schema: WidgetSettings, description: 'Settings' }, description: 'Needs the quote-requests scope. The widget hides its estimate when `showPrices` is false, whatever the page asks.',
  },
  { method: 'get', path: '/api/v1/widget-settings', tag: 'quote requests', summary: 'What the website widget and quote requests may show', roles: ['owner', 'sales'], success: { status: 200, schema: WidgetSettings, description: 'Settings' } },
  { method: 'put', path: '/api/v1/widget-settings', tag: 'quote requests', summary: 'Change the widget settings', roles: ['owner'], body: WidgetSettings, bodyExample: { showPrices: false }, success: { status: 200, schema: WidgetSettings, description: 'Changed' } },
);
