import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { User } from '../users/users.model';
import type { Visit } from '../visits/visits.model';
import type { ImageMimeType } from './image-processing';

export type AttachmentKind = 'photo' | 'signature';

/** A photo or the customer's signature on a visit; the bytes live in FileStorage under storageKey. */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: string;
  declare visitId: ForeignKey<Visit['id']>;
  declare stepId: string | null;
  declare kind: AttachmentKind;
  declare caption: string | null;
  declare storageKey: string;
  declare thumbKey: string | null;
  declare mimeType: ImageMimeType;
  declare bytes: number;
  declare width: number | null;
  declare height: number | null;
  declare createdBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;
  declare visit?: NonAttribute<Visit>;
  declare creator?: NonAttribute<User>;
}

export function initAttachment(sequelize: Sequelize): void {
  Attachment.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true },
      stepId: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      kind: { type: DataTypes.TEXT, allowNull: false },
      caption: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      storageKey: { type: DataTypes.TEXT, allowNull: false },
      thumbKey: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      mimeType: { type: DataTypes.TEXT, allowNull: false },
      bytes: { type: DataTypes.INTEGER, allowNull: false },
      width: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      height: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'attachments', updatedAt: false },
  );
}
