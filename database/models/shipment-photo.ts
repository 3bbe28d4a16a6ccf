// A photo taken at receiving: the generated file key under UPLOADS_DIR/photos and the display size's dimensions.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class ShipmentPhoto extends Model<InferAttributes<ShipmentPhoto>, InferCreationAttributes<ShipmentPhoto>> {
  declare id: CreationOptional<number>;
  declare shipmentId: number;
  declare fileKey: string;
  declare width: number;
  declare height: number;
  declare bytes: number;
  declare originalName: CreationOptional<string>;
  declare uploadedBy: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ShipmentPhoto.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        shipmentId: { type: DataTypes.INTEGER, allowNull: false },
        fileKey: { type: DataTypes.UUID, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        originalName: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        uploadedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'shipment_photos', underscored: true, timestamps: false },
    );
  }
}
