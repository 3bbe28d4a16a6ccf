// A storage unit on a site with its alarm range, kept as entered (value and unit).
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Fridge extends Model<InferAttributes<Fridge>, InferCreationAttributes<Fridge>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare code: string;
  declare name: string;
  declare place: CreationOptional<string>;
  declare alarmLow: CreationOptional<number>;
  declare alarmHigh: CreationOptional<number>;
  declare alarmUnit: CreationOptional<'F' | 'C'>;
  declare minMaxDisplay: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Fridge.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        siteId: { type: DataTypes.INTEGER, allowNull: false },
        code: { type: DataTypes.TEXT, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        place: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        // DECIMAL arrives from pg as a string; the getters hand out numbers.
        alarmLow: { type: DataTypes.DECIMAL(6, 2), allowNull: false, defaultValue: 35, get() { return Number(this.getDataValue('alarmLow')); } },
        alarmHigh: { type: DataTypes.DECIMAL(6, 2), allowNull: false, defaultValue: 45, get() { return Number(this.getDataValue('alarmHigh')); } },
        alarmUnit: { type: DataTypes.CHAR(1), allowNull: false, defaultValue: 'F' },
        minMaxDisplay: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'fridges', underscored: true },
    );
  }
}
