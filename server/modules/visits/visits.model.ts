import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { CauseCategory } from '../../../shared/schemas/reading';
import type { ReturnToService, VisitStatus } from '../../../shared/schemas/visit';
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
  declare procedureId: number | null;
  declare bandSetId: number | null;
  declare firmwareRuleSetId: number | null;
  declare controlFirmwareLeft: CreationOptional<string | null>;
  declare monitorFirmwareLeft: CreationOptional<string | null>;
  declare causeCategory: CreationOptional<CauseCategory | null>;
  declare actionsTaken: CreationOptional<string | null>;
  declare recommendations: CreationOptional<string | null>;
  declare labourMinutes: CreationOptional<number | null>;
  declare travelMinutes: CreationOptional<number | null>;
  declare returnToService: CreationOptional<ReturnToService | null>;
  declare contactName: CreationOptional<string | null>;
  declare contactEmail: CreationOptional<string | null>;
  declare signedAt: CreationOptional<Date | null>;
  declare reviewComment: CreationOptional<string | null>;
  /** Bumped with every write to the visit; a write based on an older version is refused (409 stale_version). */
  declare version: CreationOptional<number>;
  declare startedAt: Date | null;
  declare closedAt: Date | null;
  /** The first close: kept through a return and reopen, so time to repair ends there. */
  declare firstClosedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare press?: NonAttribute<Press>;
  declare technician?: NonAttribute<User>;
}

const text = () => ({ type: DataTypes.TEXT, allowNull: true, defaultValue: null });

export function initVisit(sequelize: Sequelize): void {
  Visit.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
      faultDisplayed: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      controlFirmwareFound: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      monitorFirmwareFound: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      procedureId: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      bandSetId: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      firmwareRuleSetId: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      controlFirmwareLeft: text(),
      monitorFirmwareLeft: text(),
      causeCategory: text(),
      actionsTaken: text(),
      recommendations: text(),
      labourMinutes: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      travelMinutes: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      returnToService: { type: DataTypes.JSONB, allowNull: true, defaultValue: null },
      contactName: text(),
      contactEmail: text(),
      signedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      reviewComment: text(),
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      startedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      closedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      firstClosedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'visits' },
  );
}
