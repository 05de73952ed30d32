import type { z } from 'zod';
import type { MailMessage as MailMessageSchema, MailSummary as MailSummarySchema } from '@tubwright/shared/api/mail';

export type MailSummary = z.infer<typeof MailSummarySchema>;
export type MailMessage = z.infer<typeof MailMessageSchema>;

/** Recipients may come as a list or one string, depending on the catcher. */
export function recipients(to: string[] | string): string {
  return Array.isArray(to) ? to.join(', ') : to;
}
