// An event behind automatic holds: a run of a fridge's readings outside a product's own range (or at freezing), kept for good.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class ExposureEvent extends Model<InferAttributes<ExposureEvent>, InferCreationAttributes<ExposureEvent>> {
  declare id: CreationOptional<number>;
  declare fridgeId: number;
  declare cause: 'excursion' | 'freeze';
  declare source: 'readings' | 'daily_check';
  declare kind: 'high' | 'low';
  declare startsAt: Date;
  declare endsAt: Date;
  declare minutes: number | null;
  declare peakC: number;
  declare degreeMinutesC: number | null;
  declare mkt24hC: number | null;
  declare openEnded: CreationOptional<boolean>;
  declare lowC: number;
  declare highC: number;
  declare fridgeLowC: number;
  declare fridgeHighC: number;
  declare excursionId: number | null;
  declare dailyCheckId: number | null;
  declare followUpOfId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ExposureEvent.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fridgeId: { type: DataTypes.INTEGER, allowNull: false },
        cause: { type: DataTypes.TEXT, allowNull: false },
        source: { type: DataTypes.TEXT, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        startsAt: { type: DataTypes.DATE, allowNull: false },
        endsAt: { type: DataTypes.DATE, allowNull: false },
        minutes: { type: DataTypes.DOUBLE, allowNull: true },
        peakC: { type: DataTypes.REAL, allowNull: false },
        degreeMinutesC: { type: DataTypes.DOUBLE, allowNull: true },
        mkt24hC: { type: DataTypes.DOUBLE, allowNull: true, field: 'mkt_24h_c' },
        openEnded: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        lowC: { type: DataTypes.DOUBLE, allowNull: false },
        highC: { type: DataTypes.DOUBLE, allowNull: false },
        fridgeLowC: { type: DataTypes.DOUBLE, allowNull: false },
        fridgeHighC: { type: DataTypes.DOUBLE, allowNull: false },
        excursionId: { type: DataTypes.INTEGER, allowNull: true },
        dailyCheckId: { type: DataTypes.INTEGER, allowNull: true },
        followUpOfId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'exposure_events', underscored: true },
    );
  }
}
