import { DataTypes, type ForeignKey, type NonAttribute, type Sequelize } from 'sequelize';
import { optional, required, serialId, SerialRow, timestamps } from '../../db/columns';
import type { Customer } from '../customers/customers.model';

export class Site extends SerialRow<Site> {
  declare customerId: ForeignKey<Customer['id']>;
  declare name: string;
  declare address: string | null;
  declare city: string | null;
  declare customer?: NonAttribute<Customer>;
}

export function initSite(sequelize: Sequelize): void {
  Site.init(
    {
      ...serialId(),
      ...required(DataTypes.TEXT, 'name'),
      ...optional(DataTypes.TEXT, 'address', 'city'),
      ...timestamps(),
    },
    { sequelize, tableName: 'sites' },
  );
}
