// A person who signs in: roles, the sites they may see, and their display preference.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Role } from '../../shared/auth/roles.js';
import type { Site } from './site.js';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare roles: Role[];
  declare allSites: CreationOptional<boolean>;
  declare displayUnit: CreationOptional<'F' | 'C'>;
  declare active: CreationOptional<boolean>;
  declare passwordChangedAt: CreationOptional<Date>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare sites?: NonAttribute<Site[]>;

  static initModel(sequelize: Sequelize): void {
    User.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: { type: DataTypes.TEXT, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        passwordHash: { type: DataTypes.TEXT, allowNull: false },
        roles: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
        allSites: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        displayUnit: { type: DataTypes.CHAR(1), allowNull: false, defaultValue: 'F' },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        passwordChangedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', underscored: true },
    );
  }
}
