import type { Page, PageQuery } from '../../../shared/schemas/common';
import type { Customer as CustomerDto, CustomerInput, CustomerUpdate } from '../../../shared/schemas/customer';
import { withConstraintMessages } from '../../lib/db-errors';
import { notFound } from '../../lib/errors';
import { toPage } from '../../lib/paging';
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
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
  };
}

const DUPLICATE = 'A customer with that name already exists. Search for it instead of adding it again.';

export async function searchCustomers(q: PageQuery): Promise<Page<CustomerDto>> {
  const { rows, count } = await listCustomers(q);
  return toPage(rows.map(toCustomerDto), count, q);
}

export async function getCustomer(id: number): Promise<CustomerDto> {
  const customer = await findCustomer(id);
  if (!customer) throw notFound(`Customer ${id}`);
  return toCustomerDto(customer);
}

export async function createCustomer(input: CustomerInput): Promise<CustomerDto> {
  return toCustomerDto(await withConstraintMessages(() => insertCustomer(input), { unique: DUPLICATE }));
}

export async function updateCustomer(id: number, input: CustomerUpdate): Promise<CustomerDto> {
  const customer = await findCustomer(id);
  if (!customer) throw notFound(`Customer ${id}`);
  return toCustomerDto(await withConstraintMessages(() => saveCustomer(customer, input), { unique: DUPLICATE }));
}
