import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { VisitStatus } from '../../../shared/schemas/visit';
import type { Press } from '../presses/presses.model';
import type { User } from '../users/users.model';

export class Visit extends Model<InferAttributes<Visit>, InferCreationAttributes<Visit>> {
  declare id: CreationOptional<number>;
  declare pressId: ForeignKey<Press['id']>;
  declare technicianId: ForeignKey<User['id']>;
  declare status: CreationOptional<VisitStatus>;
  declare faultDisplayed: CreationOptional<string>;
  declare controlFirmwareFound: string | null;
  declare monitorFirmwareFound: string | null;
  declare startedAt: Date | null;
  declare closedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare press?: NonAttribute<Press>;
  declare technician?: NonAttribute<User>;
}

export function initVisit(sequelize: Sequelize): void {
  Visit.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
      faultDisplayed: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      controlFirmwareFound: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      monitorFirmwareFound: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      startedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      closedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'visits' },
  );
}
