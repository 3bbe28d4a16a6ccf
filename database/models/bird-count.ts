// One bird-number update of a flock (losses or a headcount), kept as history; never changed afterwards.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { BirdCountKind } from '../../shared/flocks/bird-count-kinds.js';

export class BirdCount extends Model<InferAttributes<BirdCount>, InferCreationAttributes<BirdCount>> {
  declare id: CreationOptional<number>;
  declare flockId: number;
  declare countedOn: string;
  declare kind: BirdCountKind;
  declare birds: number;
  declare note: CreationOptional<string>;
  declare recordedBy: number | null;
  declare recordedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BirdCount.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        flockId: { type: DataTypes.INTEGER, allowNull: false },
        countedOn: { type: DataTypes.DATEONLY, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        birds: { type: DataTypes.INTEGER, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        recordedBy: { type: DataTypes.INTEGER, allowNull: true },
        recordedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'bird_counts', underscored: true, timestamps: false },
    );
  }
}
