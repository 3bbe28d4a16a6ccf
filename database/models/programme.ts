// A vaccination programme: a named, reusable list of steps by age that flocks follow.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { ProgrammeStep } from './programme-step.js';

export class Programme extends Model<InferAttributes<Programme>, InferCreationAttributes<Programme>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare notes: CreationOptional<string>;
  declare active: CreationOptional<boolean>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare steps?: NonAttribute<ProgrammeStep[]>;

  static initModel(sequelize: Sequelize): void {
    Programme.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'programmes', underscored: true },
    );
  }
}
