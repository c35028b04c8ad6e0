import type { Sequelize } from 'sequelize';
import { initUserInvite } from '../modules/admin/invite.model';
import { initAuditEvent } from '../modules/audit/audit-event.model';
import { Attachment, initAttachment } from '../modules/attachments/attachments.model';
import { Customer, initCustomer } from '../modules/customers/customers.model';
import { initEmailModels } from '../modules/emails/emails.model';
import { initReferenceModels } from '../modules/reference/reference.model';
import { Press, initPress } from '../modules/presses/presses.model';
import { initReportIssue } from '../modules/reports/report-issues.model';
import { Site, initSite } from '../modules/sites/sites.model';
import { User, initUser } from '../modules/users/users.model';
import { initVisitWorkModels } from '../modules/visits/visit-work.model';
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
  initReferenceModels(sequelize);
  initVisitWorkModels(sequelize);
  initAuditEvent(sequelize);
  initAttachment(sequelize);
  initUserInvite(sequelize);
  initEmailModels(sequelize);
  initReportIssue(sequelize);

  Customer.hasMany(Site, { as: 'sites', foreignKey: { name: 'customerId', allowNull: false } });
  Site.belongsTo(Customer, { as: 'customer', foreignKey: { name: 'customerId', allowNull: false } });
  Site.hasMany(Press, { as: 'presses', foreignKey: { name: 'siteId', allowNull: false } });
  Press.belongsTo(Site, { as: 'site', foreignKey: { name: 'siteId', allowNull: false } });
  Press.hasMany(Visit, { as: 'visits', foreignKey: { name: 'pressId', allowNull: false } });
  Visit.belongsTo(Press, { as: 'press', foreignKey: { name: 'pressId', allowNull: false } });
  Visit.belongsTo(User, { as: 'technician', foreignKey: { name: 'technicianId', allowNull: false } });
  Visit.hasMany(Attachment, { as: 'attachments', foreignKey: { name: 'visitId', allowNull: false } });
  Attachment.belongsTo(Visit, { as: 'visit', foreignKey: { name: 'visitId', allowNull: false } });
  Attachment.belongsTo(User, { as: 'creator', foreignKey: { name: 'createdBy', allowNull: false } });
  initialised = sequelize;
}
