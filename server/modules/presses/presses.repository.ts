import { Op, col, fn, where as sqlWhere, type WhereOptions } from 'sequelize';
import type { PressInput, PressListQuery, PressUpdate } from '../../../shared/schemas/press';
import { likePattern, pageWindow } from '../../lib/paging';
import { Customer } from '../customers/customers.model';
import { Site } from '../sites/sites.model';
import { Press } from './presses.model';

const withSiteAndCustomer = {
  model: Site,
  as: 'site',
  attributes: ['id', 'name', 'customerId'],
  include: [{ model: Customer, as: 'customer', attributes: ['id', 'name', 'capacityUnit'] }],
};

/** Free text matches asset tag, model, site or customer name: what a technician reads off the press or the work order. */
export function listPresses(q: PressListQuery) {
  const where: WhereOptions[] = [];
  if (q.siteId) where.push({ siteId: q.siteId });
  if (q.customerId) where.push({ '$site.customer_id$': q.customerId });
  if (q.q) {
    const pattern = likePattern(q.q.toLowerCase());
    where.push({
      [Op.or]: [
        sqlWhere(fn('lower', col('Press.asset_tag')), { [Op.like]: pattern }),
        sqlWhere(fn('lower', col('Press.model')), { [Op.like]: pattern }),
        sqlWhere(fn('lower', col('site.name')), { [Op.like]: pattern }),
        sqlWhere(fn('lower', col('site->customer.name')), { [Op.like]: pattern }),
      ],
    });
  }
  return Press.findAndCountAll({
    where: { [Op.and]: where },
    include: [withSiteAndCustomer],
    order: [['assetTag', 'ASC'], ['id', 'ASC']],
    subQuery: false,
    ...pageWindow(q),
  });
}

export const findPress = (id: number) => Press.findByPk(id, { include: [withSiteAndCustomer] });
export const insertPress = (input: PressInput) => Press.create(input);
export const savePress = (press: Press, input: PressUpdate) => press.update(input);
