// A poultry house on a site, where flocks are placed.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type Housing = 'cage' | 'aviary' | 'floor';

export class House extends Model<InferAttributes<House>, InferCreationAttributes<House>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare name: string;
  declare housing: Housing;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    House.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        siteId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        housing: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'houses', underscored: true },
    );
  }
}
