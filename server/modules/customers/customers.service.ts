import type { PageQuery } from '../../../shared/schemas/common';
import type { Customer as CustomerDto, CustomerInput, CustomerUpdate } from '../../../shared/schemas/customer';
import { directoryService, isoTimestamps } from '../../lib/directory-service';
import type { Customer } from './customers.model';
import { findCustomer, insertCustomer, listCustomers, saveCustomer } from './customers.repository';

export function toCustomerDto(c: Customer): CustomerDto {
  return {
    id: c.id,
    name: c.name,
    contactName: c.contactName,
    contactEmail: c.contactEmail,
    contactPhone: c.contactPhone,
    notes: c.notes,
    capacityUnit: c.capacityUnit,
    ...isoTimestamps(c),
  };
}

const customers = directoryService<Customer, CustomerDto, PageQuery, CustomerInput, CustomerUpdate>({
  what: 'Customer',
  repository: { list: listCustomers, find: findCustomer, insert: insertCustomer, save: saveCustomer },
  toDto: toCustomerDto,
  messages: { unique: 'A customer with that name already exists. Search for it instead of adding it again.' },
});

export const { search: searchCustomers, get: getCustomer, create: createCustomer, update: updateCustomer } = customers;
