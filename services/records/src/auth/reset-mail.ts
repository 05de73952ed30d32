import type { OutgoingMail } from '../lib/mailer.js';
import { escapeHtml } from '../orders/mail-notices.js';

export function resetMail(name: string, to: string, url: string, shop: string, ttlMinutes: number): OutgoingMail {
  const lines = [
    `Hello ${name},`,
    '',
    `Someone (we hope you) asked to reset the password of your ${shop} console account.`,
    `Choose a new password here within ${ttlMinutes} minutes; the link works once:`,
    url,
    '',
    'If you did not ask for this, ignore this message: your password stays as it is.',
  ];
  return {
    to,
    subject: `${shop}: reset your password`,
    text: lines.join('\n'),
    html: lines.map((l) => (l === url ? `<p><a href="${escapeHtml(url)}">Choose a new password</a></p>` : `<p>${escapeHtml(l)}</p>`)).join(''),
  };
}
