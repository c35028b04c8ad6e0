import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

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
      id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
      visitId: { type: DataTypes.INTEGER, allowNull: true },
      actorId: { type: DataTypes.INTEGER, allowNull: true },
      action: { type: DataTypes.TEXT, allowNull: false },
      detail: { type: DataTypes.JSONB, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'audit_events', timestamps: true, updatedAt: false },
  );
}
