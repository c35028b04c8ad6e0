import { DataTypes, type CreationOptional, type ForeignKey, type NonAttribute, type Sequelize } from 'sequelize';
import { optional, serialId, SerialRow, timestamps, withDefault } from '../../db/columns';
import type { CauseCategory } from '../../../shared/schemas/reading';
import type { AsLeftState, LockedOut, ReturnToService, VisitStatus } from '../../../shared/schemas/visit';
import type { Press } from '../presses/presses.model';
import type { User } from '../users/users.model';

export class Visit extends SerialRow<Visit> {
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
  declare asLeftState: CreationOptional<AsLeftState | null>;
  declare returnToService: CreationOptional<ReturnToService | null>;
  declare lockedOut: CreationOptional<LockedOut | null>;
  declare cancelledAt: CreationOptional<Date | null>;
  declare cancelReason: CreationOptional<string | null>;
  declare cancelledBy: CreationOptional<number | null>;
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
  declare press?: NonAttribute<Press>;
  declare technician?: NonAttribute<User>;
}

export function initVisit(sequelize: Sequelize): void {
  Visit.init(
    {
      ...serialId(),
      status: withDefault(DataTypes.TEXT, 'draft'),
      faultDisplayed: withDefault(DataTypes.TEXT, ''),
      ...optional(DataTypes.INTEGER, 'procedureId', 'bandSetId', 'firmwareRuleSetId', 'labourMinutes', 'travelMinutes'),
      ...optional(DataTypes.TEXT, 'controlFirmwareFound', 'monitorFirmwareFound', 'controlFirmwareLeft', 'monitorFirmwareLeft'),
      ...optional(DataTypes.TEXT, 'causeCategory', 'actionsTaken', 'recommendations', 'contactName', 'contactEmail', 'reviewComment'),
      ...optional(DataTypes.TEXT, 'asLeftState', 'cancelReason'),
      ...optional(DataTypes.JSONB, 'returnToService', 'lockedOut'),
      ...optional(DataTypes.INTEGER, 'cancelledBy'),
      ...optional(DataTypes.DATE, 'signedAt', 'startedAt', 'closedAt', 'firstClosedAt', 'cancelledAt'),
      version: withDefault(DataTypes.INTEGER, 1),
      ...timestamps(),
    },
    { sequelize, tableName: 'visits' },
  );
}
