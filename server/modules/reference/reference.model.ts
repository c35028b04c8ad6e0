import { DataTypes, type Model, type Sequelize } from 'sequelize';
import { optional, required, serialId, SerialRow, timestamps } from '../../db/columns';
import type { BandSetValues } from '../../../shared/schemas/band-set';
import type { FirmwareRule } from '../../../shared/schemas/firmware-rule';
import type { ProcedureDefinition } from '../../../shared/schemas/procedure';

// Versioned reference data (procedures, band sets, firmware rules). A published row is frozen by a
// database trigger; a change is a new version.

/** What every version row holds besides its content: number, publication, author, timestamps. */
abstract class VersionRow<M extends Model> extends SerialRow<M> {
  declare version: number;
  declare publishedAt: Date | null;
  declare createdBy: number | null;
}

export class ProcedureVersion extends VersionRow<ProcedureVersion> {
  declare key: string;
  declare title: string;
  declare definition: ProcedureDefinition;
}

export class BandSetVersion extends VersionRow<BandSetVersion> {
  declare generation: string;
  declare label: string;
  declare bands: BandSetValues;
}

export class FirmwareRuleSet extends VersionRow<FirmwareRuleSet> {
  declare rules: FirmwareRule[];
}

// The columns every versioned table has (server/db/versioned-table.ts writes them in SQL).
const versioned = () => ({
  ...serialId(),
  ...required(DataTypes.INTEGER, 'version'),
  ...optional(DataTypes.DATE, 'publishedAt'),
  ...optional(DataTypes.INTEGER, 'createdBy'),
  ...timestamps(),
});

export function initReferenceModels(sequelize: Sequelize): void {
  ProcedureVersion.init(
    { ...versioned(), ...required(DataTypes.TEXT, 'key', 'title'), ...required(DataTypes.JSONB, 'definition') },
    { sequelize, tableName: 'procedures' },
  );
  BandSetVersion.init(
    { ...versioned(), ...required(DataTypes.TEXT, 'generation', 'label'), ...required(DataTypes.JSONB, 'bands') },
    { sequelize, tableName: 'band_sets' },
  );
  FirmwareRuleSet.init({ ...versioned(), ...required(DataTypes.JSONB, 'rules') }, { sequelize, tableName: 'firmware_rule_sets' });
}
