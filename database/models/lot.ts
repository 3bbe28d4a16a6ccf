// A lot: a presentation and a lot number, with its expiry (the last usable day) and whether the label gave the day.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Presentation } from './presentation.js';

export class Lot extends Model<InferAttributes<Lot>, InferCreationAttributes<Lot>> {
  declare id: CreationOptional<number>;
  declare presentationId: number;
  declare lotNumber: string;
  declare expiry: string;
  declare expiryDayGiven: CreationOptional<boolean>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare presentation?: NonAttribute<Presentation>;

  static initModel(sequelize: Sequelize): void {
    Lot.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        presentationId: { type: DataTypes.INTEGER, allowNull: false },
        lotNumber: { type: DataTypes.TEXT, allowNull: false },
        expiry: { type: DataTypes.DATEONLY, allowNull: false },
        expiryDayGiven: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'lots', underscored: true },
    );
  }
}
