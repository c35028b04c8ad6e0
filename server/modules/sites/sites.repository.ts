import { Op, col, fn, where as sqlWhere, type WhereOptions } from 'sequelize';
import type { SiteInput, SiteListQuery, SiteUpdate } from '../../../shared/schemas/site';
import { likePattern, pageWindow } from '../../lib/paging';
import { Customer } from '../customers/customers.model';
import { Site } from './sites.model';

const withCustomer = { model: Customer, as: 'customer', attributes: ['id', 'name', 'capacityUnit'] };

export function listSites(q: SiteListQuery) {
  const where: WhereOptions[] = [];
  if (q.customerId) where.push({ customerId: q.customerId });
  if (q.q) where.push(sqlWhere(fn('lower', col('Site.name')), { [Op.like]: likePattern(q.q.toLowerCase()) }));
  return Site.findAndCountAll({ where: { [Op.and]: where }, include: [withCustomer], order: [['name', 'ASC']], ...pageWindow(q) });
}

export const findSite = (id: number) => Site.findByPk(id, { include: [withCustomer] });
export const insertSite = (input: SiteInput) => Site.create(input);
export const saveSite = (site: Site, input: SiteUpdate) => site.update(input);
