import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Cable, Circuit, Position, Quantity, Verdict } from '../../../shared/schemas/reading';

/** One answer at one step. A changed answer supersedes the earlier row, which stays as history. */
export class StepResult extends Model<InferAttributes<StepResult>, InferCreationAttributes<StepResult>> {
  declare id: string;
  declare visitId: number;
  declare stepId: string;
  declare outcome: string | null;
  declare answer: Record<string, unknown>;
  declare note: string | null;
  declare confirmedAt: Date | null;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare supersededAt: CreationOptional<Date | null>;
  declare supersededReason: CreationOptional<string | null>;
}

/** One meter reading as typed, with the server's own judgement of it. */
export class Reading extends Model<InferAttributes<Reading>, InferCreationAttributes<Reading>> {
  declare id: string;
  declare visitId: number;
  declare stepId: string;
  declare quantity: Quantity;
  declare circuit: Circuit;
  declare position: Position;
  declare entry: string;
  declare valueSi: number | null;
  declare isOpen: boolean;
  declare windingTempC: number | null;
  declare cable: Cable | null;
  declare verdict: Verdict | null;
  declare reason: string;
  declare judgement: Record<string, unknown>;
  declare bandSetId: number | null;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare supersededAt: CreationOptional<Date | null>;
}

export class PartUsed extends Model<InferAttributes<PartUsed>, InferCreationAttributes<PartUsed>> {
  declare id: string;
  declare visitId: number;
  declare partNumber: string;
  declare description: string;
  declare quantity: number;
  declare serialRemoved: string | null;
  declare serialFitted: string | null;
  declare createdAt: CreationOptional<Date>;
}

const noUpdatedAt = { timestamps: true, updatedAt: false } as const;

export function initVisitWorkModels(sequelize: Sequelize): void {
  StepResult.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true },
      visitId: { type: DataTypes.INTEGER, allowNull: false },
      stepId: { type: DataTypes.TEXT, allowNull: false },
      outcome: { type: DataTypes.TEXT, allowNull: true },
      answer: { type: DataTypes.JSONB, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: true },
      confirmedAt: { type: DataTypes.DATE, allowNull: true },
      createdBy: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
      supersededAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      supersededReason: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
    },
    { sequelize, tableName: 'step_results', ...noUpdatedAt },
  );
  Reading.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true },
      visitId: { type: DataTypes.INTEGER, allowNull: false },
      stepId: { type: DataTypes.TEXT, allowNull: false },
      quantity: { type: DataTypes.TEXT, allowNull: false },
      circuit: { type: DataTypes.TEXT, allowNull: false },
      position: { type: DataTypes.TEXT, allowNull: false },
      entry: { type: DataTypes.TEXT, allowNull: false },
      valueSi: { type: DataTypes.DOUBLE, allowNull: true },
      isOpen: { type: DataTypes.BOOLEAN, allowNull: false },
      windingTempC: { type: DataTypes.DOUBLE, allowNull: true },
      cable: { type: DataTypes.JSONB, allowNull: true },
      verdict: { type: DataTypes.TEXT, allowNull: true },
      reason: { type: DataTypes.TEXT, allowNull: false },
      judgement: { type: DataTypes.JSONB, allowNull: false },
      bandSetId: { type: DataTypes.INTEGER, allowNull: true },
      createdBy: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
      supersededAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
    },
    { sequelize, tableName: 'readings', ...noUpdatedAt },
  );
  PartUsed.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true },
      visitId: { type: DataTypes.INTEGER, allowNull: false },
      partNumber: { type: DataTypes.TEXT, allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false },
      quantity: { type: DataTypes.INTEGER, allowNull: false },
      serialRemoved: { type: DataTypes.TEXT, allowNull: true },
      serialFitted: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'parts_used', ...noUpdatedAt },
  );
}
