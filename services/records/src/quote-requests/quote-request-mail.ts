import type { RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { formatInches, formatMillimetres } from '../../../../shared/units.js';
import type { OutgoingMail } from '../lib/mailer.js';
import { escapeHtml, formatCents } from '../orders/mail-notices.js';

export interface RequestFacts {
  reference: string;
  shop: string;
  visitor: { name: string; email: string; phone: string; note: string; source: string };
  rackDescription: string;
  dimensions: Pick<RackPlanResponse, 'unit' | 'dimensions'>;
  estimate: { totalCents: number; currency: string };
  /** Whether this customer was already in the book. */
  existingCustomer: boolean;
}

/** The outside size as a person reads it: fractions of an inch to 1/16, or millimetres. */
export function outsideSize({ unit, dimensions: d }: RequestFacts['dimensions']): string {
  const show = (v: number) => (unit === 'in' ? `${formatInches(v)} in` : `${formatMillimetres(v)} mm`);
  return `${show(d.overallWidth)} wide x ${show(d.overallDepth)} deep x ${show(d.overallHeight)} high`;
}

const paragraphs = (lines: string[]) => lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('\n');

/** To the shop: everything needed to call the visitor back, and where the draft is. */
export function shopNoticeMail(facts: RequestFacts, to: string): OutgoingMail {
  const v = facts.visitor;
  const lines = [
    `${v.name} <${v.email}> asked for a quote${v.source ? ` from ${v.source}` : ''} and agreed to be contacted.`,
    `Draft quote ${facts.reference} is in the order book${facts.existingCustomer ? ' under the existing customer with this e-mail address' : ' for a new lead'}.`,
    `Rack: ${facts.rackDescription}.`,
    `Outside size: ${outsideSize(facts.dimensions)}.`,
    `Estimate: ${formatCents(facts.estimate.totalCents, facts.estimate.currency)} with tax.`,
    ...(v.phone ? [`Phone: ${v.phone}`] : []),
    ...(v.note ? [`Their note: ${v.note}`] : []),
  ];
  return { to, subject: `${facts.shop}: quote request ${facts.reference} from ${v.name}`, text: lines.join('\n\n'), html: paragraphs(lines) };
}

/** To the visitor: a plain confirmation; the price only when the shop shows prices. */
export function visitorConfirmationMail(facts: RequestFacts, showPrice: boolean): OutgoingMail {
  const v = facts.visitor;
  const lines = [
    `Hello ${v.name},`,
    `Thank you for your quote request; its reference is ${facts.reference}.`,
    `The rack you sized: ${facts.rackDescription}, outside ${outsideSize(facts.dimensions)}.`,
    ...(showPrice ? [`Our first estimate is ${formatCents(facts.estimate.totalCents, facts.estimate.currency)} with tax; the quote we send you is the price that counts.`] : []),
    `We will be in touch soon to confirm the details.`,
    facts.shop,
  ];
  return { to: v.email, subject: `${facts.shop}: we received your quote request ${facts.reference}`, text: lines.join('\n\n'), html: paragraphs(lines) };
}
