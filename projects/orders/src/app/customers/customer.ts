import type { z } from 'zod';
import type { Customer as CustomerSchema } from '@tubwright/shared/api/customers';

export type Customer = z.infer<typeof CustomerSchema>;
export type CustomerSource = Customer['source'];

/** How a customer first reached the shop, in plain words; mirrors CUSTOMER_SOURCES of the API (the spec checks). */
export const SOURCE_LABELS: Record<CustomerSource, string> = {
  'walk-in': 'Walked into the shop',
  'phone-or-email': 'Phone or e-mail',
  'website-widget': 'Rack sizer on the website',
  'partner-api': 'Through a partner',
  referral: 'Referred by someone',
  event: 'Reptile show or event',
  other: 'Other',
};
export const CUSTOMER_SOURCES = Object.keys(SOURCE_LABELS) as CustomerSource[];

export function sourceLabel(source: string): string {
  return (SOURCE_LABELS as Record<string, string>)[source] ?? source;
}

/** `Fresno, CA`, or whichever part is known. */
export function placeOf(customer: Pick<Customer, 'city' | 'region'>): string {
  return [customer.city, customer.region].filter((part) => part.trim()).join(', ') || '—';
}
