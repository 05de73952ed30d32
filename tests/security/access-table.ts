/**
 * Who may do what: the table the access tests hold the live gateway to. Written by hand from the
 * design notes' table of users (owner: everything; builder: planning and production; keeper: the
 * collection; sales: customers, quotes, orders and reading plans), not read from the code, so a
 * route that opens wider than intended fails the test. `key:<scope>` means an API key with that
 * scope; `public` means anyone, signed in or not.
 */
const O = 'owner';
const B = 'builder';
const K = 'keeper';
const S = 'sales';
const STAFF = [O, B, K, S];
const PLANNING_READ = [O, B, S];
const PLANNING_WRITE = [O, B];
const COLLECTION = [O, K];
const SALES = [O, S];

type Rule = [string, string[]];

export const ACCESS_TABLE: Rule[] = [
  ['GET /api/v1/health', ['public']],
  ['POST /api/v1/auth/login', ['public']],
  ['POST /api/v1/auth/refresh', ['public']],
  ['POST /api/v1/auth/password-reset', ['public']],
  ['POST /api/v1/auth/password-reset/confirm', ['public']],
  ['POST /api/v1/auth/logout', STAFF],
  ['GET /api/v1/auth/me', STAFF],
  ['GET /api/v1/audit-log', [O]],
  ['* /api/v1/users', [O]],
  ['* /api/v1/mail/', [O]],
  ['* /api/v1/api-keys', [O]],

  // Planning: builders plan, sales read plans to quote from them.
  ['GET /api/v1/tub-models/:id/photo', PLANNING_READ],
  ['* /api/v1/tub-models/:id/photo', PLANNING_WRITE],
  ['GET /api/v1/tub-model-photos/', PLANNING_READ],
  ['GET /api/v1/tub-models', PLANNING_READ],
  ['* /api/v1/tub-models', PLANNING_WRITE],
  ['GET /api/v1/plans', PLANNING_READ],
  ['* /api/v1/plans', PLANNING_WRITE],
  ['GET /api/v1/price-list', PLANNING_READ],
  ['PUT /api/v1/price-list', [O]],
  ['GET /api/v1/materials', PLANNING_READ],
  ['PUT /api/v1/materials/', [O]],
  ['POST /api/v1/calc/', [...PLANNING_READ, 'key:calculations']],
  // Sales explain what a pairing can produce when selling animals.
  ['POST /api/v1/genetics/', [O, K, S, 'key:calculations']],

  // The collection belongs to keepers; sales see animals (to sell them), traits and what is for sale.
  ['GET /api/v1/animals/:id/', COLLECTION],
  ['GET /api/v1/animals', [O, K, S]],
  ['* /api/v1/animals', COLLECTION],
  ['GET /api/v1/traits', [O, K, S]],
  ['* /api/v1/traits', COLLECTION],
  ['GET /api/v1/collection/for-sale', [O, K, S]],
  ['* /api/v1/collection/', COLLECTION],
  ['* /api/v1/animal-photos/', COLLECTION],
  ['* /api/v1/racks', COLLECTION],
  ['* /api/v1/tubs/', COLLECTION],
  ['* /api/v1/events/', COLLECTION],
  ['* /api/v1/event-batches/', COLLECTION],
  ['* /api/v1/feeding/', COLLECTION],
  ['* /api/v1/pairings', COLLECTION],
  ['* /api/v1/clutches', COLLECTION],
  ['* /api/v1/environment', COLLECTION],
  ['* /api/v1/environment-readings', COLLECTION],

  // Orders: sales run them; builders see orders and move them through production.
  ['* /api/v1/customers', SALES],
  ['* /api/v1/quote-links/', ['public']],
  ['* /api/v1/quotes', SALES],
  ['GET /api/v1/orders/:id/payments', SALES],
  ['GET /api/v1/orders/:id/refunds', SALES],
  ['GET /api/v1/orders', [O, S, B]],
  ['POST /api/v1/orders/:id/stage', [O, S, B]],
  ['* /api/v1/orders', SALES],
  ['GET /api/v1/stock', PLANNING_READ],
  ['* /api/v1/stock', PLANNING_WRITE],
  ['GET /api/v1/stock-reservations', PLANNING_READ],
  ['* /api/v1/stock-reservations', PLANNING_WRITE],
  ['POST /api/v1/payments/webhook', ['public']],
  ['* /api/v1/payments/', SALES],
  ['* /api/v1/invoices', SALES],
  ['* /api/v1/mail-log', SALES],
  ['GET /api/v1/order-settings', SALES],
  ['PATCH /api/v1/order-settings', [O]],
  ['GET /api/v1/widget-settings', SALES],
  ['PUT /api/v1/widget-settings', [O]],
  ['POST /api/v1/quote-requests', [...SALES, 'key:quote-requests']],
  ['GET /api/v1/quote-requests/settings', [...SALES, 'key:quote-requests']],
  ['GET /api/v1/order-status/', [...SALES, 'key:order-status']],
];

/** The first rule whose method matches and whose path is a prefix of the route's (":id/" rules need the deeper path). */
export function allowedFor(method: string, path: string): string[] | undefined {
  const rule = ACCESS_TABLE.find(([pattern]) => {
    const [m, prefix] = pattern.split(' ') as [string, string];
    if (m !== '*' && m !== method) return false;
    return path === prefix || path.startsWith(prefix.endsWith('/') ? prefix : `${prefix}/`) || path.startsWith(`${prefix}.`);
  });
  return rule?.[1];
}
