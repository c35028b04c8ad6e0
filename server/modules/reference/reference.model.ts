import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { BandSetValues } from '../../../shared/schemas/band-set';
import type { FirmwareRule } from '../../../shared/schemas/firmware-rule';
import type { ProcedureDefinition } from '../../../shared/schemas/procedure';

// Versioned reference data (procedures, band sets, firmware rules). A published row is frozen by a
// database trigger; a change is a new version.

export class ProcedureVersion extends Model<InferAttributes<ProcedureVersion>, InferCreationAttributes<ProcedureVersion>> {
  declare id: CreationOptional<number>;
  declare key: string;
  declare version: number;
  declare title: string;
  declare definition: ProcedureDefinition;
  declare publishedAt: Date | null;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class BandSetVersion extends Model<InferAttributes<BandSetVersion>, InferCreationAttributes<BandSetVersion>> {
  declare id: CreationOptional<number>;
  declare generation: string;
  declare version: number;
  declare label: string;
  declare bands: BandSetValues;
  declare publishedAt: Date | null;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class FirmwareRuleSet extends Model<InferAttributes<FirmwareRuleSet>, InferCreationAttributes<FirmwareRuleSet>> {
  declare id: CreationOptional<number>;
  declare version: number;
  declare rules: FirmwareRule[];
  declare publishedAt: Date | null;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const common = () => ({
  id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
  version: { type: DataTypes.INTEGER, allowNull: false },
  publishedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
  createdBy: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
  createdAt: DataTypes.DATE,
  updatedAt: DataTypes.DATE,
});

export function initReferenceModels(sequelize: Sequelize): void {
  ProcedureVersion.init(
    { ...common(), key: { type: DataTypes.TEXT, allowNull: false }, title: { type: DataTypes.TEXT, allowNull: false }, definition: { type: DataTypes.JSONB, allowNull: false } },
    { sequelize, tableName: 'procedures' },
  );
  BandSetVersion.init(
    { ...common(), generation: { type: DataTypes.TEXT, allowNull: false }, label: { type: DataTypes.TEXT, allowNull: false }, bands: { type: DataTypes.JSONB, allowNull: false } },
    { sequelize, tableName: 'band_sets' },
  );
  FirmwareRuleSet.init({ ...common(), rules: { type: DataTypes.JSONB, allowNull: false } }, { sequelize, tableName: 'firmware_rule_sets' });
}
