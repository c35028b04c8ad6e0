import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { CapacityUnit } from '../../../shared/format/capacity';
import type { Site } from '../sites/sites.model';

export class Customer extends Model<InferAttributes<Customer>, InferCreationAttributes<Customer>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare contactName: string | null;
  declare contactEmail: string | null;
  declare contactPhone: string | null;
  declare notes: string | null;
  declare capacityUnit: CreationOptional<CapacityUnit>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare sites?: NonAttribute<Site[]>;
}

export function initCustomer(sequelize: Sequelize): void {
  Customer.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.TEXT, allowNull: false },
      contactName: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      contactEmail: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      contactPhone: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      notes: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      capacityUnit: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'us_ton' },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'customers' },
  );
}
