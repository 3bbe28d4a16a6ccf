// One sending of a purchase order to its supplier: the address, whether the mail server took it, who sent it and when.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class PurchaseOrderSending extends Model<InferAttributes<PurchaseOrderSending>, InferCreationAttributes<PurchaseOrderSending>> {
  declare id: CreationOptional<number>;
  declare purchaseOrderId: number;
  declare sentTo: string;
  declare mailed: boolean;
  declare pdfBytes: number;
  declare sentBy: number | null;
  declare sentAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PurchaseOrderSending.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        purchaseOrderId: { type: DataTypes.INTEGER, allowNull: false },
        sentTo: { type: DataTypes.TEXT, allowNull: false },
        mailed: { type: DataTypes.BOOLEAN, allowNull: false },
        pdfBytes: { type: DataTypes.INTEGER, allowNull: false },
        sentBy: { type: DataTypes.INTEGER, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'purchase_order_sendings', underscored: true, timestamps: false },
    );
  }
}
