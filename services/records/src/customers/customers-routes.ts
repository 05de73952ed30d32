import type { Knex } from 'knex';
import { CreateCustomerRequest, Customer, CustomerListQuery, UpdateCustomerRequest } from '../../../../shared/api/customers.js';
import { resourceRoutes } from '../lib/resource-routes.js';

/** The shop's customers: owner and sales only. */
export function customersRoutes(db: Knex) {
  return resourceRoutes(db, {
    path: 'customers',
    table: 'customers',
    entity: 'customer',
    fields: Object.keys(Customer.shape),
    searchFields: ['name', 'email', 'city', 'region', 'address'],
    defaultSort: 'name',
    read: ['owner', 'sales'],
    write: ['owner', 'sales'],
    listQuery: CustomerListQuery,
    create: CreateCustomerRequest,
    update: UpdateCustomerRequest,
  });
}
