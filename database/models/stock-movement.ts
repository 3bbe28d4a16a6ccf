// One append-only stock movement of whole vials; the database derives the balances from these alone.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { MovementKind } from '../../shared/lots/movement-kinds.js';

export class StockMovement extends Model<InferAttributes<StockMovement>, InferCreationAttributes<StockMovement>> {
  declare id: CreationOptional<string>;
  declare lotId: number;
  declare kind: MovementKind;
  declare vials: number;
  declare fromFridgeId: number | null;
  declare toFridgeId: number | null;
  declare leftAt: Date | null;
  declare at: Date;
  declare sourceKind: string;
  declare sourceId: number | null;
  declare reason: CreationOptional<string>;
  declare recordedBy: number | null;
  declare recordedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    StockMovement.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        lotId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        vials: { type: DataTypes.INTEGER, allowNull: false },
        fromFridgeId: { type: DataTypes.INTEGER, allowNull: true },
        toFridgeId: { type: DataTypes.INTEGER, allowNull: true },
        leftAt: { type: DataTypes.DATE, allowNull: true },
        at: { type: DataTypes.DATE, allowNull: false },
        sourceKind: { type: DataTypes.TEXT, allowNull: false },
        sourceId: { type: DataTypes.INTEGER, allowNull: true },
        reason: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        recordedBy: { type: DataTypes.INTEGER, allowNull: true },
        recordedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'stock_movements', underscored: true, timestamps: false },
    );
  }
}
