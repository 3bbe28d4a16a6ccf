// An order placed with a supplier for one site: what is expected, when, by which carrier.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { PurchaseOrderStatus } from '../../shared/receiving/purchase-order-schemas.js';
import type { PurchaseOrderLine } from './purchase-order-line.js';
import type { Site } from './site.js';
import type { Supplier } from './supplier.js';

export class PurchaseOrder extends Model<InferAttributes<PurchaseOrder>, InferCreationAttributes<PurchaseOrder>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare supplierId: number;
  declare reference: string;
  declare expectedDate: string;
  declare carrier: CreationOptional<string>;
  declare trackingNumber: CreationOptional<string>;
  declare notes: CreationOptional<string>;
  declare status: CreationOptional<PurchaseOrderStatus>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare lines?: NonAttribute<PurchaseOrderLine[]>;
  declare supplier?: NonAttribute<Supplier>;
  declare site?: NonAttribute<Site>;

  static initModel(sequelize: Sequelize): void {
    PurchaseOrder.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        siteId: { type: DataTypes.INTEGER, allowNull: false },
        supplierId: { type: DataTypes.INTEGER, allowNull: false },
        reference: { type: DataTypes.TEXT, allowNull: false },
        expectedDate: { type: DataTypes.DATEONLY, allowNull: false },
        carrier: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        trackingNumber: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'open' },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'purchase_orders', underscored: true },
    );
  }
}
