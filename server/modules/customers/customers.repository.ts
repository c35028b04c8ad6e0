import { Op, col, fn, where as sqlWhere } from 'sequelize';
import type { PageQuery } from '../../../shared/schemas/common';
import type { CustomerInput, CustomerUpdate } from '../../../shared/schemas/customer';
import { likePattern, pageWindow } from '../../lib/paging';
import { Customer } from './customers.model';

export function listCustomers(q: PageQuery) {
  const where = q.q ? sqlWhere(fn('lower', col('name')), { [Op.like]: likePattern(q.q.toLowerCase()) }) : {};
  return Customer.findAndCountAll({ where, order: [['name', 'ASC']], ...pageWindow(q) });
}

export const findCustomer = (id: number) => Customer.findByPk(id);
export const insertCustomer = (input: CustomerInput) => Customer.create(input);
export const saveCustomer = (customer: Customer, input: CustomerUpdate) => customer.update(input);
