import type { Customer } from '@shared/schemas/customer';
import { pagedResource, type PagedFilters } from './resource';

export type CustomerListFilters = PagedFilters;

const customers = pagedResource<Customer, CustomerListFilters, 'customers'>('customers');

export const customerKeys = customers.keys;
export const customerListOptions = customers.listOptions;
export const customerDetailOptions = customers.detailOptions;
