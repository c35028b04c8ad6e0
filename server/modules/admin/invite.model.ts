import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { createdAt, optional, required, serialId } from '../../db/columns';

/** One invitation link; only the SHA-256 of its token and the nonce it is made from are kept. */
export class UserInvite extends Model<InferAttributes<UserInvite>, InferCreationAttributes<UserInvite>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare tokenHash: string;
  /** The token is remade from this and the server key when the e-mail is sent (null on invitations from before). */
  declare nonce: string | null;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare revokedAt: Date | null;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
}

export function initUserInvite(sequelize: Sequelize): void {
  UserInvite.init(
    {
      ...serialId(),
      ...required(DataTypes.INTEGER, 'userId'),
      ...required(DataTypes.TEXT, 'tokenHash'),
      ...required(DataTypes.DATE, 'expiresAt'),
      ...optional(DataTypes.TEXT, 'nonce'),
      ...optional(DataTypes.DATE, 'usedAt', 'revokedAt'),
      ...optional(DataTypes.INTEGER, 'createdBy'),
      ...createdAt(),
    },
    { sequelize, tableName: 'user_invites', updatedAt: false },
  );
}
