import { DataTypes, type CreationOptional, type NonAttribute, type Sequelize } from 'sequelize';
import { optional, required, serialId, SerialRow, timestamps, withDefault } from '../../db/columns';
import type { CapacityUnit } from '../../../shared/format/capacity';
import type { Site } from '../sites/sites.model';

export class Customer extends SerialRow<Customer> {
  declare name: string;
  declare contactName: string | null;
  declare contactEmail: string | null;
  declare contactPhone: string | null;
  declare notes: string | null;
  declare capacityUnit: CreationOptional<CapacityUnit>;
  declare sites?: NonAttribute<Site[]>;
}

export function initCustomer(sequelize: Sequelize): void {
  Customer.init(
    {
      ...serialId(),
      ...required(DataTypes.TEXT, 'name'),
      ...optional(DataTypes.TEXT, 'contactName', 'contactEmail', 'contactPhone', 'notes'),
      capacityUnit: withDefault(DataTypes.TEXT, 'us_ton'),
    ...timestamps(),
    },
    { sequelize, tableName: 'customers' },
  );
}
