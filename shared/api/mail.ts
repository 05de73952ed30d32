import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';

export const MailSummary = z.object({
  id: z.number().int(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  receivedAt: IsoDateTime,
});
export const MailMessage = MailSummary.extend({ text: z.string(), html: z.string().nullable() });
export const MailListQuery = listQuery(['receivedAt', 'subject']);
export const MailPage = page(MailSummary);
