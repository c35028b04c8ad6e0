import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { createdAt, nullable, required, serialId } from '../../db/columns';

/** One line of the audit trail: who did what, when, to which visit (none for admin actions). */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare visitId: number | null;
  declare actorId: number | null;
  declare action: string;
  declare detail: Record<string, unknown>;
  declare createdAt: CreationOptional<Date>;
}

export function initAuditEvent(sequelize: Sequelize): void {
  AuditEvent.init(
    {
      ...serialId(DataTypes.BIGINT),
      ...nullable(DataTypes.INTEGER, 'visitId', 'actorId'),
      ...required(DataTypes.TEXT, 'action'),
      ...required(DataTypes.JSONB, 'detail'),
      ...createdAt(),
    },
    { sequelize, tableName: 'audit_events', timestamps: true, updatedAt: false },
  );
}
