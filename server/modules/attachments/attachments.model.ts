import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import { createdAt, optional, required, uuidId } from '../../db/columns';
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
      ...uuidId(),
      ...required(DataTypes.TEXT, 'kind', 'storageKey', 'mimeType'),
      ...required(DataTypes.INTEGER, 'bytes'),
      ...optional(DataTypes.TEXT, 'stepId', 'caption', 'thumbKey'),
      ...optional(DataTypes.INTEGER, 'width', 'height'),
      ...createdAt(),
    },
    { sequelize, tableName: 'attachments', updatedAt: false },
  );
}
