/** Test cards the stand-in's page offers; nothing else is accepted, so no real card number is ever typed here. */
export const TEST_CARDS = [
  { number: '4242424242424242', label: 'Test card ending 4242 (pays)', method: 'pm_card_visa', succeeds: true },
  { number: '4000000000000002', label: 'Test card ending 0002 (declined)', method: 'pm_card_chargeDeclined', succeeds: false },
] as const;

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function money(cents: number, currency: string): string {
  return new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase() }).format(cents / 100);
}

/** The page a customer pays on; `session` null is an unknown or mistyped link. */
export function checkoutPage(session: Record<string, unknown> | null, problem?: string): string {
  const body = !session
    ? '<h1>Payment page not found</h1><p>This link is not known here. Ask the shop for a new one.</p>'
    : session.status !== 'open'
      ? `<h1>Already ${session.status === 'complete' ? 'paid' : 'closed'}</h1><p>${escapeHtml(String(session.description ?? 'This payment'))} needs nothing more from you.</p>${problem ? `<p role="alert">${escapeHtml(problem)}</p>` : ''}`
      : `<h1>${escapeHtml(String(session.description ?? 'Payment'))}</h1>
<p class="amount">${money(Number(session.amount_total), String(session.currency))}</p>
${problem ? `<p role="alert" class="problem">${escapeHtml(problem)}</p>` : ''}
<form method="post" action="/checkout/${encodeURIComponent(String(session.id))}/pay">
  <fieldset><legend>Card (local test payments: no real card is charged)</legend>
  ${TEST_CARDS.map((c, i) => `<label><input type="radio" name="card" value="${c.number}"${i === 0 ? ' checked' : ''}> ${escapeHtml(c.label)}</label>`).join('\n  ')}
  </fieldset>
  <button type="submit">Pay ${money(Number(session.amount_total), String(session.currency))}</button>
</form>
<p><a href="${escapeHtml(String(session.cancel_url))}">Cancel and go back</a></p>`;
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Pay securely (local test payments)</title>
<style>
  body { font: 16px/1.5 system-ui, sans-serif; max-width: 28rem; margin: 3rem auto; padding: 0 1rem; color: #1d2321; }
  .amount { font-size: 2rem; font-weight: 600; margin: .5rem 0 1.5rem; }
  fieldset { border: 1px solid #c4ccc8; border-radius: 8px; padding: 1rem; display: grid; gap: .5rem; }
  button { margin-top: 1rem; width: 100%; padding: .75rem; font-size: 1rem; border: 0; border-radius: 8px; background: #2f5d50; color: #fff; cursor: pointer; }
  button:focus-visible, a:focus-visible, input:focus-visible { outline: 3px solid #e0a526; outline-offset: 2px; }
  .problem { color: #8a1c1c; font-weight: 600; }
  .banner { font-size: .85rem; background: #fff4d6; padding: .5rem .75rem; border-radius: 6px; }
</style></head>
<body><p class="banner">Local payment stand-in for development and tests.</p>${body}</body></html>`;
}
