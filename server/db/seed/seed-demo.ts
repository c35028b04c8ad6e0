import type { Sequelize } from 'sequelize';
import { hashPassword } from '../../auth/password';
import { Customer } from '../../modules/customers/customers.model';
import { Press } from '../../modules/presses/presses.model';
import { Site } from '../../modules/sites/sites.model';
import { User } from '../../modules/users/users.model';
import { initModels } from '../models';
import { DEMO_CUSTOMERS, DEMO_PASSWORD, DEMO_USERS } from './demo-data';

/** Seeds the invented demo scenario. Idempotent: rows that exist (by their natural keys) are left alone. */
export async function seedDemo(sequelize: Sequelize): Promise<{ created: number }> {
  initModels(sequelize);
  let created = 0;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (transaction) => {
    for (const u of DEMO_USERS) {
      const [, made] = await User.findOrCreate({ where: { email: u.email }, defaults: { ...u, passwordHash }, transaction });
      if (made) created++;
    }
    for (const { sites, ...c } of DEMO_CUSTOMERS) {
      const [customer, madeCustomer] = await Customer.findOrCreate({ where: { name: c.name }, defaults: c, transaction });
      if (madeCustomer) created++;
      for (const { presses, ...s } of sites) {
        const [site, madeSite] = await Site.findOrCreate({ where: { customerId: customer.id, name: s.name }, defaults: { ...s, customerId: customer.id }, transaction });
        if (madeSite) created++;
        for (const p of presses) {
          const [, madePress] = await Press.findOrCreate({ where: { siteId: site.id, assetTag: p.assetTag }, defaults: { ...p, siteId: site.id }, transaction });
          if (madePress) created++;
        }
      }
    }
  });
  return { created };
}
