import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import { createdAt, nullable, optional, required, serialId, SerialRow, timestamps, withDefault } from '../../db/columns';
import { EMAIL_STATUSES, type EmailStatus } from '../../../shared/schemas/email';

export const LINK_KINDS = ['invite', 'report'] as const;
export type LinkKind = (typeof LINK_KINDS)[number];

export { EMAIL_STATUSES, type EmailStatus };

/** One message in the outbox: queued → sending → sent, or back to queued with a later try, or failed. */
export class Email extends SerialRow<Email> {
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
      ...serialId(),
      ...nullable(DataTypes.INTEGER, 'visitId', 'createdBy'),
      ...required(DataTypes.TEXT, 'kind', 'toAddress', 'subject', 'html', 'text'),
      ...optional(DataTypes.TEXT, 'linkKind', 'lastError', 'messageId'),
      ...optional(DataTypes.INTEGER, 'linkRef'),
      ...optional(DataTypes.DATE, 'sentAt'),
      status: withDefault(DataTypes.TEXT, 'queued'),
      attempts: withDefault(DataTypes.INTEGER, 0),
      nextAttemptAt: withDefault(DataTypes.DATE, DataTypes.NOW),
      ...timestamps(),
    },
    { sequelize, tableName: 'emails' },
  );
  EmailAttachment.init(
    {
      ...serialId(),
      ...required(DataTypes.INTEGER, 'emailId'),
      ...required(DataTypes.TEXT, 'filename', 'contentType'),
      ...required(DataTypes.BLOB, 'content'),
      ...createdAt(),
    },
    { sequelize, tableName: 'email_attachments', updatedAt: false },
  );
  Email.hasMany(EmailAttachment, { as: 'attachments', foreignKey: 'emailId' });
}
