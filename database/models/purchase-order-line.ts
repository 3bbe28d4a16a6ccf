// One line of a purchase order: a presentation and the packs ordered.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Presentation } from './presentation.js';

export class PurchaseOrderLine extends Model<InferAttributes<PurchaseOrderLine>, InferCreationAttributes<PurchaseOrderLine>> {
  declare id: CreationOptional<number>;
  declare purchaseOrderId: number;
  declare lineNo: number;
  declare presentationId: number;
  declare packs: number;
  declare presentation?: NonAttribute<Presentation>;

  static initModel(sequelize: Sequelize): void {
    PurchaseOrderLine.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        purchaseOrderId: { type: DataTypes.INTEGER, allowNull: false },
        lineNo: { type: DataTypes.INTEGER, allowNull: false },
        presentationId: { type: DataTypes.INTEGER, allowNull: false },
        packs: { type: DataTypes.INTEGER, allowNull: false },
      },
      { sequelize, tableName: 'purchase_order_lines', underscored: true, timestamps: false },
    );
  }
}
