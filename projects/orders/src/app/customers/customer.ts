import type { z } from 'zod';
import type { Customer as CustomerSchema } from '@tubwright/shared/api/customers';

export type Customer = z.infer<typeof CustomerSchema>;

/** `Fresno, CA`, or whichever part is known. */
export function placeOf(customer: Pick<Customer, 'city' | 'region'>): string {
  return [customer.city, customer.region].filter((part) => part.trim()).join(', ') || '—';
}
