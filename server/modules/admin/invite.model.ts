import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

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
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      tokenHash: { type: DataTypes.TEXT, allowNull: false },
      nonce: { type: DataTypes.TEXT, allowNull: true, defaultValue: null },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      revokedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      createdBy: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'user_invites', updatedAt: false },
  );
}
