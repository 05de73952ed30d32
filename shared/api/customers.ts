import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';

/** How a customer first reached the shop; widget and partner leads are marked by the service itself. */
export const CUSTOMER_SOURCES = ['walk-in', 'phone-or-email', 'website-widget', 'partner-api', 'referral', 'event', 'other'] as const;

export const Customer = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  phone: z.string(),
  city: z.string(),
  region: z.string(),
  address: z.string().describe('Street address for delivery and invoices, as the customer writes it.'),
  source: z.enum(CUSTOMER_SOURCES),
  notes: z.string(),
  createdAt: IsoDateTime,
});

export const CustomerListQuery = listQuery(['name', 'email', 'city', 'region', 'source', 'createdAt']);
export const CustomerPage = page(Customer);

export const CreateCustomerRequest = z
  .object({
    name: z.string().trim().min(1, 'is required').max(160),
    email: z.string().trim().toLowerCase().email('must be an e-mail address').max(200),
    phone: z.string().trim().max(40).default(''),
    city: z.string().trim().max(120).default(''),
    region: z.string().trim().max(120).default(''),
    address: z.string().trim().max(500).default(''),
    source: z.enum(CUSTOMER_SOURCES).default('walk-in'),
    notes: z.string().max(4000).default(''),
  })
  .strict();
export const UpdateCustomerRequest = CreateCustomerRequest.partial().strict();
