import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Site } from '../sites/sites.model';

export class Press extends Model<InferAttributes<Press>, InferCreationAttributes<Press>> {
  declare id: CreationOptional<number>;
  declare siteId: ForeignKey<Site['id']>;
  declare assetTag: string;
  declare model: string;
  declare tonnage: number;
  declare controlModel: string | null;
  declare sensorGeneration: string | null;
  declare controlFirmware: string | null;
  declare monitorFirmware: string | null;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare site?: NonAttribute<Site>;
}

export function initPress(sequelize: Sequelize): void {
  // A fresh object each time: Sequelize writes into attribute definitions.
  const optionalText = () => ({ type: DataTypes.TEXT, allowNull: true, defaultValue: null });
  Press.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      assetTag: { type: DataTypes.TEXT, allowNull: false },
      model: { type: DataTypes.TEXT, allowNull: false },
      tonnage: { type: DataTypes.INTEGER, allowNull: false },
      controlModel: optionalText(),
      sensorGeneration: optionalText(),
      controlFirmware: optionalText(),
      monitorFirmware: optionalText(),
      notes: optionalText(),
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'presses' },
  );
}
