// A recorded temperature check of a fridge: current, minimum and maximum since reset, who and when.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class DailyCheck extends Model<InferAttributes<DailyCheck>, InferCreationAttributes<DailyCheck>> {
  declare id: CreationOptional<number>;
  declare fridgeId: number;
  declare checkedAt: Date;
  declare currentC: number;
  declare minC: number | null;
  declare maxC: number | null;
  declare enteredUnit: 'F' | 'C';
  declare initials: string;
  declare note: CreationOptional<string>;
  declare recordedBy: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    DailyCheck.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fridgeId: { type: DataTypes.INTEGER, allowNull: false },
        checkedAt: { type: DataTypes.DATE, allowNull: false },
        currentC: { type: DataTypes.REAL, allowNull: false },
        minC: { type: DataTypes.REAL, allowNull: true },
        maxC: { type: DataTypes.REAL, allowNull: true },
        enteredUnit: { type: DataTypes.CHAR(1), allowNull: false },
        initials: { type: DataTypes.TEXT, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        recordedBy: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'daily_checks', underscored: true, updatedAt: false },
    );
  }
}
