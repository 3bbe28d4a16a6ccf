// A poultry house on a site, where flocks are placed.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Site } from './site.js';

export type Housing = 'cage' | 'aviary' | 'floor';

export class House extends Model<InferAttributes<House>, InferCreationAttributes<House>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare name: string;
  declare housing: Housing;
  /** Birds the house is built for (flocks feature); a hint, never a limit. */
  declare capacity: CreationOptional<number | null>;
  /** A house taken out of use keeps its flocks' history. */
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare site?: NonAttribute<Site>;

  static initModel(sequelize: Sequelize): void {
    House.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        siteId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        housing: { type: DataTypes.TEXT, allowNull: false },
        capacity: { type: DataTypes.INTEGER, allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'houses', underscored: true },
    );
  }
}
