// Vials of one lot in one fridge, kept by the database from the movements (read-only to the application).
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class StockBalance extends Model<InferAttributes<StockBalance>, InferCreationAttributes<StockBalance>> {
  declare lotId: number;
  declare fridgeId: number;
  declare vials: number;
  declare updatedAt: Date;

  static initModel(sequelize: Sequelize): void {
    StockBalance.init(
      {
        lotId: { type: DataTypes.INTEGER, primaryKey: true },
        fridgeId: { type: DataTypes.INTEGER, primaryKey: true },
        vials: { type: DataTypes.INTEGER, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: 'stock_balances', underscored: true, timestamps: false },
    );
  }
}
