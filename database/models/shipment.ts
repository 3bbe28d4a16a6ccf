// A delivery received at the door: when, from whom, the arrival checks and reading, and the outcome.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { IndicatorState, ReadingPlace, ShipmentOutcome } from '../../shared/receiving/arrival-checks.js';
import type { PurchaseOrder } from './purchase-order.js';
import type { ShipmentLine } from './shipment-line.js';
import type { ShipmentPhoto } from './shipment-photo.js';
import type { Site } from './site.js';
import type { Supplier } from './supplier.js';
import type { User } from './user.js';

export class Shipment extends Model<InferAttributes<Shipment>, InferCreationAttributes<Shipment>> {
  declare id: CreationOptional<number>;
  declare siteId: number;
  declare purchaseOrderId: number | null;
  declare supplierId: number | null;
  declare clientKey: string;
  declare carrier: CreationOptional<string>;
  declare trackingNumber: CreationOptional<string>;
  declare arrivedAt: Date;
  declare shippedAt: Date | null;
  declare containerIntact: boolean;
  declare coolantPresent: boolean;
  declare indicator: IndicatorState;
  declare contentsCold: boolean;
  declare readingValue: number | null;
  declare readingUnit: 'F' | 'C' | null;
  declare readingPlace: ReadingPlace | null;
  declare outcome: ShipmentOutcome;
  declare notes: CreationOptional<string>;
  declare receivedBy: number;
  declare reportMailedAt: Date | null;
  declare reportMailedTo: CreationOptional<string[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare site?: NonAttribute<Site>;
  declare supplier?: NonAttribute<Supplier | null>;
  declare purchaseOrder?: NonAttribute<PurchaseOrder | null>;
  declare lines?: NonAttribute<ShipmentLine[]>;
  declare photos?: NonAttribute<ShipmentPhoto[]>;
  declare receiver?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    Shipment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        siteId: { type: DataTypes.INTEGER, allowNull: false },
        purchaseOrderId: { type: DataTypes.INTEGER, allowNull: true },
        supplierId: { type: DataTypes.INTEGER, allowNull: true },
        clientKey: { type: DataTypes.UUID, allowNull: false },
        carrier: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        trackingNumber: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        arrivedAt: { type: DataTypes.DATE, allowNull: false },
        shippedAt: { type: DataTypes.DATE, allowNull: true },
        containerIntact: { type: DataTypes.BOOLEAN, allowNull: false },
        coolantPresent: { type: DataTypes.BOOLEAN, allowNull: false },
        indicator: { type: DataTypes.TEXT, allowNull: false },
        contentsCold: { type: DataTypes.BOOLEAN, allowNull: false },
        readingValue: {
          type: DataTypes.DECIMAL(6, 2),
          allowNull: true,
          get(this: Shipment) {
            const value = this.getDataValue('readingValue');
            return value == null ? null : Number(value);
          },
        },
        readingUnit: { type: DataTypes.CHAR(1), allowNull: true },
        readingPlace: { type: DataTypes.TEXT, allowNull: true },
        outcome: { type: DataTypes.TEXT, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        receivedBy: { type: DataTypes.INTEGER, allowNull: false },
        reportMailedAt: { type: DataTypes.DATE, allowNull: true },
        reportMailedTo: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'shipments', underscored: true },
    );
  }
}
