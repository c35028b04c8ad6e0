import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

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
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      visitId: { type: DataTypes.INTEGER, allowNull: false },
      issueNumber: { type: DataTypes.INTEGER, allowNull: false },
      nonce: { type: DataTypes.TEXT, allowNull: false },
      recipient: { type: DataTypes.TEXT, allowNull: false },
      emailId: { type: DataTypes.INTEGER, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acknowledgedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      acknowledgedBy: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      createdBy: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'report_issues', updatedAt: false },
  );
}
