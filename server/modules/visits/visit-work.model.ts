import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { createdAt, nullable, optional, required, uuidId } from '../../db/columns';
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
  declare entered: string;
  declare valueSi: number | null;
  declare isOpen: boolean;
  declare windingTemperatureC: number | null;
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

/** A replaced answer or reading keeps its row and is marked with when it stopped counting. */
const superseded = () => optional(DataTypes.DATE, 'supersededAt');

export function initVisitWorkModels(sequelize: Sequelize): void {
  StepResult.init(
    {
      ...uuidId(),
      ...required(DataTypes.INTEGER, 'visitId', 'createdBy'),
      ...required(DataTypes.TEXT, 'stepId'),
      ...required(DataTypes.JSONB, 'answer'),
      ...nullable(DataTypes.TEXT, 'outcome', 'note'),
      ...nullable(DataTypes.DATE, 'confirmedAt'),
      ...createdAt(),
      ...superseded(),
      ...optional(DataTypes.TEXT, 'supersededReason'),
    },
    { sequelize, tableName: 'step_results', ...noUpdatedAt },
  );
  Reading.init(
    {
      ...uuidId(),
      ...required(DataTypes.INTEGER, 'visitId', 'createdBy'),
      ...required(DataTypes.TEXT, 'stepId', 'quantity', 'circuit', 'position', 'reason'),
      // The API's names; the columns keep the names they were created with.
      entered: { type: DataTypes.TEXT, allowNull: false, field: 'entry' },
      windingTemperatureC: { type: DataTypes.DOUBLE, allowNull: true, field: 'winding_temp_c' },
      ...required(DataTypes.BOOLEAN, 'isOpen'),
      ...required(DataTypes.JSONB, 'judgement'),
      ...nullable(DataTypes.DOUBLE, 'valueSi'),
      ...nullable(DataTypes.JSONB, 'cable'),
      ...nullable(DataTypes.TEXT, 'verdict'),
      ...nullable(DataTypes.INTEGER, 'bandSetId'),
      ...createdAt(),
      ...superseded(),
    },
    { sequelize, tableName: 'readings', ...noUpdatedAt },
  );
  PartUsed.init(
    {
      ...uuidId(),
      ...required(DataTypes.INTEGER, 'visitId', 'quantity'),
      ...required(DataTypes.TEXT, 'partNumber', 'description'),
      ...nullable(DataTypes.TEXT, 'serialRemoved', 'serialFitted'),
      ...createdAt(),
    },
    { sequelize, tableName: 'parts_used', ...noUpdatedAt },
  );
}
