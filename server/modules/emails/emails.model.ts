import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import { EMAIL_STATUSES, type EmailStatus } from '../../../shared/schemas/email';

export const LINK_KINDS = ['invite', 'report'] as const;
export type LinkKind = (typeof LINK_KINDS)[number];

export { EMAIL_STATUSES, type EmailStatus };

/** One message in the outbox: queued → sending → sent, or back to queued with a later try, or failed. */
export class Email extends Model<InferAttributes<Email>, InferCreationAttributes<Email>> {
  declare id: CreationOptional<number>;
  declare visitId: number | null;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare html: string;
  declare text: string;
  /** What the {{link}} marker in html/text is made from at send time; the row holds no live link. */
  declare linkKind: CreationOptional<LinkKind | null>;
  declare linkRef: CreationOptional<number | null>;
  declare status: CreationOptional<EmailStatus>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare nextAttemptAt: CreationOptional<Date>;
  declare sentAt: CreationOptional<Date | null>;
  declare messageId: CreationOptional<string | null>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare attachments?: NonAttribute<EmailAttachment[]>;
}

/** A file sent with a message, stored so the record holds exactly what went out. */
export class EmailAttachment extends Model<InferAttributes<EmailAttachment>, InferCreationAttributes<EmailAttachment>> {
  declare id: CreationOptional<number>;
  declare emailId: number;
  declare filename: string;
  declare contentType: string;
  declare content: Buffer;
  declare createdAt: CreationOptional<Date>;
}

export function initEmailModels(sequelize: Sequelize): void {
  Email.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      visitId: { type: DataTypes.INTEGER, allowNull: true },
      kind: { type: DataTypes.TEXT, allowNull: false },
      toAddress: { type: DataTypes.TEXT, allowNull: false },
      subject: { type: DataTypes.TEXT, allowNull: false },
      html: { type: DataTypes.TEXT, allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      linkKind: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      linkRef: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'queued' },
      attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      lastError: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      nextAttemptAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      sentAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      messageId: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      createdBy: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'emails' },
  );
  EmailAttachment.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      emailId: { type: DataTypes.INTEGER, allowNull: false },
      filename: { type: DataTypes.TEXT, allowNull: false },
      contentType: { type: DataTypes.TEXT, allowNull: false },
      content: { type: DataTypes.BLOB, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'email_attachments', updatedAt: false },
  );
  Email.hasMany(EmailAttachment, { as: 'attachments', foreignKey: 'emailId' });
}
