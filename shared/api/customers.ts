import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';

export const Customer = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  phone: z.string(),
  city: z.string(),
  region: z.string(),
  notes: z.string(),
  createdAt: IsoDateTime,
});

export const CustomerListQuery = listQuery(['name', 'email', 'city', 'region', 'createdAt']);
export const CustomerPage = page(Customer);

export const CreateCustomerRequest = z
  .object({
    name: z.string().trim().min(1, 'is required').max(160),
    email: z.string().trim().toLowerCase().email('must be an e-mail address').max(200),
    phone: z.string().trim().max(40).default(''),
    city: z.string().trim().max(120).default(''),
    region: z.string().trim().max(120).default(''),
    notes: z.string().max(4000).default(''),
  })
  .strict();
export const UpdateCustomerRequest = CreateCustomerRequest.partial().strict();
