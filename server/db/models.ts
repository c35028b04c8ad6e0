import type { Sequelize } from 'sequelize';
import { Customer, initCustomer } from '../modules/customers/customers.model';
import { Press, initPress } from '../modules/presses/presses.model';
import { Site, initSite } from '../modules/sites/sites.model';
import { User, initUser } from '../modules/users/users.model';
import { Visit, initVisit } from '../modules/visits/visits.model';

let initialised: Sequelize | undefined;

/** Binds every model to one Sequelize instance and declares the associations (once per process). */
export function initModels(sequelize: Sequelize): void {
  if (initialised === sequelize) return;
  initUser(sequelize);
  initCustomer(sequelize);
  initSite(sequelize);
  initPress(sequelize);
  initVisit(sequelize);

  Customer.hasMany(Site, { as: 'sites', foreignKey: { name: 'customerId', allowNull: false } });
  Site.belongsTo(Customer, { as: 'customer', foreignKey: { name: 'customerId', allowNull: false } });
  Site.hasMany(Press, { as: 'presses', foreignKey: { name: 'siteId', allowNull: false } });
  Press.belongsTo(Site, { as: 'site', foreignKey: { name: 'siteId', allowNull: false } });
  Press.hasMany(Visit, { as: 'visits', foreignKey: { name: 'pressId', allowNull: false } });
  Visit.belongsTo(Press, { as: 'press', foreignKey: { name: 'pressId', allowNull: false } });
  Visit.belongsTo(User, { as: 'technician', foreignKey: { name: 'technicianId', allowNull: false } });
  initialised = sequelize;
}
