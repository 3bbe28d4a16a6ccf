// A supplier vaccines are ordered from: where order mail goes and how many days a delivery takes.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Supplier extends Model<InferAttributes<Supplier>, InferCreationAttributes<Supplier>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare orderEmail: string;
  declare leadTimeDays: CreationOptional<number>;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Supplier.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        orderEmail: { type: DataTypes.TEXT, allowNull: false },
        leadTimeDays: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 7 },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'suppliers', underscored: true },
    );
  }
}
