// A "do not use" on a lot: its cause, what opened it, when and by whom (decisions come with the lots feature).
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { HoldCause } from '../../shared/lots/hold-causes.js';

export class Hold extends Model<InferAttributes<Hold>, InferCreationAttributes<Hold>> {
  declare id: CreationOptional<number>;
  declare lotId: number;
  declare cause: HoldCause;
  declare sourceKind: string;
  declare sourceId: number | null;
  declare reason: CreationOptional<string>;
  declare openedAt: CreationOptional<Date>;
  declare openedBy: number | null;

  static initModel(sequelize: Sequelize): void {
    Hold.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        lotId: { type: DataTypes.INTEGER, allowNull: false },
        cause: { type: DataTypes.TEXT, allowNull: false },
        sourceKind: { type: DataTypes.TEXT, allowNull: false },
        sourceId: { type: DataTypes.INTEGER, allowNull: true },
        reason: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        openedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        openedBy: { type: DataTypes.INTEGER, allowNull: true },
      },
      { sequelize, tableName: 'holds', underscored: true, timestamps: false },
    );
  }
}
