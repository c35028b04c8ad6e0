import { DataTypes, type ForeignKey, type NonAttribute, type Sequelize } from 'sequelize';
import { optional, required, serialId, SerialRow, timestamps } from '../../db/columns';
import type { Site } from '../sites/sites.model';

export class Press extends SerialRow<Press> {
  declare siteId: ForeignKey<Site['id']>;
  declare assetTag: string;
  declare model: string;
  declare tonnage: number;
  declare controlModel: string | null;
  declare sensorGeneration: string | null;
  declare controlFirmware: string | null;
  declare monitorFirmware: string | null;
  declare notes: string | null;
  declare site?: NonAttribute<Site>;
}

export function initPress(sequelize: Sequelize): void {
  Press.init(
    {
      ...serialId(),
      ...required(DataTypes.TEXT, 'assetTag', 'model'),
      ...required(DataTypes.INTEGER, 'tonnage'),
      ...optional(DataTypes.TEXT, 'controlModel', 'sensorGeneration', 'controlFirmware', 'monitorFirmware', 'notes'),
      ...timestamps(),
    },
    { sequelize, tableName: 'presses' },
  );
}
