import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import type { SessionUser, UserRow } from '../../shared/api-types';
import { type Role, ROLES } from '../../shared/roles';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare email: string;
  declare role: Role;
  declare passwordHash: string | null;
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  toSessionUser(): SessionUser {
    return { id: this.id, name: this.name, email: this.email, role: this.role };
  }

  toRow(): UserRow {
    return { ...this.toSessionUser(), active: this.active, createdAt: this.createdAt.toISOString() };
  }

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users' },
    );
  }
}
