import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { createdAt, nullable, optional, required, serialId } from '../../db/columns';

/**
 * One report sent for a visit (issue 1, then a corrected issue 2 …). Its signed link is bound to the
 * nonce; only the newest issue's link opens the report, so sending a corrected report retires older links.
 */
export class ReportIssue extends Model<InferAttributes<ReportIssue>, InferCreationAttributes<ReportIssue>> {
  declare id: CreationOptional<number>;
  declare visitId: number;
  declare issueNumber: number;
  declare nonce: string;
  declare recipient: string;
  declare emailId: number | null;
  declare expiresAt: Date;
  declare acknowledgedAt: CreationOptional<Date | null>;
  declare acknowledgedBy: CreationOptional<string | null>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
}

export function initReportIssue(sequelize: Sequelize): void {
  ReportIssue.init(
    {
      ...serialId(),
      ...required(DataTypes.INTEGER, 'visitId', 'issueNumber'),
      ...required(DataTypes.TEXT, 'nonce', 'recipient'),
      ...required(DataTypes.DATE, 'expiresAt'),
      ...nullable(DataTypes.INTEGER, 'emailId', 'createdBy'),
      ...optional(DataTypes.DATE, 'acknowledgedAt'),
      ...optional(DataTypes.TEXT, 'acknowledgedBy'),
      ...createdAt(),
    },
    { sequelize, tableName: 'report_issues', updatedAt: false },
  );
}
