// A flock: birds placed in a house on a date, hatched on another, with a planned depletion and the programme it follows.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { BirdCount } from './bird-count.js';
import type { House } from './house.js';
import type { Programme } from './programme.js';

export class Flock extends Model<InferAttributes<Flock>, InferCreationAttributes<Flock>> {
  declare id: CreationOptional<number>;
  declare houseId: number;
  declare programmeId: number | null;
  declare name: string;
  declare hatchDate: string;
  declare placementDate: string;
  declare birdsPlaced: number;
  declare plannedDepletionDate: string | null;
  declare depletedOn: CreationOptional<string | null>;
  declare notes: CreationOptional<string>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare house?: NonAttribute<House>;
  declare programme?: NonAttribute<Programme | null>;
  declare birdCounts?: NonAttribute<BirdCount[]>;

  static initModel(sequelize: Sequelize): void {
    Flock.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        houseId: { type: DataTypes.INTEGER, allowNull: false },
        programmeId: { type: DataTypes.INTEGER, allowNull: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        hatchDate: { type: DataTypes.DATEONLY, allowNull: false },
        placementDate: { type: DataTypes.DATEONLY, allowNull: false },
        birdsPlaced: { type: DataTypes.INTEGER, allowNull: false },
        plannedDepletionDate: { type: DataTypes.DATEONLY, allowNull: true },
        depletedOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'flocks', underscored: true },
    );
  }
}
