// A stored excursion of a fridge: from its readings (recomputed while undecided) or from a daily check.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ExcursionStatus } from '../../shared/fridges/excursion-view.js';

export class Excursion extends Model<InferAttributes<Excursion>, InferCreationAttributes<Excursion>> {
  declare id: CreationOptional<number>;
  declare fridgeId: number;
  declare source: 'readings' | 'daily_check';
  declare kind: 'high' | 'low';
  declare startsAt: Date;
  declare endsAt: Date;
  declare minutes: number | null;
  declare peakC: number;
  declare degreeMinutesC: number | null;
  declare openEnded: CreationOptional<boolean>;
  declare backupMinutes: CreationOptional<number>;
  declare lowC: number;
  declare highC: number;
  declare status: CreationOptional<ExcursionStatus>;
  declare followUpOfId: number | null;
  declare dailyCheckId: number | null;
  declare actionTaken: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Excursion.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fridgeId: { type: DataTypes.INTEGER, allowNull: false },
        source: { type: DataTypes.TEXT, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        startsAt: { type: DataTypes.DATE, allowNull: false },
        endsAt: { type: DataTypes.DATE, allowNull: false },
        minutes: { type: DataTypes.DOUBLE, allowNull: true },
        peakC: { type: DataTypes.REAL, allowNull: false },
        degreeMinutesC: { type: DataTypes.DOUBLE, allowNull: true },
        openEnded: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        backupMinutes: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        lowC: { type: DataTypes.DOUBLE, allowNull: false },
        highC: { type: DataTypes.DOUBLE, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'open' },
        followUpOfId: { type: DataTypes.INTEGER, allowNull: true },
        dailyCheckId: { type: DataTypes.INTEGER, allowNull: true },
        actionTaken: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'excursions', underscored: true },
    );
  }
}
