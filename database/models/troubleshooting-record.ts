// What storage staff found and did about an exposure event (the fields guidance lists for a troubleshooting record).
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class TroubleshootingRecord extends Model<InferAttributes<TroubleshootingRecord>, InferCreationAttributes<TroubleshootingRecord>> {
  declare id: CreationOptional<number>;
  declare exposureEventId: number;
  declare foundAt: Date | null;
  declare unitTempC: number | null;
  declare unitMinC: number | null;
  declare unitMaxC: number | null;
  declare roomTempC: number | null;
  declare enteredUnit: 'F' | 'C';
  declare foundBy: string;
  declare whatHappened: string;
  declare minutesSinceInRange: number | null;
  declare backInStorageAt: Date | null;
  declare contacted: string;
  declare preventiveAction: string;
  declare updatedBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TroubleshootingRecord.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        exposureEventId: { type: DataTypes.INTEGER, allowNull: false },
        foundAt: { type: DataTypes.DATE, allowNull: true },
        unitTempC: { type: DataTypes.DOUBLE, allowNull: true },
        unitMinC: { type: DataTypes.DOUBLE, allowNull: true },
        unitMaxC: { type: DataTypes.DOUBLE, allowNull: true },
        roomTempC: { type: DataTypes.DOUBLE, allowNull: true },
        enteredUnit: { type: DataTypes.TEXT, allowNull: false },
        foundBy: { type: DataTypes.TEXT, allowNull: false },
        whatHappened: { type: DataTypes.TEXT, allowNull: false },
        minutesSinceInRange: { type: DataTypes.INTEGER, allowNull: true },
        backInStorageAt: { type: DataTypes.DATE, allowNull: true },
        contacted: { type: DataTypes.TEXT, allowNull: false },
        preventiveAction: { type: DataTypes.TEXT, allowNull: false },
        updatedBy: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'troubleshooting_records', underscored: true },
    );
  }
}
