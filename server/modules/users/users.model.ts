import { DataTypes, type CreationOptional, type Sequelize } from 'sequelize';
import { required, serialId, SerialRow, timestamps, withDefault } from '../../db/columns';
import type { Role } from '../../../shared/schemas/roles';

export class User extends SerialRow<User> {
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: string;
  declare active: CreationOptional<boolean>;
}

export function initUser(sequelize: Sequelize): void {
  User.init(
    {
      ...serialId(),
      ...required(DataTypes.TEXT, 'email', 'name', 'role', 'passwordHash'),
      active: withDefault(DataTypes.BOOLEAN, true),
      ...timestamps(),
    },
    { sequelize, tableName: 'users', defaultScope: { attributes: { exclude: ['passwordHash'] } }, scopes: { withPassword: {} } },
  );
}
