// How purchasing stocks one product at one site: safety stock (doses or days of cover), supplier and pack.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SafetyStockKind } from '../../shared/demand/demand-schemas.js';

const numeric = (name: 'safetyStockValue' | 'serviceLevel', allowNull: boolean, precision: [number, number]) => ({
  type: DataTypes.DECIMAL(...precision),
  allowNull,
  // DECIMAL arrives from pg as a string; the getter hands out a number.
  get(this: ProductStockSetting) {
    const value = this.getDataValue(name);
    return value == null ? null : Number(value);
  },
});

export class ProductStockSetting extends Model<InferAttributes<ProductStockSetting>, InferCreationAttributes<ProductStockSetting>> {
  declare siteId: number;
  declare productId: number;
  declare safetyStockKind: SafetyStockKind;
  declare safetyStockValue: number;
  declare supplierId: number | null;
  declare presentationId: number | null;
  declare serviceLevel: number | null;
  declare updatedBy: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ProductStockSetting.init(
      {
        siteId: { type: DataTypes.INTEGER, primaryKey: true },
        productId: { type: DataTypes.INTEGER, primaryKey: true },
        safetyStockKind: { type: DataTypes.TEXT, allowNull: false },
        safetyStockValue: numeric('safetyStockValue', false, [12, 2]),
        supplierId: { type: DataTypes.INTEGER, allowNull: true },
        presentationId: { type: DataTypes.INTEGER, allowNull: true },
        serviceLevel: numeric('serviceLevel', true, [6, 4]),
        updatedBy: { type: DataTypes.INTEGER, allowNull: true },
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'product_stock_settings', underscored: true, createdAt: false },
    );
  }
}
