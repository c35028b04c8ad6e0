import { Op, col, fn, where as sqlWhere } from 'sequelize';
import type { PageQuery } from '../../../shared/schemas/common';
import type { CustomerInput, CustomerUpdate } from '../../../shared/schemas/customer';
import { likePattern, pageWindow } from '../../lib/paging';
import { convertCapacity } from '../../../shared/format/capacity';
import { Customer } from './customers.model';

export function listCustomers(q: PageQuery) {
  const where = q.q ? sqlWhere(fn('lower', col('name')), { [Op.like]: likePattern(q.q.toLowerCase()) }) : {};
  return Customer.findAndCountAll({ where, order: [['name', 'ASC']], ...pageWindow(q) });
}

export const findCustomer = (id: number) => Customer.findByPk(id);
export const insertCustomer = (input: CustomerInput) => Customer.create(input);
/**
 * Saves a customer. A new capacity unit converts the capacity of every press of the customer in the
 * same transaction (exactly, then to the nearest whole unit, as a nameplate rating is written), so no
 * press is ever read in the wrong unit.
 */
export async function saveCustomer(customer: Customer, input: CustomerUpdate) {
  const from = customer.capacityUnit;
  const to = input.capacityUnit;
  return Customer.sequelize!.transaction(async (transaction) => {
    if (to && to !== from) {
      await Customer.sequelize!.query(
        `UPDATE presses p SET tonnage = GREATEST(1, round(p.tonnage * :factor)), updated_at = now() FROM sites s WHERE p.site_id = s.id AND s.customer_id = :id`,
        { replacements: { factor: convertCapacity(1, from, to), id: customer.id }, transaction },
      );
    }
    return customer.update(input, { transaction });
  });
}
