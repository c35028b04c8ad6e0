import { DataTypes, type NonAttribute, type Sequelize } from 'sequelize';
import { optional, required, serialId, SerialRow, timestamps } from '../../db/columns';
import type { Site } from '../sites/sites.model';

export class Customer extends SerialRow<Customer> {
  declare name: string;
  declare contactName: string | null;
  declare contactEmail: string | null;
  declare contactPhone: string | null;
  declare notes: string | null;
  declare sites?: NonAttribute<Site[]>;
}

export function initCustomer(sequelize: Sequelize): void {
  Customer.init(
    {
      ...serialId(),
      ...required(DataTypes.TEXT, 'name'),
      ...optional(DataTypes.TEXT, 'contactName', 'contactEmail', 'contactPhone', 'notes'),
      ...timestamps(),
    },
    { sequelize, tableName: 'customers' },
  );
}
