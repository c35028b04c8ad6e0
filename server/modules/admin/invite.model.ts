import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One invitation link; only the SHA-256 of its token is kept. */
export class UserInvite extends Model<InferAttributes<UserInvite>, InferCreationAttributes<UserInvite>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare tokenHash: string;
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
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      revokedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      createdBy: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'user_invites', updatedAt: false },
  );
}
